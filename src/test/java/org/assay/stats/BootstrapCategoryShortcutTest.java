package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Statistics of category counts are resampled by drawing the counts from Multinomial(n, observed
 * shares) instead of n weights. Resampling units with replacement and counting them per category
 * gives exactly that multinomial (common practice), so the replicates must have the law the
 * weight vectors give: compared here on fixed cases through their moments, quantiles, a
 * goodness-of-fit test of one cell and the covariance of two cells. The draws differ, so the
 * comparisons are statistical, with tolerances of several Monte Carlo standard errors.
 */
class BootstrapCategoryShortcutTest {
    /** A 3 x 3 confusion matrix (row = true class), n = 120, row-major as the metrics keep it. */
    private static final long[] CELLS = {30, 6, 4, 5, 25, 10, 2, 8, 30};

    /** Macro F1 over three classes from cell counts, as in ConfusionMatrix (zero when 0/0). */
    static double macroF1(double[] m) {
        double sum = 0;
        for (int c = 0; c < 3; c++) {
            double tp = m[c * 3 + c];
            double truth = m[c * 3] + m[c * 3 + 1] + m[c * 3 + 2];
            double predicted = m[c] + m[3 + c] + m[6 + c];
            sum += truth + predicted == 0 ? 0 : 2 * tp / (truth + predicted);
        }
        return sum / 3;
    }

    /** One unit per example, in the cell of its count; the counts shortcut is offered. */
    record Cells(long[] cells, java.util.function.ToDoubleFunction<double[]> f) implements CategoryCounts {
        int[] cellOfUnit() {
            int n = 0;
            for (long c : cells) n += (int) c;
            int[] out = new int[n];
            int at = 0;
            for (int j = 0; j < cells.length; j++) for (long r = 0; r < cells[j]; r++) out[at++] = j;
            return out;
        }

        @Override public int units() { return cellOfUnit().length; }
        @Override public long[] categoryCounts() { return cells.clone(); }
        @Override public double valueOfCounts(double[] counts) { return f.applyAsDouble(counts); }
        @Override public double estimate() { return value(null); }

        @Override public double value(int[] weights) {
            double[] counts = new double[cells.length];
            int[] cell = cellOfUnit();
            for (int i = 0; i < cell.length; i++) counts[cell[i]] += weights == null ? 1 : weights[i];
            return f.applyAsDouble(counts);
        }

        @Override public double[] jackknife() {
            int[] cell = cellOfUnit();
            double[] out = new double[cell.length];
            double[] counts = new double[cells.length];
            for (int j = 0; j < cells.length; j++) counts[j] = cells[j];
            for (int i = 0; i < cell.length; i++) {
                counts[cell[i]] -= 1;
                out[i] = f.applyAsDouble(counts);
                counts[cell[i]] += 1;
            }
            return out;
        }
    }

    /** The same statistic with the shortcut hidden: the engine must use n weights per resample. */
    record WeightsOnly(Resampled inner) implements Resampled {
        @Override public int units() { return inner.units(); }
        @Override public double estimate() { return inner.estimate(); }
        @Override public double value(int[] weights) { return inner.value(weights); }
        @Override public double[] jackknife() { return inner.jackknife(); }
    }

    @Test
    void macroF1ReplicatesHaveTheLawOfWeightResampling() {
        Cells statistic = new Cells(CELLS, BootstrapCategoryShortcutTest::macroF1);
        int resamples = 20_000;
        BootstrapDistribution counts = new BootstrapEngine(resamples, 5L, 2).run(statistic);
        BootstrapDistribution weights = new BootstrapEngine(resamples, 6L, 2).run(new WeightsOnly(statistic));
        assertThat(counts.categoryShortcut()).isTrue();
        assertThat(weights.categoryShortcut()).isFalse();
        assertThat(counts.estimate()).isEqualTo(weights.estimate());
        // the closed-form jackknife per cell equals the per-unit one
        assertThat(counts.acceleration()).isCloseTo(weights.acceleration(), within(1e-12));

        double[] a = counts.replicates();
        double[] b = weights.replicates();
        double se = weights.standardError();
        // means: the difference of two means of 20,000 has sd se * sqrt(2 / B), about 0.01 se; allow 5 sd
        assertThat(mean(a)).isCloseTo(mean(b), within(5 * se * Math.sqrt(2.0 / resamples)));
        // standard errors: relative Monte Carlo sd about 1/sqrt(2B) = 0.5% each; allow 4%
        assertThat(counts.standardError()).isCloseTo(se, within(0.04 * se));
        // third central moments (skewness drives BCa): same sign and size within 30%
        assertThat(thirdMoment(a)).isCloseTo(thirdMoment(b), within(0.3 * Math.abs(thirdMoment(b)) + 1e-12));
        // interval endpoints within a tenth of a standard error
        assertThat(counts.percentile(0.95).lower()).isCloseTo(weights.percentile(0.95).lower(), within(0.1 * se));
        assertThat(counts.percentile(0.95).upper()).isCloseTo(weights.percentile(0.95).upper(), within(0.1 * se));
        assertThat(counts.bca(0.95).lower()).isCloseTo(weights.bca(0.95).lower(), within(0.1 * se));
        assertThat(counts.bca(0.95).upper()).isCloseTo(weights.bca(0.95).upper(), within(0.1 * se));
    }

