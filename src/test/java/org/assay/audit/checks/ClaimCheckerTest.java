package org.assay.audit.checks;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.assay.claims.ClaimsReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Each claim-only rule on a small table where the right answer follows from a fact of the trade
 * (named beside each case), in both directions: the rule fires on the bad value and stays quiet on
 * a good one. The statistics behind the rules are tested against references in org.assay.stats.
 */
class ClaimCheckerTest {
    @TempDir Path tmp;

    private CheckResult check(String tableFacts, String... claims) throws Exception {
        StringBuilder y = new StringBuilder("tables:\n  - id: T\n");
        for (String line : tableFacts.split("\n")) if (!line.isBlank()) y.append("    ").append(line).append('\n');
        y.append("    claims:\n");
        for (String c : claims) y.append("      - ").append(c).append('\n');
        Path f = Files.writeString(tmp.resolve("c" + System.nanoTime() + ".yaml"), y.toString());
        return new ClaimChecker().check(ClaimsReader.read(f));
    }

    private static List<CheckFinding> of(CheckResult r, String rule, CheckKind kind) {
        return r.findings().stream().filter(f -> f.rule().equals(rule) && f.kind() == kind).toList();
    }

    private static String acc(String row, String value) {
        return "{row: " + row + ", column: [Acc], metric: accuracy, value: \"" + value + "\", scale: percent}";
    }

    @Test
    void granularity() throws Exception {
        // k/1000 gives 94.10 or 94.20, never 94.13 (the GRIM rule, Brown & Heathers 2017, applied to k/N)
        CheckResult bad = check("test_size: 1000", acc("A", "94.13"));
        assertThat(of(bad, "granularity", CheckKind.INFEASIBLE)).singleElement()
                .satisfies(f -> assertThat(f.message()).contains("94.10").contains("94.20"));
        assertThat(of(check("test_size: 1000", acc("A", "94.1")), "granularity", CheckKind.INFEASIBLE)).isEmpty();
        // averaged over 3 runs the grid is k/3000: 2824/3000 = 94.133... prints as 94.13
        assertThat(of(check("test_size: 1000\nruns: 3", acc("A", "94.13")), "granularity", CheckKind.INFEASIBLE)).isEmpty();
        // no size: listed as not checked, never an error
        assertThat(of(check("", acc("A", "94.13")), "granularity", CheckKind.NOT_CHECKED)).hasSize(1);
        // a claim's own size overrides the table's (a retrieval direction with its own query count)
        String own = "{row: A, column: [R@1], metric: recall_at_k, params: {k: 1}, value: \"41.13\", scale: percent, test_size: 1000}";
        assertThat(of(check("test_size: 5000", own), "granularity", CheckKind.INFEASIBLE)).hasSize(1);
    }

    @Test
    void ratioFeasibility() throws Exception {
        // recall = TP/P with P = 10 positives moves in steps of 0.1 (common practice arithmetic)
        String recall = "{row: A, column: [R], metric: recall, params: {positive: pos}, value: \"0.333\", scale: fraction}";
        assertThat(of(check("test_size: 100\nclass_counts: {pos: 10, neg: 90}", recall), "ratio-feasibility",
                CheckKind.INFEASIBLE)).hasSize(1);
        // over every split of 100 items, 1/3 is reachable (TP = 1, P = 3)
        assertThat(of(check("test_size: 100", recall), "ratio-feasibility", CheckKind.INFEASIBLE)).isEmpty();
        // AUC with 2 positives and 2 negatives: U in halves over 4 pairs, steps of 0.125 (Hanley & McNeil 1982: AUC = U/(n_pos n_neg))
        String auc = "{row: A, column: [AUC], metric: roc_auc, value: \"0.60\", scale: fraction}";
        assertThat(of(check("test_size: 4\nclass_counts: {a: 2, b: 2}", auc), "ratio-feasibility", CheckKind.INFEASIBLE))
                .hasSize(1);
        String aucOk = "{row: A, column: [AUC], metric: roc_auc, value: \"0.625\", scale: fraction}";
        assertThat(of(check("test_size: 4\nclass_counts: {a: 2, b: 2}", aucOk), "ratio-feasibility", CheckKind.INFEASIBLE))
                .isEmpty();
        assertThat(of(check("test_size: 4", auc), "ratio-feasibility", CheckKind.NOT_CHECKED)).hasSize(1);
    }

