package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The demo and the audit command end to end: files written, verdicts listed, exit codes. */
class DemoAndAuditCommandTest {
    @TempDir Path tmp;

    @Test
    void demoWritesBothReportsWithEveryClaimAndADiscrepancy() throws Exception {
        Path out = tmp.resolve("demo");
        CliRun run = CliRun.of("demo", "--out", out.toString(), "--resamples", "2000");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(out.resolve("report.md")).exists();
        JsonNode json = new ObjectMapper().readTree(out.resolve("report.json").toFile());
        assertThat(json.get("schema_version").asInt()).isEqualTo(1);
        List<String> verdicts = new ArrayList<>();
        json.get("findings").forEach(f -> verdicts.add(f.get("verdict").asText()));
        // the demo's four ChirpNet claims are audited; the two baseline claims are listed as not audited
        assertThat(verdicts).hasSize(4).contains("discrepant");
        assertThat(verdicts).containsAnyOf("consistent", "inconclusive");
        assertThat(json.get("unaudited")).hasSize(2);
        String md = Files.readString(out.resolve("report.md"));
        assertThat(md).contains("discrepant").contains("not a validation").doesNotContain("${");
        assertThat(run.out()).contains("discrepant");
    }

    @Test
    void reportIsByteIdenticalForTheSameSeedAndAnyThreadCount() throws Exception {
        CliRun a = CliRun.of("demo", "--out", tmp.resolve("a").toString(), "--resamples", "1000", "--threads", "1");
        CliRun b = CliRun.of("demo", "--out", tmp.resolve("b").toString(), "--resamples", "1000", "--threads", "2");
        assertThat(a.exitCode()).isZero();
        assertThat(b.exitCode()).isZero();
        // principle 5; report.json holds absolute input paths, which differ between a and b, and the
        // provenance block records each run's own command line (--threads 1 or 2), so it is left out
        com.fasterxml.jackson.databind.node.ObjectNode ja = (com.fasterxml.jackson.databind.node.ObjectNode) new ObjectMapper()
                .readTree(Files.readString(tmp.resolve("a/report.json")).replace(tmp.resolve("a").toString(), "X"));
        com.fasterxml.jackson.databind.node.ObjectNode jb = (com.fasterxml.jackson.databind.node.ObjectNode) new ObjectMapper()
                .readTree(Files.readString(tmp.resolve("b/report.json")).replace(tmp.resolve("b").toString(), "X"));
        assertThat(ja.get("provenance").get("arguments").toString()).contains("--threads");
        ja.remove("provenance");
        jb.remove("provenance");
        assertThat(ja).isEqualTo(jb);
        String ma = Files.readString(tmp.resolve("a/report.md")).replace(tmp.resolve("a").toString(), "X");
        String mb = Files.readString(tmp.resolve("b/report.md")).replace(tmp.resolve("b").toString(), "X");
        assertThat(ma.substring(0, ma.indexOf("## Provenance"))).isEqualTo(mb.substring(0, mb.indexOf("## Provenance")));
    }

    @Test
    void existingReportIsNotOverwrittenWithoutForce() throws Exception {
        Path out = tmp.resolve("demo");
        assertThat(CliRun.of("demo", "--out", out.toString(), "--resamples", "1000").exitCode()).isZero();
        Files.writeString(out.resolve("report.md"), "mine");
        CliRun again = CliRun.of("demo", "--out", out.toString(), "--resamples", "1000");
        assertThat(again.exitCode()).isEqualTo(2);
        assertThat(again.errLines()).hasSize(1);
        assertThat(again.err()).contains("--force");
        assertThat(Files.readString(out.resolve("report.md"))).isEqualTo("mine");
        CliRun forced = CliRun.of("demo", "--out", out.toString(), "--resamples", "1000", "--force");
        assertThat(forced.exitCode()).isZero();
        assertThat(Files.readString(out.resolve("report.md"))).isNotEqualTo("mine");
    }

    @Test
    void failOnDiscrepantExitsOne() throws Exception {
        Path demo = tmp.resolve("demo");
        assertThat(CliRun.of("demo", "--out", demo.toString(), "--resamples", "1000").exitCode()).isZero();
        CliRun run = CliRun.of("audit", demo.resolve("inputs/audit.yaml").toString(), "--out", tmp.resolve("r").toString(),
                "--resamples", "1000", "--fail-on", "discrepant");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(1);
        assertThat(tmp.resolve("r/report.json")).exists();
    }

    @Test
    void malformedClaimsFileGivesOneLineNamingFileAndLineAndNoOutput() throws Exception {
        Path demo = tmp.resolve("demo");
        assertThat(CliRun.of("demo", "--out", demo.toString(), "--resamples", "1000").exitCode()).isZero();
        Path claims = tmp.resolve("bad-claims.yaml");
        Files.writeString(claims, String.join("\n",
                "tables:",
                "  - id: T2",
                "    test_size: 4000",
                "    claims:",
                "      - row: \"ChirpNet (ours)\"",
                "        column: [Accuracy]",
                "        metric: accuracy",
                "        value: \"88,7\"",
                "        scale: percent", ""));
        Path out = tmp.resolve("never");
        CliRun run = CliRun.of("audit", "--claims", claims.toString(),
                "--predictions", demo.resolve("inputs/predictions.csv").toString(),
                "--id-column", "clip_id", "--label-column", "species", "--prediction-column", "predicted",
                "--out", out.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("bad-claims.yaml").contains("line 8").doesNotContain("Exception");
        assertThat(out).doesNotExist();
    }

    @Test
    void helpShowsARealExample() {
        CliRun run = CliRun.of("audit", "--help");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("Examples:").contains("assay audit --claims");
    }

    @Test
    void unknownOptionIsBadUsage() {
        CliRun run = CliRun.of("audit", "--no-such-option");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
    }
}
