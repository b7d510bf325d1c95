package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Nothing dropped silently (DESIGN.md principle 7): every row read is used or set aside for a stated
 * reason, and the report says how many of each, per input file.
 */
class RowAccountingCommandTest {
    @TempDir Path tmp;

    private static final String CLAIMS = String.join("\n",
            "tables:", "  - id: T1", "    test_size: 8", "    claims:", "      - row: Ours",
            "        column: [Accuracy]", "        metric: accuracy", "        value: \"75.0\"", "        scale: percent", "");

    @Test
    void truthRowsOutsideTheSubsampleAreCountedAsSetAsideWithTheReason() throws Exception {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path p = Files.writeString(tmp.resolve("preds.csv"), "id,prediction\n\nb,1\nc,0\n\ne,1\nf,0\ng,1\n");
        Path t = Files.writeString(tmp.resolve("truth.csv"), "id,label\na,1\nb,1\nc,0\nd,0\ne,1\nf,1\ng,1\nh,0\n");
        Path m = Files.writeString(tmp.resolve("subsample.txt"), "# five of eight\nb\nc\ne\nf\ng\n");
        Path out = tmp.resolve("r");
        CliRun run = CliRun.of("audit", "--claims", c.toString(), "--predictions", p.toString(), "--truth", t.toString(),
                "--manifest", m.toString(), "--positive", "1", "--out", out.toString(), "--resamples", "200");
        assertThat(run.exitCode()).as(run.err()).isIn(0, 1);

        JsonNode inputs = new ObjectMapper().readTree(out.resolve("report.json").toFile()).get("inputs");
        JsonNode claims = find(inputs, "claims");
        assertThat(claims.has("rows")).isFalse();   // a claims file is not rows of data
        JsonNode preds = find(inputs, "predictions").get("rows");
        assertThat(preds.get("read").asLong()).isEqualTo(5);   // blank lines hold no row
        assertThat(preds.get("used").asLong()).isEqualTo(5);
        assertThat(preds.get("set_aside").asLong()).isZero();
        JsonNode truth = find(inputs, "truth").get("rows");
        assertThat(truth.get("read").asLong()).isEqualTo(8);
        assertThat(truth.get("used").asLong()).isEqualTo(5);
        assertThat(truth.get("set_aside").asLong()).isEqualTo(3);
        assertThat(truth.get("set_aside_reason").asText()).contains("not evaluated");
        JsonNode manifest = find(inputs, "manifest").get("rows");
        assertThat(manifest.get("read").asLong()).isEqualTo(5);
        assertThat(manifest.get("used").asLong()).isEqualTo(5);
        // every input: read = used + set aside
        for (JsonNode f : inputs) {
            if (!f.has("rows")) continue;
            JsonNode r = f.get("rows");
            assertThat(r.get("read").asLong()).isEqualTo(r.get("used").asLong() + r.get("set_aside").asLong());
        }
        assertThat(Files.readString(out.resolve("report.md")))
                .contains("8 read, 5 used, 3 set aside: ids the predictions do not list (not evaluated)")
                .contains("| Rows |");
    }

    private static JsonNode find(JsonNode inputs, String rolePrefix) {
        for (JsonNode f : inputs) if (f.get("role").asText().startsWith(rolePrefix)) return f;
        throw new AssertionError("no input " + rolePrefix + " in " + inputs);
    }
}
