package org.assay.metrics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.assay.data.ClassificationData;
import org.assay.data.regression.RegressionData;
import org.assay.stats.ApproximateRandomization;
import org.assay.stats.BootstrapDistribution;
import org.assay.stats.BootstrapEngine;
import org.assay.stats.McNemarTest;
import org.assay.stats.PairedDifference;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;

/**
 * The paired bootstrap (Koehn 2004, EMNLP) and approximate randomization (Riezler &amp; Maxwell
 * 2005) over real metric statistics: weights = repetition, agreement with an independent numpy /
 * scikit-learn paired bootstrap, and the exact permutation p-value against scipy
 * (paired_reference.py; versions in generated_by).
 */
class PairedResamplingTest {
    private static final JsonNode REFERENCE = ReferenceData.load("paired_reference.json");

    private static ClassificationData classes3(int[] truth, int[] predicted) {
        return TestData.of(3, truth, predicted, null, null);
    }

    private static SumStatistic sum(String metric, org.assay.data.EvaluationData data) {
        var statistic = MetricRegistry.get(metric).prepare(data, Map.of()).statistic();
        return statistic instanceof CellStatistic c ? c.asSum() : (SumStatistic) statistic;
    }

    private static int[] ints(JsonNode a) { return ReferenceData.ints(a); }

    /** B's items listed in another order: B'[j] = B[order[j]], so A's item i sits at position inverse[i] of B'. */
    private static int[] inverse(int[] order) {
        int[] inv = new int[order.length];
        for (int j = 0; j < order.length; j++) inv[order[j]] = j;
        return inv;
    }

    private static int[] shuffled(int n, long seed) {
        int[] order = new int[n];
        for (int i = 0; i < n; i++) order[i] = i;
        SplittableRandom rng = new SplittableRandom(seed);
        for (int i = n - 1; i > 0; i--) {
            int j = rng.nextInt(i + 1);
            int t = order[i];
            order[i] = order[j];
            order[j] = t;
        }
        return order;
    }

    private static int[] reorder(int[] values, int[] order) {
        int[] out = new int[values.length];
        for (int j = 0; j < order.length; j++) out[j] = values[order[j]];
        return out;
    }

    /**
     * The same integer weights applied to both systems give exactly the difference of the metric on
     * the data repeated that many times (DESIGN.md principle 1), even when B's file lists the items
     * in another order; leaving one item out leaves it out of both (the jackknife).
     */
    @Test
    void pairedWeightsEqualRepetitionOfTheSameItemsInBothSystems() {
        JsonNode c = REFERENCE.get("bootstrap_case");
        int[] truth = ints(c.get("truth"));
        int[] a = ints(c.get("a"));
        int[] b = ints(c.get("b"));
        int n = truth.length;
        int[] order = shuffled(n, 7);
        ClassificationData dataA = classes3(truth, a);
        ClassificationData dataB = classes3(reorder(truth, order), reorder(b, order));
        PairedDifference d = new PairedDifference(sum("macro_f1", dataA), sum("macro_f1", dataB), inverse(order));
        SplittableRandom rng = new SplittableRandom(11);
        for (int trial = 0; trial < 20; trial++) {
            int[] w = new int[n];
            for (int draw = 0; draw < n; draw++) w[rng.nextInt(n)]++;
            double expected = MetricRegistry.get("macro_f1").prepare(TestData.repeated(classes3(truth, a), w), Map.of()).value()
                    - MetricRegistry.get("macro_f1").prepare(TestData.repeated(classes3(truth, b), w), Map.of()).value();
            assertThat(d.value(w)).as("trial " + trial).isCloseTo(expected, within(1e-12));
        }
        double[] jack = d.jackknife();
        for (int i = 0; i < n; i += 7) {
            int[] w = new int[n];
            java.util.Arrays.fill(w, 1);
            w[i] = 0;
            assertThat(jack[i]).isCloseTo(d.value(w), within(1e-12));
        }
    }

