package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `assay audit` on tasks beyond classification: the reproduced values equal the reference libraries'. */
class AuditTasksCommandTest {
    @TempDir Path tmp;

    @Test
    void regressionReproductionIsAuditedWithTheReferenceValues() throws Exception {
        // the first case of regression_reference.json (sklearn mean_absolute_error, scipy pearsonr)
        JsonNode c = ReferenceData.load("regression_reference.json").get("cases").get(0);
        StringBuilder csv = new StringBuilder("image,true_count,predicted_count\n");
        for (int i = 0; i < c.get("target").size(); i++) {
            csv.append("x").append(i).append(',').append(c.get("target").get(i).asText()).append(',')
                    .append(c.get("prediction").get(i).asText()).append('\n');
        }
        Files.writeString(tmp.resolve("counts.csv"), csv.toString());
        double mae = c.get("expected").get("mae").asDouble();
        double pearson = c.get("expected").get("pearson").asDouble();
        Files.writeString(tmp.resolve("claims.yaml"), String.format(Locale.ROOT, """
                tables:
                  - id: T4
                    claims:
                      - {row: Ours, column: [MAE], metric: mae, value: "%.2f", scale: fraction, margin: "0.5"}
                      - {row: Ours, column: [r], metric: pearson, value: "%.3f", scale: fraction}
                """, mae, pearson));
        Files.writeString(tmp.resolve("audit.yaml"), """
                claims: claims.yaml
                reproductions:
                  - task: regression
                    predictions: counts.csv
                    columns: {id: image, target: true_count, prediction: predicted_count}
                """);
        CliRun run = CliRun.of("audit", tmp.resolve("audit.yaml").toString(), "--out", tmp.resolve("r").toString(),
                "--resamples", "500");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode report = new ObjectMapper().readTree(tmp.resolve("r/report.json").toFile());
        JsonNode findings = report.get("findings");
        assertThat(findings).hasSize(2);
        assertThat(findings.get(0).get("estimate").asDouble()).isCloseTo(mae, within(1e-9));
        assertThat(findings.get(1).get("estimate").asDouble()).isCloseTo(pearson, within(1e-9));
        assertThat(findings.findValuesAsText("verdict")).doesNotContain("not computable");
    }
}
