package org.assay.metrics.regression;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.assay.common.UserInputException;
import org.assay.data.regression.RegressionData;
import org.assay.stats.Resampled;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The checks every metric must pass (modelled on the invariance suite scikit-learn runs over
 * its metrics; common practice): row order does not matter, integer weights give the value of
 * the data repeated that many times, and the closed-form jackknife equals the metric recomputed
 * without each unit. Data: the reference cases with ties (rounded values, integer ratings).
 */
class RegressionMetricsInvarianceTest {
    private static final com.fasterxml.jackson.databind.JsonNode CASES =
            ReferenceData.load("regression_reference.json").get("cases");

    static Stream<String> metrics() { return RegressionMetrics.ids().stream(); }

    private static List<RegressionData> dataSets() {
        List<RegressionData> out = new ArrayList<>();
        for (var c : CASES) out.add(RegressionMetricsReferenceTest.data(c));
        return out;
    }

    private static RegressionData repeated(RegressionData d, int[] w) {
        List<String> ids = new ArrayList<>();
        double[] t = new double[Arrays.stream(w).sum()];
        double[] p = new double[t.length];
        int k = 0;
        for (int i = 0; i < w.length; i++) {
            for (int r = 0; r < w[i]; r++, k++) {
                ids.add(d.ids().get(i) + "#" + r);
                t[k] = d.target()[i];
                p[k] = d.prediction()[i];
            }
        }
        return new RegressionData(d.source(), ids, t, p);
    }

    private static double value(String id, RegressionData d) {
        return RegressionMetrics.prepare(id, Map.of(), d).estimate();
    }