    /**
     * An independent paired bootstrap (numpy resampling, scikit-learn f1_score, 20,000 resamples)
     * of a macro-F1 difference on 60 items: the standard error, the 2.5% and 97.5% percentiles and
     * the share of resamples at or below 0 agree within Monte Carlo error (both sides 20,000
     * resamples: about 0.5% relative error of a standard error each, 0.02 standard errors at a 2.5%
     * quantile, sqrt(2 p (1 - p) / 20000) on a share). Resampling each system on its own instead
     * gives the unpaired standard error, more than twice as large for these correlated systems.
     */
    @Test
    void pairedBootstrapAgreesWithAnIndependentComputation() {
        JsonNode c = REFERENCE.get("bootstrap_case");
        int[] truth = ints(c.get("truth"));
        ClassificationData dataA = classes3(truth, ints(c.get("a")));
        ClassificationData dataB = classes3(truth, ints(c.get("b")));
        int n = truth.length;
        int[] same = new int[n];
        for (int i = 0; i < n; i++) same[i] = i;
        BootstrapEngine engine = new BootstrapEngine(20_000, 20240917L, 2);
        BootstrapDistribution paired = engine.run(new PairedDifference(sum("macro_f1", dataA), sum("macro_f1", dataB), same));
        double se = c.get("standard_error").asDouble();
        assertThat(paired.estimate()).isCloseTo(c.get("difference").asDouble(), within(1e-12));
        assertThat(paired.standardError()).isCloseTo(se, within(0.04 * se));
        var percentile = paired.percentile(0.95);
        assertThat(percentile.lower()).isCloseTo(c.get("percentile_2_5").asDouble(), within(0.2 * se));
        assertThat(percentile.upper()).isCloseTo(c.get("percentile_97_5").asDouble(), within(0.2 * se));
        double share = 0;
        for (double r : paired.replicates()) if (r <= 0) share++;
        share /= paired.resamples();
        double expected = c.get("share_at_or_below_zero").asDouble();
        assertThat(share).isCloseTo(expected, within(4 * Math.sqrt(2 * expected * (1 - expected) / 20_000)));

        double seA = engine.run(sum("macro_f1", dataA)).standardError();
        double seB = new BootstrapEngine(20_000, 99L, 2).run(sum("macro_f1", dataB)).standardError();
        double unpaired = Math.sqrt(seA * seA + seB * seB);
        double expectedUnpaired = c.get("unpaired_standard_error").asDouble();
        assertThat(unpaired).isCloseTo(expectedUnpaired, within(0.04 * expectedUnpaired));
        assertThat(paired.standardError()).isLessThan(0.5 * unpaired);
    }

    private static org.assay.stats.SwapStatistic swapStatistic(JsonNode c) {
        int[] order = shuffled(c.get("a").size(), 3);
        int[] back = inverse(order);
        if (c.get("metric").asText().equals("mae")) {
            double[] target = ReferenceData.doubles(c.get("target"));
            double[] a = ReferenceData.doubles(c.get("a"));
            double[] b = ReferenceData.doubles(c.get("b"));
            List<String> ids = new ArrayList<>();
            double[] tb = new double[a.length], pb = new double[a.length];
            for (int j = 0; j < a.length; j++) {
                ids.add("i" + j);
                tb[j] = target[order[j]];
                pb[j] = b[order[j]];
            }
            return new SwappedSums(sum("mae", new RegressionData(Path.of("a.csv"), ids, target, a)),
                    sum("mae", new RegressionData(Path.of("b.csv"), ids, tb, pb)), back);
        }
        int[] truth = ints(c.get("truth"));
        return new SwappedSums(sum(c.get("metric").asText(), classes3(truth, ints(c.get("a")))),
                sum(c.get("metric").asText(), classes3(reorder(truth, order), reorder(ints(c.get("b")), order))), back);
    }

