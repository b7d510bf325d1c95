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

    @Test
    void retrievalRecallAtKBothWaysFromOneMatrixEqualsTheNumpyReference() throws Exception {
        // retrieval.json, case groups_sentinel: 14 images x 70 captions, 5 captions each, -100 beyond each
        // query's scored candidates; expected values from retrieval_reference.py (numpy.lexsort orders)
        JsonNode c = org.assay.data.retrieval.RetrievalFixtures.cases().get(0);
        Path scores = org.assay.data.retrieval.RetrievalFixtures.fixture("groups_sentinel.npy");
        CliRun run = CliRun.of("measure", "--task", "retrieval", "--scores", scores.toString(), "--group-size", "5",
                "--metric", "recall_at_k", "--k", "1,5,10", "--direction", "both", "--format", "json", "--resamples", "200");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(run.out());
        assertThat(root.get("task").asText()).isEqualTo("retrieval");
        int seen = 0;
        for (JsonNode m : root.get("metrics")) {
            String side = m.get("direction").asText();
            String key = "recall_at_k:k=" + m.get("params").get("k").asText();
            JsonNode expected = c.get("directions").get(side).get("policies").get("PESSIMISTIC").get("expected").get(key);
            if (expected.isNull()) {
                // the columns direction is real only to depth 7: R@10 is listed, not scored
                assertThat(m.get("value").isNull()).as(side + " " + key).isTrue();
                assertThat(m.get("not_computable").asText()).contains("depth 7");
            } else {
                assertThat(m.get("value").asDouble()).as(side + " " + key).isCloseTo(expected.asDouble(), within(1e-12));
                // hit rates are count metrics: exact interval on the query count
                assertThat(m.get("interval").get("method").asText()).isEqualTo("Clopper-Pearson");
                assertThat(m.get("n").asInt()).isEqualTo(side.equals("rows") ? 14 : 70);
            }
            seen++;
        }
        assertThat(seen).isEqualTo(6);
        assertThat(root.get("warnings").toString()).contains("-100").contains("not scored");
    }

    @Test
    void retrievalRsumAndTiePoliciesEqualTheReference() throws Exception {
        // retrieval.json, case general_ties: tied scores, relevance by candidate id in a JSON file
        JsonNode c = org.assay.data.retrieval.RetrievalFixtures.cases().get(1);
        Path scores = org.assay.data.retrieval.RetrievalFixtures.fixture("general_ties.npy");
        Path relevance = org.assay.data.retrieval.RetrievalFixtures.fixture("general_ties_relevance.json");
        for (String policy : new String[] {"optimistic", "pessimistic", "average"}) {
            CliRun run = CliRun.of("measure", "--task", "retrieval", "--scores", scores.toString(), "--relevance",
                    relevance.toString(), "--ties", policy, "--direction", "both", "--metric", "rsum,ndcg_at_k:k=5,mrr",
                    "--format", "json", "--resamples", "200");
            assertThat(run.exitCode()).as(run.err()).isZero();
            JsonNode root = new ObjectMapper().readTree(run.out());
            String p = policy.toUpperCase(java.util.Locale.ROOT);
            for (JsonNode m : root.get("metrics")) {
                String id = m.get("metric").asText();
                double expected = id.equals("rsum") ? c.get("rsum").get(p).asDouble() / 100   // reference in percent points
                        : c.get("directions").get(m.get("direction").asText()).get("policies").get(p).get("expected")
                                .get(id.equals("mrr") ? "mrr" : "ndcg_at_k:k=5").asDouble();
                assertThat(m.get("value").asDouble()).as(policy + " " + id).isCloseTo(expected, within(1e-12));
            }
            assertThat(root.get("metrics")).hasSize(5);   // two metrics per direction, rsum once
        }
    }

    @Test
    void retrievalInputMistakesAreOneLineErrors() throws Exception {
        Path scores = org.assay.data.retrieval.RetrievalFixtures.fixture("groups_sentinel.npy");
        CliRun misfit = CliRun.of("measure", "--task", "retrieval", "--scores", scores.toString(), "--group-size", "3",
                "--metric", "recall_at_k:k=1");
        assertThat(misfit.exitCode()).isEqualTo(2);
        assertThat(misfit.errLines()).hasSize(1);
        assertThat(misfit.err()).contains("group size 3 does not fit 14 queries and 70 candidates");
        CliRun noRelevance = CliRun.of("measure", "--task", "retrieval", "--scores", scores.toString(), "--metric", "mrr");
        assertThat(noRelevance.exitCode()).isEqualTo(2);
        assertThat(noRelevance.err()).contains("no relevance").contains("--group-size");
        CliRun positional = CliRun.of("measure", scores.toString(), "--task", "retrieval", "--group-size", "5", "--metric", "mrr");
        assertThat(positional.exitCode()).isEqualTo(2);
        assertThat(positional.err()).contains("--scores");
        CliRun rsumOneWay = CliRun.of("measure", "--task", "retrieval", "--scores", scores.toString(), "--group-size", "5",
                "--metric", "rsum");
        assertThat(rsumOneWay.exitCode()).isEqualTo(2);
        assertThat(rsumOneWay.err()).contains("--direction both");
        CliRun kWithoutCutoffMetric = CliRun.of("measure", "--task", "retrieval", "--scores", scores.toString(),
                "--group-size", "5", "--metric", "mean_rank", "--k", "5");
        assertThat(kWithoutCutoffMetric.exitCode()).isEqualTo(2);
        assertThat(kWithoutCutoffMetric.err()).contains("no requested metric takes a cut-off");
    }
}