    @Test
    void macroPrecisionAndF1AreCheckedThroughTheMacroRecallValuesTheyContain() throws Exception {
        // with every class predicted exactly as often as it occurs, per-class precision = recall = F1 = t/n_c
        // (common practice arithmetic), so 0.75 = (1 + 1/2)/2 with classes of 2 and 2 items is reachable
        String ok = "{row: A, column: [F1], metric: macro_f1, value: \"0.75\", scale: fraction}";
        CheckResult r = check("test_size: 4\nclass_counts: {a: 2, b: 2}", ok);
        assertThat(r.checksRun()).containsEntry("ratio-feasibility", 1);
        assertThat(r.findings().stream().filter(f -> f.rule().equals("ratio-feasibility"))).isEmpty();
        // 0.60 is not a macro recall value there (steps of 0.25); for F1 that proves nothing, so it is only a note
        CheckResult note = check("test_size: 4\nclass_counts: {a: 2, b: 2}", ok.replace("0.75", "0.60"));
        assertThat(of(note, "ratio-feasibility", CheckKind.NOTE)).hasSize(1);
        assertThat(of(note, "ratio-feasibility", CheckKind.INFEASIBLE)).isEmpty();
    }

    @Test
    void f1MustBeTheHarmonicMeanOfPrecisionAndRecall() throws Exception {
        // F1 = 2PR/(P+R): P = 0.80, R = 0.60 give 0.686 (common practice: the definition of F1)
        String p = "{row: A, column: [P], metric: precision, value: \"0.80\", scale: fraction}";
        String r = "{row: A, column: [R], metric: recall, value: \"0.60\", scale: fraction}";
        assertThat(of(check("", p, r, "{row: A, column: [F1], metric: f1, value: \"0.75\", scale: fraction}"),
                "f1-consistency", CheckKind.INFEASIBLE)).hasSize(1);
        assertThat(of(check("", p, r, "{row: A, column: [F1], metric: f1, value: \"0.69\", scale: fraction}"),
                "f1-consistency", CheckKind.INFEASIBLE)).isEmpty();
        // macro F1 is the mean of per-class F1, not the harmonic mean of macro P and R: a note, not a flag
        CheckResult macro = check("", p.replace("precision", "macro_precision"), r.replace("recall", "macro_recall"),
                "{row: A, column: [F1], metric: macro_f1, value: \"0.75\", scale: fraction}");
        assertThat(of(macro, "f1-consistency", CheckKind.INFEASIBLE)).isEmpty();
        assertThat(of(macro, "f1-consistency", CheckKind.NOTE)).hasSize(1);
    }

    @Test
    void recallAtKCannotFallAsKGrows() throws Exception {
        // a hit in the top 1 is a hit in the top 5 (common practice: Recall@K is cumulative)
        String r1 = "{row: A, column: [T2I, R@1], metric: recall_at_k, params: {k: 1}, value: \"60.2\", scale: percent}";
        String r5 = "{row: A, column: [T2I, R@5], metric: recall_at_k, params: {k: 5}, value: \"58.0\", scale: percent}";
        assertThat(of(check("", r1, r5), "monotone-in-k", CheckKind.INFEASIBLE)).hasSize(1);
        assertThat(of(check("", r1, r5.replace("58.0", "80.0")), "monotone-in-k", CheckKind.INFEASIBLE)).isEmpty();
        // equal after rounding is fine: 60.2 and 60.2
        assertThat(of(check("", r1, r5.replace("58.0", "60.2")), "monotone-in-k", CheckKind.INFEASIBLE)).isEmpty();
    }

    @Test
    void summaryColumnsEqualTheMeanOrSumOfTheirColumns() throws Exception {
        String a = "{row: A, column: [X], metric: accuracy, value: \"50.0\", scale: percent}";
        String b = "{row: A, column: [Y], metric: accuracy, value: \"60.0\", scale: percent}";
        // the mean of 50.0 and 60.0 lies in [54.95, 55.05] (interval arithmetic; common practice)
        assertThat(of(check("", a, b, "{row: A, column: [Avg], metric: accuracy, value: \"56.0\", scale: percent}"),
                "summary-column", CheckKind.INFEASIBLE)).hasSize(1);
        assertThat(of(check("", a, b, "{row: A, column: [Avg], metric: accuracy, value: \"55.0\", scale: percent}"),
                "summary-column", CheckKind.INFEASIBLE)).isEmpty();
        // RSUM is a sum: 50.0 + 60.0 = 110.0
        assertThat(of(check("", a, b, "{row: A, column: [RSUM], metric: rsum, value: \"110.0\", scale: percent}"),
                "summary-column", CheckKind.INFEASIBLE)).isEmpty();
        assertThat(of(check("", a, b, "{row: A, column: [RSUM], metric: rsum, value: \"111.2\", scale: percent}"),
                "summary-column", CheckKind.INFEASIBLE)).hasSize(1);
    }

