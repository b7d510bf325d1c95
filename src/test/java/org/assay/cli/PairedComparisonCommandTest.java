package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.stats.MultiplicityMethod;
import org.assay.testing.ReferenceData;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `assay audit` with two reproduced rows a table compares: the invented data of paired_reference.py
 * (two binary classifiers on the same 240 items, the second file in another order). References:
 * statsmodels 0.13.5 mcnemar(exact=True) and scikit-learn 1.2 (paired_reference.py), R pROC 1.18
 * roc.test(method = "delong", paired = TRUE) (paired_delong_reference.R).
 */
class PairedComparisonCommandTest {
    private static final JsonNode PY = ReferenceData.load("paired_reference.json").get("end_to_end");
    private static final JsonNode R = ReferenceData.load("paired_delong_reference.json").get("end_to_end");
    private static final String BASELINE = "Baseline <b>CNN</b> & co";

    @TempDir Path tmp;

    @BeforeEach
    void writeInputs() throws Exception {
        for (String f : List.of("ours.csv", "baseline.csv")) {
            Files.copy(Path.of(getClass().getResource("/paired/" + f).toURI()), tmp.resolve(f));
        }
        Files.writeString(tmp.resolve("claims.yaml"), """
                source: {title: "Two detectors on the same items (invented)"}
                tables:
                  - id: T1
                    caption: "Binary detection"
                    compare: [["Ours", "Baseline <b>CNN</b> & co"]]
                    claims:
                      - {row: "Ours", column: [Accuracy], metric: accuracy, value: "83.5", scale: percent}
                      - {row: "Ours", column: [Macro F1], metric: macro_f1, value: "81.0", scale: percent}
                      - {row: "Ours", column: [AUC], metric: roc_auc, params: {positive: "1"}, value: "0.96", scale: fraction}
                      - {row: "Baseline <b>CNN</b> & co", column: [Accuracy], metric: accuracy, value: "74.0", scale: percent}
                      - {row: "Baseline <b>CNN</b> & co", column: [Macro F1], metric: macro_f1, value: "74.5", scale: percent}
                      - {row: "Baseline <b>CNN</b> & co", column: [AUC], metric: roc_auc, params: {positive: "1"}, value: "0.93", scale: fraction}
                """);
        Files.writeString(tmp.resolve("audit.yaml"), """
                claims: claims.yaml
                reproductions:
                  - {table: T1, row: "Ours", predictions: ours.csv, columns: {prediction: predicted}}
                  - {table: T1, row: "Baseline <b>CNN</b> & co", predictions: baseline.csv, columns: {prediction: predicted}}
                """);
    }

    private JsonNode audit(String out, String... extra) throws Exception {
        List<String> args = new ArrayList<>(List.of("audit", tmp.resolve("audit.yaml").toString(), "--out",
                tmp.resolve(out).toString(), "--resamples", "2000", "--format", "md,html,json"));
        args.addAll(List.of(extra));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertThat(run.exitCode()).as(run.err()).isZero();
        return new ObjectMapper().readTree(tmp.resolve(out).resolve("report.json").toFile());
    }

    private static JsonNode comparison(JsonNode report, String metric) {
        for (JsonNode c : report.get("comparisons")) if (c.get("metric").asText().equals(metric)) return c;
        throw new AssertionError("no comparison of " + metric);
    }

    private static double[] pValues(JsonNode nodes, String field) {
        double[] p = new double[nodes.size()];
        for (int i = 0; i < p.length; i++) p[i] = nodes.get(i).get(field).asDouble();
        return p;
    }

