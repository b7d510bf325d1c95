package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** The stratified bootstrap: resamples keep every stratum's size, and only within-stratum spread remains. */
class StratifiedBootstrapTest {

    /** The mean of one value per unit. */
    private static Resampled mean(double[] values) {
        return new Resampled() {
            @Override public int units() { return values.length; }
            @Override public double estimate() { return Arrays.stream(values).average().orElseThrow(); }
            @Override public double value(int[] w) {
                double s = 0, t = 0;
                for (int i = 0; i < values.length; i++) { s += w[i] * values[i]; t += w[i]; }
                return s / t;
            }
            @Override public double[] jackknife() {
                double total = Arrays.stream(values).sum();
                double[] out = new double[values.length];
                for (int i = 0; i < out.length; i++) out[i] = (total - values[i]) / (values.length - 1);
                return out;
            }
        };
    }

    @Test
    void whenTheStrataExplainEveryDifferenceTheResampledMeanDoesNotMove() {
        // 30 units of value 0 in stratum 0 and 70 of value 1 in stratum 1: a stratified resample keeps
        // 30 and 70, so its mean is always 0.7 (variance comes only from within strata; Cochran 1977,
        // Sampling Techniques, §5.3), while simple resampling varies the share
        double[] values = new double[100];
        int[] strata = new int[100];
        for (int i = 30; i < 100; i++) { values[i] = 1; strata[i] = 1; }
        BootstrapEngine engine = new BootstrapEngine(500, 3, 2);
        BootstrapDistribution stratified = engine.runStratified(mean(values), strata);
        for (double v : stratified.replicates()) assertThat(v).isCloseTo(0.7, org.assertj.core.api.Assertions.within(1e-12));
        assertThat(engine.run(mean(values)).standardError()).isGreaterThan(0.03);
    }

    @Test
    void withinStrataTheSpreadIsTheBootstrapsAndTheDrawIsDeterministicForAnyThreadCount() {
        double[] values = new double[200];
        int[] strata = new int[200];
        java.util.SplittableRandom rng = new java.util.SplittableRandom(9);
        for (int i = 0; i < 200; i++) { strata[i] = i % 4; values[i] = strata[i] + rng.nextGaussian(); }
        BootstrapDistribution one = new BootstrapEngine(2000, 11, 1).runStratified(mean(values), strata);
        BootstrapDistribution two = new BootstrapEngine(2000, 11, 2).runStratified(mean(values), strata);
        assertThat(one.replicates()).containsExactly(two.replicates());
        // the stratified standard error: sqrt(sum_h W_h^2 s_h^2 / n_h) with bootstrap's (n_h - 1)/n_h factor
        double var = 0;
        for (int h = 0; h < 4; h++) {
            final int hh = h;
            double[] v = java.util.stream.IntStream.range(0, 200).filter(i -> strata[i] == hh).mapToDouble(i -> values[i]).toArray();
            double m = Arrays.stream(v).average().orElseThrow();
            double ss = Arrays.stream(v).map(x -> (x - m) * (x - m)).sum() / v.length;   // plug-in variance
            double w = v.length / 200.0;
            var += w * w * ss / v.length;
        }
        // Monte Carlo error of a standard error from 2000 resamples is about 1/sqrt(2 * 2000) = 1.6% relative
        assertThat(one.standardError()).isCloseTo(Math.sqrt(var), org.assertj.core.api.Assertions.withinPercentage(6));
        // simple resampling adds the spread between the strata means (0..3, variance 1.25) to the within-stratum
        // variance (1): about sqrt(2.25) = 1.5 times the stratified standard error
        assertThat(new BootstrapEngine(2000, 11, 1).run(mean(values)).standardError()).isGreaterThan(1.3 * Math.sqrt(var));
    }
}