    @Test
    void rangeAndScale() throws Exception {
        // an accuracy cannot exceed 100 percent; MCC lies in [-1, 1] (common practice)
        assertThat(of(check("", acc("A", "101.2")), "range", CheckKind.INFEASIBLE)).hasSize(1);
        assertThat(of(check("", "{row: A, column: [M], metric: mcc, value: \"-1.2\", scale: fraction}"), "range",
                CheckKind.INFEASIBLE)).hasSize(1);
        assertThat(of(check("", acc("A", "99.9")), "range", CheckKind.INFEASIBLE)).isEmpty();
        // a 0.94 among percentages is most likely a fraction
        CheckResult mix = check("", acc("A", "93.1"), acc("B", "0.94"), acc("C", "92.0"));
        assertThat(of(mix, "scale-mix-up", CheckKind.QUESTIONABLE)).singleElement()
                .satisfies(f -> assertThat(f.claims().get(0).row()).isEqualTo("B"));
        assertThat(of(check("", acc("A", "93.1"), acc("B", "91.4")), "scale-mix-up", CheckKind.QUESTIONABLE)).isEmpty();
    }

    @Test
    void plusMinusMustFitItsKind() throws Exception {
        // the standard error of a proportion on 100 items is at most sqrt(0.25/100) = 5 points (common practice)
        String se = "{row: A, column: [Acc], metric: accuracy, value: \"50.0\", scale: percent, pm: 8.0, pm_kind: se}";
        assertThat(of(check("test_size: 100", se), "plus-minus", CheckKind.INFEASIBLE)).hasSize(1);
        assertThat(of(check("test_size: 100", se.replace("8.0", "4.9")), "plus-minus", CheckKind.INFEASIBLE)).isEmpty();
        // a 95% interval of ±0.1 points for 90% on 1,000 items is far narrower than sampling allows (Wilson ±1.9)
        String ci = "{row: A, column: [Acc], metric: accuracy, value: \"90.0\", scale: percent, pm: 0.1, pm_kind: ci95}";
        assertThat(of(check("test_size: 1000", ci), "plus-minus", CheckKind.QUESTIONABLE)).hasSize(1);
        assertThat(of(check("test_size: 1000", ci.replace("0.1", "1.9")), "plus-minus", CheckKind.QUESTIONABLE)).isEmpty();
    }

    @Test
    void digitsBeyondWhatTheTestSetSupports() throws Exception {
        // with 100 items a proportion near 0.94 has a 95% Wilson interval of about 0.87 to 0.97 (common practice):
        // a half-width of a few points supports one decimal at most (two significant digits, GUM §7.2.6)
        assertThat(of(check("test_size: 100", acc("A", "94.13")), "precision", CheckKind.OVERSTATED_PRECISION)).hasSize(1);
        assertThat(of(check("test_size: 100", acc("A", "94.0")), "precision", CheckKind.OVERSTATED_PRECISION)).isEmpty();
        // with 100,000 items the half-width is about 0.15 points, so two decimals are supported
        assertThat(of(check("test_size: 100000", acc("A", "94.13")), "precision", CheckKind.OVERSTATED_PRECISION)).isEmpty();
        // a printed ± decides instead: ±0.3 supports two decimals
        String pm = "{row: A, column: [Acc], metric: accuracy, value: \"94.13\", scale: percent, pm: 0.31, pm_kind: ci95}";
        assertThat(of(check("test_size: 100", pm), "precision", CheckKind.OVERSTATED_PRECISION)).isEmpty();
    }

