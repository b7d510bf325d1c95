package org.assay.cli;

import static org.assay.cli.SmallAudit.CLAIMS;
import static org.assay.cli.SmallAudit.PREDICTIONS;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every bad claims file and bad predictions file the audit can meet, through the command line:
 * exit code 2, one line on stderr naming the file and the line (or JSON pointer), no stack
 * trace, and no report folder left behind (DESIGN.md principle 7).
 */
class BadInputCommandTest {
    @TempDir Path tmp;


    /** name, claims file name, claims text, predictions text, text the message must contain. */
    static Stream<Arguments> cases() {
        List<Arguments> a = new ArrayList<>();
        // deliverable 5: claims files (the decimal comma, the space inside a number, the unknown metric and the
        // test_size below the subsample are fixtures in src/test/resources/bad/claims/, see BadDocumentFilesTest)
        a.add(Arguments.of("percent sign", "c.yaml", CLAIMS.replace("\"75.0\"", "\"75.0%\""), PREDICTIONS, "line 8"));
        a.add(Arguments.of("missing metric", "c.yaml", CLAIMS.replace("        metric: accuracy\n", ""), PREDICTIONS, "line 5"));
        a.add(Arguments.of("missing value", "c.yaml", CLAIMS.replace("        value: \"75.0\"\n", ""), PREDICTIONS, "line 5"));
        a.add(Arguments.of("bad scale", "c.yaml", CLAIMS.replace("scale: percent", "scale: percentage"), PREDICTIONS, "line 9"));
        a.add(Arguments.of("pm without kind", "c.yaml", CLAIMS + "        pm: 0.3\n", PREDICTIONS, "line 10"));
        a.add(Arguments.of("negative pm", "c.yaml", CLAIMS + "        pm: -0.3\n        pm_kind: sd\n", PREDICTIONS, "line 10"));
        a.add(Arguments.of("bad pm_kind", "c.yaml", CLAIMS + "        pm: 0.3\n        pm_kind: stdev\n", PREDICTIONS, "line 11"));
        a.add(Arguments.of("zero test_size", "c.yaml", CLAIMS.replace("test_size: 1000", "test_size: 0"), PREDICTIONS, "line 3"));
        a.add(Arguments.of("zero runs", "c.yaml", CLAIMS.replace("    claims:", "    runs: 0\n    claims:"), PREDICTIONS, "line 4"));
        a.add(Arguments.of("unknown field", "c.yaml", CLAIMS.replace("test_size:", "tset_size:"), PREDICTIONS, "line 3"));
        a.add(Arguments.of("yaml syntax", "c.yaml", CLAIMS.replace("column: [Accuracy]", "column: [Accuracy"), PREDICTIONS, "line"));
        a.add(Arguments.of("duplicate table", "c.yaml", CLAIMS + CLAIMS.substring("tables:\n".length()), PREDICTIONS, "line 10"));
        a.add(Arguments.of("json value", "c.json",
                "{\"tables\": [{\"id\": \"T1\", \"test_size\": 1000, \"claims\": [{\"row\": \"Ours\", \"metric\": "
                        + "\"accuracy\", \"value\": \"75,0\", \"scale\": \"percent\"}]}]}", PREDICTIONS,
                "/tables/0/claims/0/value"));
        a.add(Arguments.of("csv ragged row", "c.csv",
                "table,row,column,metric,params,value,scale,test_size,runs,pm,pm_kind\n"
                        + "T1,Ours,Accuracy,accuracy,,75.0,percent,1000,1,,\n"
                        + "T1,Ours,Error,error_rate,,25.0,percent,1000\n", PREDICTIONS, "line 3"));
        // deliverable 6: predictions files (duplicate id, NaN score, header only and ragged row are
        // fixtures now: BadDataFilesTest, src/test/resources/bad/predictions/)
        a.add(Arguments.of("infinite score", "c.yaml", CLAIMS, PREDICTIONS.replace("0.4", "Infinity"), "line 4"));
        a.add(Arguments.of("score not a number", "c.yaml", CLAIMS, PREDICTIONS.replace("0.4", "high"), "line 4"));
        a.add(Arguments.of("empty file", "c.yaml", CLAIMS, "", "empty"));
        a.add(Arguments.of("unknown predicted label", "c.yaml", CLAIMS, PREDICTIONS.replace("c,1,0,0.4", "c,1,7,0.4"), "line 4"));
        a.add(Arguments.of("missing id column", "c.yaml", CLAIMS, PREDICTIONS.replace("id,label", "key,label"), "--id-column"));
        a.add(Arguments.of("empty id", "c.yaml", CLAIMS, PREDICTIONS.replace("c,1,0,0.4", ",1,0,0.4"), "line 4"));
        return a.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void badInputExitsTwoWithOneLineAndNoOutput(String name, String claimsName, String claims, String predictions,
                                                String position) throws Exception {
        Path c = Files.writeString(tmp.resolve(claimsName), claims);
        Path p = Files.writeString(tmp.resolve("preds.csv"), predictions);
        Path out = tmp.resolve("report");
        CliRun run = CliRun.of("audit", "--claims", c.toString(), "--predictions", p.toString(), "--positive", "1",
                "--out", out.toString(), "--resamples", "200");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.errLines()).as(run.err()).hasSize(1);
        String line = run.errLines().get(0);
        boolean claimsCase = !predictions.equals(PREDICTIONS) ? false : true;
        assertThat(line).startsWith("assay: ").contains(claimsCase ? claimsName : "preds.csv").contains(position)
                .doesNotContain("Exception").doesNotContain("\tat ");
        assertThat(out).doesNotExist();
    }

    @Test
    void manifestMissingAnIdNamesTheManifestOrPredictionsRow() throws Exception {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path p = Files.writeString(tmp.resolve("preds.csv"), PREDICTIONS);
        Path m = Files.writeString(tmp.resolve("subsample.txt"), "# drawn at random\na\nb\nc\nd\ne\n");
        Path out = tmp.resolve("report");
        CliRun run = CliRun.of("audit", "--claims", c.toString(), "--predictions", p.toString(), "--manifest", m.toString(),
                "--out", out.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("'f'").contains("line 7");
        assertThat(out).doesNotExist();
    }

    @Test
    void idMissingFromTruthIsAnError() throws Exception {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path p = Files.writeString(tmp.resolve("preds.csv"), "id,prediction\na,1\nb,0\nzz,1\n");
        Path t = Files.writeString(tmp.resolve("truth.csv"), "id,label\na,1\nb,0\nc,1\n");
        Path out = tmp.resolve("report");
        CliRun run = CliRun.of("audit", "--claims", c.toString(), "--predictions", p.toString(), "--truth", t.toString(),
                "--out", out.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("preds.csv").contains("line 4").contains("zz");
        assertThat(out).doesNotExist();
    }

    @Test
    void debugShowsTheStackTrace() throws Exception {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS.replace("\"75.0\"", "\"75,0\""));
        Path p = Files.writeString(tmp.resolve("preds.csv"), PREDICTIONS);
        CliRun run = CliRun.of("audit", "--claims", c.toString(), "--predictions", p.toString(), "--debug",
                "--out", tmp.resolve("r").toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("UserInputException");
    }
}