    @Test
    void bothRowsReproducedGiveTheGapsTestsAndVerdictsOfTheReferenceLibraries() throws Exception {
        JsonNode report = audit("r");
        assertThat(report.get("settings").get("multiplicity").asText()).isEqualTo("holm");
        assertThat(report.get("settings").get("paired_test").asText()).isEqualTo("bootstrap");
        JsonNode comparisons = report.get("comparisons");
        assertThat(comparisons).hasSize(3);
        for (JsonNode c : comparisons) {
            assertThat(c.get("rows").get(0).asText()).isEqualTo("Ours");
            assertThat(c.get("rows").get(1).asText()).isEqualTo(BASELINE);
            assertThat(c.get("n").asInt()).isEqualTo(240);
            assertThat(c.get("interval").get("lower").asDouble()).isLessThanOrEqualTo(c.get("reproduced_gap").asDouble());
            assertThat(c.get("interval").get("upper").asDouble()).isGreaterThanOrEqualTo(c.get("reproduced_gap").asDouble());
        }

        // accuracy: statsmodels mcnemar(exact=True) on the 2x2 table of correct/incorrect
        JsonNode acc = comparison(report, "accuracy");
        assertThat(acc.get("method").asText()).isEqualTo("McNemar exact");
        assertThat(acc.get("discordant").get("first_only").asInt()).isEqualTo(PY.get("b_ours_only").asInt());
        assertThat(acc.get("discordant").get("second_only").asInt()).isEqualTo(PY.get("c_baseline_only").asInt());
        assertThat(acc.get("p_value").asDouble()).isCloseTo(PY.get("mcnemar_exact_p_value").asDouble(), within(1e-9));
        assertThat(acc.get("reproduced_gap").asDouble())
                .isCloseTo(PY.get("accuracy").get(0).asDouble() - PY.get("accuracy").get(1).asDouble(), within(1e-12));
        // "83.5" - "74.0": [0.8345 - 0.7405, 0.8355 - 0.7395]
        assertThat(acc.get("claimed_gap_interval").get(0).asDouble()).isCloseTo(0.094, within(1e-12));
        assertThat(acc.get("claimed_gap_interval").get(1).asDouble()).isCloseTo(0.096, within(1e-12));
        assertThat(acc.get("claimed_gap").asDouble()).isCloseTo(0.095, within(1e-12));
        assertThat(acc.get("verdict").asText()).isEqualTo("ordering not shown");   // p = 0.16

        // ROC AUC: pROC roc.test(paired = TRUE); the table claims Ours ahead, the reproduction the opposite
        JsonNode auc = comparison(report, "roc_auc");
        assertThat(auc.get("method").asText()).isEqualTo("paired DeLong");
        assertThat(auc.get("reproduced_gap").asDouble()).isCloseTo(R.get("auc_a").asDouble() - R.get("auc_b").asDouble(), within(1e-9));
        assertThat(auc.get("p_value").asDouble()).isCloseTo(R.get("p_value").asDouble(), within(1e-6 * R.get("p_value").asDouble()));
        assertThat(auc.get("interval").get("lower").asDouble()).isCloseTo(R.get("conf_int_95").get(0).asDouble(), within(1e-9));
        assertThat(auc.get("interval").get("upper").asDouble()).isCloseTo(R.get("conf_int_95").get(1).asDouble(), within(1e-9));
        assertThat(auc.get("claimed_gap_in_interval").asBoolean()).isFalse();
        assertThat(auc.get("verdict").asText()).isEqualTo("ordering reversed");

        // macro F1: the paired bootstrap; the gap is scikit-learn's f1_score(average="macro") difference
        JsonNode f1 = comparison(report, "macro_f1");
        assertThat(f1.get("method").asText()).isEqualTo("paired bootstrap");
        assertThat(f1.get("reproduced_gap").asDouble())
                .isCloseTo(PY.get("macro_f1").get(0).asDouble() - PY.get("macro_f1").get(1).asDouble(), within(1e-12));
        assertThat(f1.get("verdict").asText()).isEqualTo(f1.get("adjusted_p_value").asDouble() < 0.05
                ? "ordering replicated" : "ordering not shown");

        // Holm across the three comparisons, separately from the claims
        double[] adjusted = MultiplicityMethod.HOLM.adjust(pValues(comparisons, "p_value"));
        assertThat(pValues(comparisons, "adjusted_p_value")).containsExactly(adjusted, within(1e-15));

        String md = Files.readString(tmp.resolve("r/report.md"));
        assertThat(md).contains("### Compared rows").contains("ordering reversed").contains("ordering not shown")
                .contains("McNemar exact").contains("paired DeLong").contains("+9.50 points");
        Document html = Jsoup.parse(Files.readString(tmp.resolve("r/report.html")));
        List<Element> rows = html.select("table.comparisons tbody tr");
        assertThat(rows).hasSize(3);
        assertThat(rows).extracting(e -> e.attr("data-comparison"))
                .containsExactly("ordering not shown", f1.get("verdict").asText(), "ordering reversed");
        // the row label is text, never markup
        assertThat(html.select("table.comparisons b")).isEmpty();
        assertThat(rows.get(0).child(0).text()).isEqualTo("Ours − " + BASELINE);
    }