    /** Agreement up to rounding: the two sides sum the same terms in a different order. */
    private static void assertClose(double actual, double expected) {
        assertThat(actual).isCloseTo(expected, within(1e-11 * Math.max(1, Math.abs(expected))));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("metrics")
    void rowOrderDoesNotMatter(String id) {
        for (RegressionData d : dataSets()) {
            int n = d.size();
            int[] perm = IntStream.range(0, n).toArray();
            SplittableRandom rng = new SplittableRandom(3);
            for (int i = n - 1; i > 0; i--) {
                int j = rng.nextInt(i + 1);
                int tmp = perm[i]; perm[i] = perm[j]; perm[j] = tmp;
            }
            double[] t = new double[n], p = new double[n];
            for (int i = 0; i < n; i++) { t[i] = d.target()[perm[i]]; p[i] = d.prediction()[perm[i]]; }
            assertClose(value(id, new RegressionData(d.source(), d.ids(), t, p)), value(id, d));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("metrics")
    void integerWeightsEqualRepetition(String id) {
        SplittableRandom rng = new SplittableRandom(4);
        for (RegressionData d : dataSets()) {
            Resampled statistic = RegressionMetrics.prepare(id, Map.of(), d);
            for (int trial = 0; trial < 5; trial++) {
                int[] w = new int[d.size()];
                for (int i = 0; i < w.length; i++) w[i] = rng.nextInt(4);   // zeros included
                w[0] = Math.max(w[0], 1);
                w[1] = Math.max(w[1], 1);
                assertClose(statistic.value(w), value(id, repeated(d, w)));
            }
            int[] ones = new int[d.size()];
            Arrays.fill(ones, 1);
            assertThat(statistic.value(ones)).isEqualTo(statistic.estimate());
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("metrics")
    void jackknifeEqualsLeaveOneOut(String id) {
        for (RegressionData d : dataSets()) {
            Resampled statistic = RegressionMetrics.prepare(id, Map.of(), d);
            double[] jack = statistic.jackknife();
            assertThat(jack).hasSize(d.size());
            for (int i = 0; i < d.size(); i++) {
                int[] w = new int[d.size()];
                Arrays.fill(w, 1);
                w[i] = 0;
                assertClose(jack[i], value(id, repeated(d, w)));
            }
        }
    }

    /**
     * Spearman under heavy ties, against a direct computation: mid-ranks of the repeated data by
     * counting (rank = #smaller + (#equal + 1) / 2, the definition in scipy.stats.rankdata
     * method='average'), then Pearson's formula in two passes.
     */
    @Test
    void spearmanWeightedMidRanksMatchADirectComputation() {
        double[] x = {3, 1, 2, 2, 3, 3, 1, 5, 2, 4};
        double[] y = {1, 1, 2, 3, 3, 2, 1, 3, 2, 1};
        int[] w = {2, 0, 1, 3, 1, 0, 2, 1, 1, 4};
        double expected = directSpearman(repeat(x, w), repeat(y, w));
        assertThat(new SpearmanStatistic(x, y).value(w)).isCloseTo(expected, within(1e-13));
        assertThat(new SpearmanStatistic(x, y).estimate()).isCloseTo(directSpearman(x, y), within(1e-13));
    }

    @Test
    void spearmanJackknifeIsNaNWhereRemovingAUnitLeavesAConstant() {
        // Without unit 3 the prediction is constant: undefined, as the direct computation shows.
        double[] x = {1, 1, 1, 2};
        double[] y = {1, 2, 3, 4};
        double[] jack = new SpearmanStatistic(x, y).jackknife();
        assertThat(jack[3]).isNaN();
        assertThat(new SpearmanStatistic(x, y).value(new int[] {1, 1, 1, 0})).isNaN();
        assertThat(jack[0]).isCloseTo(directSpearman(new double[] {1, 1, 2}, new double[] {2, 3, 4}), within(1e-13));
    }

    /** The closed forms stay exact far from zero: r computed from uncentred raw sums would not. */
    @Test
    void correlationIsExactForALargeOffsetAndItsShift() {
        SplittableRandom rng = new SplittableRandom(5);
        int n = 500;
        double[] x = new double[n], y = new double[n], xs = new double[n], ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = rng.nextDouble() * 4 - 2;         // exact multiples of 2^-51 up to |2|
            ys[i] = xs[i] + (rng.nextDouble() - 0.5);
            x[i] = 1e8 + xs[i];                        // shifting by 1e8 rounds to 2^-26 steps
            y[i] = 1e8 + ys[i];
        }
        // Shift invariance (Pearson's r is unchanged by adding a constant; common practice),
        // up to the rounding of x and y themselves when 1e8 is added (relative 1e-8 here).
        double[] xr = new double[n], yr = new double[n];
        for (int i = 0; i < n; i++) { xr[i] = x[i] - 1e8; yr[i] = y[i] - 1e8; }  // exact (Sterbenz)
        double centred = PearsonCorrelation.of(x, y).estimate();
        assertThat(centred).isCloseTo(PearsonCorrelation.of(xr, yr).estimate(), within(1e-12));
        assertThat(centred).isCloseTo(PearsonCorrelation.of(xs, ys).estimate(), within(1e-6));
        assertThat(Determination.of(new RegressionData(Path.of("o.csv"), ids(n), y, x)).estimate())
                .isCloseTo(Determination.of(new RegressionData(Path.of("o.csv"), ids(n), yr, xr)).estimate(), within(1e-12));
    }

    @Test
    void unknownMetricAndParametersAreUserErrors() {
        RegressionData d = dataSets().get(0);
        assertThatThrownBy(() -> RegressionMetrics.prepare("mape", Map.of(), d))
                .isInstanceOf(UserInputException.class)
                .hasMessageContaining("unknown regression metric 'mape'")
                .hasMessageContaining("mae, rmse, r2, pearson, spearman");
        assertThatThrownBy(() -> RegressionMetrics.prepare("rmse", Map.of("k", "3"), d))
                .isInstanceOf(UserInputException.class)
                .hasMessageContaining("takes no parameter 'k'");
    }

    private static List<String> ids(int n) {
        return IntStream.range(0, n).mapToObj(i -> "u" + i).toList();
    }

    private static double[] repeat(double[] v, int[] w) {
        double[] out = new double[Arrays.stream(w).sum()];
        int k = 0;
        for (int i = 0; i < v.length; i++) for (int r = 0; r < w[i]; r++) out[k++] = v[i];
        return out;
    }

    private static double[] midRanks(double[] v) {
        double[] r = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            int smaller = 0, equal = 0;
            for (double u : v) { if (u < v[i]) smaller++; else if (u == v[i]) equal++; }
            r[i] = smaller + (equal + 1) / 2.0;
        }
        return r;
    }

    private static double directSpearman(double[] x, double[] y) {
        double[] a = midRanks(x), b = midRanks(y);
        double ma = Arrays.stream(a).average().orElseThrow(), mb = Arrays.stream(b).average().orElseThrow();
        double sab = 0, saa = 0, sbb = 0;
        for (int i = 0; i < a.length; i++) {
            sab += (a[i] - ma) * (b[i] - mb);
            saa += (a[i] - ma) * (a[i] - ma);
            sbb += (b[i] - mb) * (b[i] - mb);
        }
        return sab / Math.sqrt(saa * sbb);
    }
}