    @Test
    void leadsSmallerThanTheTestSetCanResolve() throws Exception {
        // 91.2 vs 91.0 on 500 items is one item: an exact McNemar test needs at least 6 one-way discordant items
        // to reach p < 0.05 (common practice; statsmodels mcnemar), so no disagreement pattern can make it significant
        CheckResult small = check("test_size: 500", acc("Ours", "91.2"), acc("Base", "91.0"));
        assertThat(of(small, "gap", CheckKind.UNRESOLVED_GAP)).hasSize(1);
        // 91.2 vs 90.8 on 2,000 items: significant only if the systems almost never disagree -> a note
        CheckResult mid = check("test_size: 2000", acc("Ours", "91.2"), acc("Base", "90.8"));
        assertThat(of(mid, "gap", CheckKind.UNRESOLVED_GAP)).isEmpty();
        assertThat(of(mid, "gap", CheckKind.NOTE)).hasSize(1);
        // 95.0 vs 80.0 on 1,000 items is resolvable whatever the disagreement
        CheckResult big = check("test_size: 1000", acc("Ours", "95.0"), acc("Base", "80.0"));
        assertThat(big.findings().stream().filter(f -> f.rule().equals("gap"))).isEmpty();
        assertThat(big.checksRun()).containsEntry("gap", 1);
    }

    @Test
    void findingIdsAreStableAcrossRuns() throws Exception {
        CheckResult a = check("test_size: 1000", acc("A", "94.13"));
        CheckResult b = check("test_size: 1000", acc("A", "94.13"));
        assertThat(a.findings().get(0).id()).isEqualTo(b.findings().get(0).id()).startsWith("granularity-");
    }

    @Test
    void generationScoresMustStateTheirConfiguration() throws Exception {
        // BLEU depends on the tokenizer and casing by more than a printed decimal (Post 2018, WMT,
        // "A Call for Clarity in Reporting BLEU Scores"); ROUGE on stemming.
        CheckResult bare = check("test_size: 2000",
                "{row: A, column: [BLEU], metric: bleu, value: \"27.3\", scale: percent}",
                "{row: A, column: [R-L], metric: rouge_l, value: \"41.0\", scale: percent}");
        assertThat(of(bare, "configuration", CheckKind.QUESTIONABLE)).hasSize(2)
                .anySatisfy(f -> assertThat(f.message()).contains("tokenize, lowercase").contains("fraction of a point"));
        CheckResult stated = check("test_size: 2000",
                "{row: A, column: [BLEU], metric: bleu, params: {tokenize: 13a, lowercase: false}, value: \"27.3\", scale: percent}",
                "{row: A, column: [R-L], metric: rouge_l, params: {stem: true}, value: \"41.0\", scale: percent}");
        assertThat(of(stated, "configuration", CheckKind.QUESTIONABLE)).isEmpty();
        assertThat(stated.checksRun()).containsEntry("configuration", 2);
    }

    @Test
    void unknownMetric() throws Exception {
        // a typo one edit from a registered id: named, with the nearest id, and listed as not checked
        CheckResult typo = check("test_size: 1000", "{row: A, column: [Acc], metric: acuracy, value: \"94.13\", scale: percent}");
        assertThat(of(typo, "metric", CheckKind.NOT_CHECKED)).singleElement().satisfies(f -> {
            assertThat(f.message()).contains("'acuracy'").contains("perhaps accuracy").contains("line 5");
            assertThat(f.claims()).singleElement().satisfies(c -> assertThat(c.metric()).isEqualTo("acuracy"));
        });
        // extract's placeholder says the metric was never set; far from every id, so no guess
        CheckResult placeholder = check("", "{row: A, column: [Params], metric: unknown, value: \"12\", scale: fraction}");
        assertThat(of(placeholder, "metric", CheckKind.NOT_CHECKED)).singleElement()
                .satisfies(f -> assertThat(f.message()).contains("no metric is set").doesNotContain("perhaps"));
        // a known metric: quiet, but counted as checked
        CheckResult known = check("test_size: 1000", acc("A", "94.1"));
        assertThat(known.findings()).noneMatch(f -> f.rule().equals("metric"));
        assertThat(known.checksRun()).containsEntry("metric", 1);
    }

    @Test
    void aValueAboveTheRangeIsReportedOnceAndBreaksNoOtherRule() throws Exception {
        // accuracy lies in [0, 100] percent (its definition); 104.2 beside a valid row once stopped the
        // gap rule's two-proportion test with an error that named no file
        CheckResult r = check("test_size: 2000", acc("A", "104.2"), acc("B", "91.3"));
        assertThat(of(r, "range", CheckKind.INFEASIBLE)).singleElement()
                .satisfies(f -> assertThat(f.claims().get(0).value().text()).isEqualTo("104.2"));
        assertThat(r.findings()).noneMatch(f -> f.rule().equals("gap"));
        // the same pair inside the range is still compared
        assertThat(check("test_size: 2000", acc("A", "94.2"), acc("B", "91.3")).checksRun()).containsEntry("gap", 1);
    }
}
