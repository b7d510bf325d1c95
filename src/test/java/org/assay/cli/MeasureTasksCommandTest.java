package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `assay measure --task ...` end to end for the tasks beyond classification, against the reference
 * values of src/test/reference (library versions in each JSON's generated_by field).
 */
class MeasureTasksCommandTest {
    @TempDir Path tmp;

    @Test
    void regressionMetricsEqualScikitLearnAndScipy() throws Exception {
        // regression_reference.json: sklearn mean_absolute_error, mean_squared_error, r2_score;
        // scipy.stats pearsonr, spearmanr, on every case (ties, large offsets)
        JsonNode ref = ReferenceData.load("regression_reference.json");
        for (JsonNode c : ref.get("cases")) {
            StringBuilder csv = new StringBuilder("id,target,prediction\n");
            for (int i = 0; i < c.get("target").size(); i++) {
                csv.append("e").append(i).append(',').append(c.get("target").get(i).asText()).append(',')
                        .append(c.get("prediction").get(i).asText()).append('\n');
            }
            Path file = Files.writeString(tmp.resolve(c.get("name").asText() + ".csv"), csv.toString());
            CliRun run = CliRun.of("measure", file.toString(), "--task", "regression", "--metric",
                    "mae,rmse,r2,pearson,spearman", "--resamples", "200", "--format", "json");
            assertThat(run.exitCode()).as(run.err()).isZero();
            JsonNode root = new ObjectMapper().readTree(run.out());
            assertThat(root.get("task").asText()).isEqualTo("regression");
            for (JsonNode m : root.get("metrics")) {
                double expected = c.get("expected").get(m.get("metric").asText()).asDouble();
                assertThat(m.get("value").asDouble()).as(c.get("name") + " " + m.get("metric"))
                        .isCloseTo(expected, within(1e-9 * Math.max(1, Math.abs(expected))));
                assertThat(m.get("interval").get("method").asText()).contains("bootstrap");
            }
        }
    }

    @Test
    void aClassificationMetricOnRegressionOutputsIsBadUsage() throws Exception {
        Path file = Files.writeString(tmp.resolve("r.csv"), "id,target,prediction\na,1,2\nb,2,2\nc,3,1\n");
        CliRun run = CliRun.of("measure", file.toString(), "--task", "regression", "--metric", "accuracy");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("accuracy is a classification metric").contains("--task classification");
        CliRun unknown = CliRun.of("measure", file.toString(), "--task", "astrology", "--metric", "mae");
        assertThat(unknown.exitCode()).isEqualTo(2);
        assertThat(unknown.err()).contains("unknown task");
    }
}