    @Test
    void oneCellIsBinomialAndTwoCellsHaveTheMultinomialCovariance() {
        int n = 120;
        int resamples = 40_000;
        // the replicate packs cells 0 and 5 into one number: c0 * 1000 + c5
        Cells pair = new Cells(CELLS, c -> c[0] * 1000 + c[5]);
        double[] packed = new BootstrapEngine(resamples, 8L, 2).run(pair).replicates();
        double p0 = 30.0 / n;
        double p5 = 10.0 / n;
        int[] histogram = new int[n + 1];
        double s0 = 0, s5 = 0, s05 = 0, s00 = 0;
        for (double v : packed) {
            int c0 = (int) (v / 1000);
            int c5 = (int) (v - 1000.0 * c0);
            histogram[c0]++;
            s0 += c0;
            s5 += c5;
            s00 += (double) c0 * c0;
            s05 += (double) c0 * c5;
        }
        double m0 = s0 / resamples;
        double m5 = s5 / resamples;
        // Multinomial(n, p): E c0 = n p0, var c0 = n p0 (1 - p0), cov(c0, c5) = -n p0 p5
        double var0 = n * p0 * (1 - p0);
        assertThat(m0).isCloseTo(n * p0, within(5 * Math.sqrt(var0 / resamples)));
        assertThat(s00 / resamples - m0 * m0).isCloseTo(var0, within(0.05 * var0));
        double cov = s05 / resamples - m0 * m5;
        assertThat(cov).isCloseTo(-n * p0 * p5, within(0.1 * n * p0 * p5));
        // Pearson chi-square of cell 0's counts against Binomial(n, p0) (Commons Math 3.6.1 pmf),
        // bins with expected count >= 5, against the 0.001 quantile of the chi-square law
        BinomialDistribution binomial = new BinomialDistribution(null, n, p0);
        double chi2 = 0;
        int bins = 0;
        double restExpected = 0;
        int restObserved = 0;
        for (int x = 0; x <= n; x++) {
            double expected = resamples * binomial.probability(x);
            if (expected >= 5) {
                chi2 += (histogram[x] - expected) * (histogram[x] - expected) / expected;
                bins++;
            } else {
                restExpected += expected;
                restObserved += histogram[x];
            }
        }
        chi2 += (restObserved - restExpected) * (restObserved - restExpected) / restExpected;
        double critical = new ChiSquaredDistribution(null, bins).inverseCumulativeProbability(0.999);
        assertThat(chi2).isLessThan(critical);
    }

    @Test
    void countsShortcutIsDeterministicForAnyThreadCount() {
        Cells statistic = new Cells(CELLS, BootstrapCategoryShortcutTest::macroF1);
        double[] one = new BootstrapEngine(3000, 99L, 1).run(statistic).replicates();
        assertThat(new BootstrapEngine(3000, 99L, 2).run(statistic).replicates()).containsExactly(one);
        assertThat(new BootstrapEngine(3000, 99L, 3).run(statistic).replicates()).containsExactly(one);
        assertThat(new BootstrapEngine(3000, 98L, 1).run(statistic).replicates()).isNotEqualTo(one);
    }

    // The modal inversion gives the counts of Commons Math 3.6.1
    // BinomialDistribution.inverseCumulativeProbability (smallest x with F(x) >= u; the two rules
    // differ only when u equals F(x) exactly), from small to ten million trials.
    @ParameterizedTest(name = "n={0}, p={1}")
    @CsvSource({"1, 0.5", "60, 0.2", "400, 0.97", "1000, 0.001", "100000, 0.5", "3000000, 0.16", "10000000, 0.0000003"})
    void modalInversionMatchesCommonsMath(int n, double p) {
        BinomialDistribution binomial = new BinomialDistribution(null, n, p);
        SplittableRandom rng = new SplittableRandom(7L);
        int draws = n > 1_000_000 ? 300 : 3000;
        for (int i = 0; i < draws; i++) {
            double u = rng.nextDouble();
            assertThat(BinomialInversion.inverse(n, p, u)).as("u = %s", u).isEqualTo(binomial.inverseCumulativeProbability(u));
        }
        // far tails, where F is summed over many steps (below about 1e-14 the two may differ by rounding)
        for (double u : new double[] {1e-12, 1e-6, 1 - 1e-6, 1 - 1e-12}) {
            assertThat(BinomialInversion.inverse(n, p, u)).as("u = %s", u).isEqualTo(binomial.inverseCumulativeProbability(u));
        }
        assertThat(BinomialInversion.inverse(n, 0, 0.5)).isZero();
        assertThat(BinomialInversion.inverse(n, 1, 0.5)).isEqualTo(n);
    }

    private static double mean(double[] x) {
        double s = 0;
        for (double v : x) s += v;
        return s / x.length;
    }

    private static double thirdMoment(double[] x) {
        double m = mean(x);
        double s = 0;
        for (double v : x) s += (v - m) * (v - m) * (v - m);
        return s / x.length;
    }
}