    /**
     * scipy.stats.permutation_test(permutation_type="samples", n_resamples=inf): every one of the
     * 2^n ways to swap items' outputs between the systems, for macro F1, accuracy and MAE on 9-12
     * items. With at least 2^n trials the test enumerates them and must give the same p-value.
     */
    @Test
    void exactRandomizationMatchesScipysExactPermutationTest() {
        int checked = 0;
        for (JsonNode c : REFERENCE.get("randomization_cases")) {
            ApproximateRandomization.Result r = new ApproximateRandomization(10_000, 1L, 2).test(swapStatistic(c));
            String name = c.get("name").asText();
            assertThat(r.exact()).as(name).isTrue();
            assertThat(r.trials()).isEqualTo(1L << c.get("a").size());
            assertThat(r.observed()).as(name).isCloseTo(c.get("statistic").asDouble(), within(1e-12));
            assertThat(r.pValue()).as(name).isCloseTo(c.get("p_value").asDouble(), within(1e-12));
            checked++;
        }
        assertThat(checked).isEqualTo(8);
    }

    /**
     * For 0/1 outcomes only the discordant items change the difference when swapped, each by a fair
     * sign: the exact randomization test is McNemar's exact test (statsmodels' value is checked in
     * McNemarTestTest), which is why assay uses McNemar for count metrics.
     */
    @Test
    void exactRandomizationOfAccuracyIsMcNemarsExactTest() {
        for (JsonNode c : REFERENCE.get("randomization_cases")) {
            if (!c.get("metric").asText().equals("accuracy")) continue;
            int[] truth = ints(c.get("truth")), a = ints(c.get("a")), b = ints(c.get("b"));
            long onlyA = 0, onlyB = 0;
            for (int i = 0; i < truth.length; i++) {
                if (a[i] == truth[i] && b[i] != truth[i]) onlyA++;
                if (a[i] != truth[i] && b[i] == truth[i]) onlyB++;
            }
            assertThat(McNemarTest.exactPValue(onlyA, onlyB)).as(c.get("name").asText())
                    .isCloseTo(c.get("p_value").asDouble(), within(1e-12));
        }
    }

    /**
     * Sampled trials: the same seed gives the same p-value for any thread count, and on 20 items
     * (2^20 patterns, enumerated for the exact value) 20,000 sampled trials land within four Monte
     * Carlo standard errors of the exact p-value.
     */
    @Test
    void sampledRandomizationIsSeededAndApproachesTheExactValue() {
        SplittableRandom rng = new SplittableRandom(5);
        int n = 20;
        int[] truth = new int[n], a = new int[n], b = new int[n];
        for (int i = 0; i < n; i++) {
            truth[i] = rng.nextInt(3);
            a[i] = rng.nextDouble() < 0.75 ? truth[i] : rng.nextInt(3);
            b[i] = rng.nextDouble() < 0.55 ? truth[i] : rng.nextInt(3);
        }
        int[] same = new int[n];
        for (int i = 0; i < n; i++) same[i] = i;
        SwappedSums s = new SwappedSums(sum("macro_f1", classes3(truth, a)), sum("macro_f1", classes3(truth, b)), same);
        ApproximateRandomization.Result one = new ApproximateRandomization(20_000, 42L, 1).test(s);
        ApproximateRandomization.Result three = new ApproximateRandomization(20_000, 42L, 3).test(s);
        assertThat(one).isEqualTo(three);
        assertThat(one.exact()).isFalse();
        double exact = new ApproximateRandomization(1 << 20, 1L, 2).test(s).pValue();
        assertThat(new ApproximateRandomization(1 << 20, 1L, 2).test(s).exact()).isTrue();
        assertThat(exact).isBetween(0.01, 0.99);
        assertThat(one.pValue()).isCloseTo(exact, within(4 * Math.sqrt(exact * (1 - exact) / 20_000) + 1.0 / 20_001));
    }
}
