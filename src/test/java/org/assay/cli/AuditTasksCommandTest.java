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

    @Test
    void retrievalReproductionInBothDirectionsIsAuditedWithTheReferenceValues() throws Exception {
        // retrieval.json, case untied (no ties, relevance by index): values from retrieval_reference.py
        JsonNode c = org.assay.data.retrieval.RetrievalFixtures.cases().get(2);
        JsonNode rows = c.get("directions").get("rows").get("policies").get("PESSIMISTIC").get("expected");
        JsonNode cols = c.get("directions").get("columns").get("policies").get("PESSIMISTIC").get("expected");
        Files.copy(org.assay.data.retrieval.RetrievalFixtures.fixture("untied.npy"), tmp.resolve("untied.npy"));
        Files.writeString(tmp.resolve("rel-rows.json"), relevanceJson(c.get("directions").get("rows").get("relevant")));
        Files.writeString(tmp.resolve("rel-cols.json"), relevanceJson(c.get("directions").get("columns").get("relevant")));
        Files.writeString(tmp.resolve("claims.yaml"), String.format(Locale.ROOT, """
                tables:
                  - id: T1
                    claims:
                      - {row: Ours, column: [A→B, R@5], metric: recall_at_k, params: {k: 5}, value: "%.1f", scale: percent}
                      - {row: Ours, column: [A→B, nDCG@10], metric: ndcg_at_k, params: {k: 10}, value: "%.3f", scale: fraction}
                      - {row: Ours, column: [B→A, MRR], metric: mrr, value: "%.3f", scale: fraction}
                      - {row: Ours, column: [B→A, R@30], metric: recall_at_k, params: {k: 30}, value: "99.0", scale: percent}
                      - {row: Ours, column: [RSUM], metric: rsum, value: "%.1f", scale: percent}
                """, 100 * rows.get("recall_at_k:k=5").asDouble(), rows.get("ndcg_at_k:k=10").asDouble(),
                cols.get("mrr").asDouble(), c.get("rsum").get("PESSIMISTIC").asDouble()));
        String audit = """
                claims: claims.yaml
                reproductions:
                  - task: retrieval
                    directions:
                      - {column: "A→B", scores: untied.npy, relevance: rel-rows.json}
                      - {column: "B→A", scores: untied.npy, side: columns, relevance: REL}
                """;
        // a relevance file whose queries are the rows, given for the columns direction, is caught
        Files.writeString(tmp.resolve("audit.yaml"), audit.replace("REL", "rel-rows.json"));
        CliRun wrongSide = CliRun.of("audit", tmp.resolve("audit.yaml").toString(), "--out", tmp.resolve("x").toString());
        assertThat(wrongSide.exitCode()).isEqualTo(2);
        assertThat(wrongSide.errLines()).hasSize(1);
        assertThat(wrongSide.err()).contains("rel-rows.json");
        assertThat(tmp.resolve("x")).doesNotExist();

        Files.writeString(tmp.resolve("audit.yaml"), audit.replace("REL", "rel-cols.json"));
        CliRun run = CliRun.of("audit", tmp.resolve("audit.yaml").toString(), "--out", tmp.resolve("r").toString(),
                "--resamples", "500");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode findings = new ObjectMapper().readTree(tmp.resolve("r/report.json").toFile()).get("findings");
        assertThat(findings).hasSize(5);
        assertThat(findings.get(0).get("estimate").asDouble()).isCloseTo(rows.get("recall_at_k:k=5").asDouble(), within(1e-12));
        assertThat(findings.get(1).get("estimate").asDouble()).isCloseTo(rows.get("ndcg_at_k:k=10").asDouble(), within(1e-12));
        assertThat(findings.get(2).get("estimate").asDouble()).isCloseTo(cols.get("mrr").asDouble(), within(1e-12));
        // the columns direction is scored to depth 24 only: R@30 is listed as not computable, never scored
        assertThat(findings.get(3).get("verdict").asText()).isEqualTo("not computable");
        assertThat(findings.get(3).get("reason").asText()).contains("k = 30").contains("24");
        assertThat(findings.get(4).get("estimate").asDouble())
                .isCloseTo(c.get("rsum").get("PESSIMISTIC").asDouble() / 100, within(1e-12));
        assertThat(findings.get(0).get("notes").toString()).contains("pessimistic ties");
    }

    /** A relevance JSON object by 0-based index: {"0": [3, 7], ...}. */
    private static String relevanceJson(JsonNode lists) {
        java.util.List<String> entries = new java.util.ArrayList<>();
        for (int q = 0; q < lists.size(); q++) entries.add("\"" + q + "\": " + lists.get(q));
        return "{" + String.join(", ", entries) + "}";
    }

    @Test
    void theRetrievalDemoFlagsTheKBeyondTheScoredDepth() throws Exception {
        Path out = tmp.resolve("harbour");
        CliRun run = CliRun.of("demo", "--scenario", "harbour", "--out", out.toString(), "--resamples", "1000");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode json = new ObjectMapper().readTree(out.resolve("report.json").toFile());
        JsonNode findings = json.get("findings");
        assertThat(findings).hasSize(8);   // the QuayCLIP row; the two baseline claims are not audited
        assertThat(json.get("unaudited")).hasSize(2);
        JsonNode r50 = findings.get(3);
        assertThat(r50.get("params").get("k").asText()).isEqualTo("50");
        assertThat(r50.get("verdict").asText()).isEqualTo("not computable");
        assertThat(r50.get("reason").asText()).contains("depth 24").contains("-100");
        // the invented reproduction is weaker at caption-to-photo R@1 than the claim (generate.py)
        assertThat(findings.get(4).get("verdict").asText()).isEqualTo("discrepant");
        assertThat(findings.get(4).get("direction").asText()).isEqualTo("below");
        assertThat(findings.get(0).get("interval").get("method").asText()).contains("hypergeometric");
        assertThat(Files.readString(out.resolve("report.md"))).contains("pessimistic ties").contains("not a validation");
        assertThat(run.out()).contains("recall_at_k:k=50").contains("not computable");
    }

    @Test
    void twoRetrievalDirectionsWithoutColumnsAreAOneLineError() throws Exception {
        Files.writeString(tmp.resolve("claims.yaml"), """
                tables:
                  - id: T1
                    claims:
                      - {row: Ours, column: [R@1], metric: recall_at_k, params: {k: 1}, value: "50.0", scale: percent}
                """);
        Path scores = org.assay.data.retrieval.RetrievalFixtures.fixture("groups_sentinel.npy");
        Files.copy(scores, tmp.resolve("s.npy"));
        Files.writeString(tmp.resolve("audit.yaml"), """
                claims: claims.yaml
                reproductions:
                  - task: retrieval
                    directions:
                      - {scores: s.npy, group_size: 5}
                      - {scores: s.npy, side: columns, group_size: 5}
                """);
        CliRun run = CliRun.of("audit", tmp.resolve("audit.yaml").toString(), "--out", tmp.resolve("r").toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("audit.yaml").contains("/reproductions/0/directions/0/column").contains("needs 'column:'");
        assertThat(tmp.resolve("r")).doesNotExist();
    }

    @Test
    void theAuditCommandTakesRetrievalOutputsThroughTaskWithoutAnAuditFile() throws Exception {
        // retrieval.json, case groups_sentinel, rows direction: R@5 from retrieval_reference.py
        JsonNode c = org.assay.data.retrieval.RetrievalFixtures.cases().get(0);
        double r5 = c.get("directions").get("rows").get("policies").get("PESSIMISTIC").get("expected")
                .get("recall_at_k:k=5").asDouble();
        Files.writeString(tmp.resolve("claims.yaml"), String.format(Locale.ROOT, """
                tables:
                  - id: T1
                    claims:
                      - {row: Ours, column: [R@5], metric: recall_at_k, params: {k: 5}, value: "%.1f", scale: percent}
                      - {row: Ours, column: [R@50], metric: recall_at_k, params: {k: 50}, value: "99.0", scale: percent}
                """, 100 * r5));
        Path scores = org.assay.data.retrieval.RetrievalFixtures.fixture("groups_sentinel.npy");
        CliRun run = CliRun.of("audit", "--claims", tmp.resolve("claims.yaml").toString(), "--task", "retrieval",
                "--scores", scores.toString(), "--group-size", "5", "--out", tmp.resolve("r").toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode findings = new ObjectMapper().readTree(tmp.resolve("r/report.json").toFile()).get("findings");
        assertThat(findings.get(0).get("estimate").asDouble()).isCloseTo(r5, within(1e-12));
        assertThat(findings.get(1).get("verdict").asText()).isEqualTo("not computable");   // depth 40
        CliRun both = CliRun.of("audit", "--claims", tmp.resolve("claims.yaml").toString(), "--task", "retrieval",
                "--scores", scores.toString(), "--group-size", "5", "--direction", "both", "--out", tmp.resolve("b").toString());
        assertThat(both.exitCode()).isEqualTo(2);
        assertThat(both.err()).contains("audit file").contains("column:");
    }
}