    @Test
    void benjaminiHochbergIsUsedAndStatedWhenAsked() throws Exception {
        JsonNode report = audit("bh", "--multiplicity", "bh");
        assertThat(report.get("settings").get("multiplicity").asText()).isEqualTo("bh");
        List<JsonNode> computed = new ArrayList<>();
        report.get("findings").forEach(f -> { if (f.has("p_value")) computed.add(f); });
        assertThat(computed).hasSize(6);
        double[] raw = new double[6];
        for (int i = 0; i < 6; i++) raw[i] = computed.get(i).get("p_value").asDouble();
        double[] bh = MultiplicityMethod.BH.adjust(raw);
        for (int i = 0; i < 6; i++) {
            assertThat(computed.get(i).get("adjusted_p_value").asDouble()).isCloseTo(bh[i], within(1e-15));
            assertThat(computed.get(i).get("holm_p_value").isNull()).isTrue();
        }
        JsonNode comparisons = report.get("comparisons");
        assertThat(pValues(comparisons, "adjusted_p_value"))
                .containsExactly(MultiplicityMethod.BH.adjust(pValues(comparisons, "p_value")), within(1e-15));
        String md = Files.readString(tmp.resolve("bh/report.md"));
        assertThat(md).contains("multiplicity: Benjamini–Hochberg across 6 claims").contains("| BH p |")
                .doesNotContain("Holm");

        // the audit file can ask for it too
        Files.writeString(tmp.resolve("audit.yaml"), Files.readString(tmp.resolve("audit.yaml")) + "multiplicity: bh\n");
        assertThat(audit("bh-file").get("settings").get("multiplicity").asText()).isEqualTo("bh");
    }

    @Test
    void approximateRandomizationIsSeededAndLeavesCountsAndAucToTheirExactTests() throws Exception {
        JsonNode one = audit("ar1", "--paired-test", "randomization", "--threads", "1");
        JsonNode three = audit("ar3", "--paired-test", "randomization", "--threads", "3");
        JsonNode f1 = comparison(one, "macro_f1");
        assertThat(f1.get("method").asText()).isEqualTo("approximate randomization");
        assertThat(f1.get("p_value").asDouble()).isEqualTo(comparison(three, "macro_f1").get("p_value").asDouble());
        // 2,000 trials: p = (1 + extreme) / 2001
        double extreme = f1.get("p_value").asDouble() * 2001 - 1;
        assertThat(extreme).isCloseTo(Math.rint(extreme), within(1e-6));
        assertThat(comparison(one, "accuracy").get("method").asText()).isEqualTo("McNemar exact");
        assertThat(comparison(one, "roc_auc").get("method").asText()).isEqualTo("paired DeLong");
        assertThat(one.get("settings").get("paired_test").asText()).isEqualTo("randomization");
    }

    @Test
    void rowsEvaluatedOnDifferentItemsAreAOneLineErrorNamingTheFirstMissingId() throws Exception {
        List<String> lines = new ArrayList<>(Files.readAllLines(tmp.resolve("baseline.csv")));
        String dropped = lines.remove(lines.size() - 1).split(",")[0];
        Files.write(tmp.resolve("baseline.csv"), lines);
        CliRun run = CliRun.of("audit", tmp.resolve("audit.yaml").toString(), "--out", tmp.resolve("x").toString(),
                "--resamples", "500");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err().strip().lines().count()).as(run.err()).isEqualTo(1);
        assertThat(run.err()).contains("'" + dropped + "'").contains("baseline.csv").contains("same ids");
    }

    @Test
    void anUnknownMultiplicityInTheAuditFileNamesTheField() throws Exception {
        Files.writeString(tmp.resolve("audit.yaml"), Files.readString(tmp.resolve("audit.yaml")) + "multiplicity: bonferroni\n");
        CliRun run = CliRun.of("audit", tmp.resolve("audit.yaml").toString(), "--out", tmp.resolve("x").toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("/multiplicity").contains("bonferroni").contains("bh");
    }
}
