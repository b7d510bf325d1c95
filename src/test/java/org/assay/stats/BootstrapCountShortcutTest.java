package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.assay.stats.BootstrapTestStatistics.WeightedMean;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The binomial count shortcut against full multinomial resampling of the same 0/1 values.
 * Resampling n values with replacement makes the resampled success count Binomial(n, k/n)
 * (common practice), so the two distributions must agree; they use different random draws,
 * so the comparison is statistical.
 */
class BootstrapCountShortcutTest {

    @ParameterizedTest(name = "k={0}, n={1}")
    @CsvSource({"340, 400", "12, 60", "388, 400"})
    void shortcutAgreesWithFullResampling(int k, int n) {
        int resamples = 20_000;
        BootstrapDistribution full = new BootstrapEngine(resamples, 17L, 2).run(new WeightedMean(BootstrapTestStatistics.zeroOne(k, n)));
        BootstrapDistribution count = new BootstrapEngine(resamples, 17L, 2).runCount(k, n);
        assertThat(count.countShortcut()).isTrue();
        assertThat(full.countShortcut()).isFalse();
        assertThat(count.estimate()).isEqualTo(full.estimate());

        // The closed-form jackknife of the shortcut gives the same acceleration as the per-unit
        // jackknife of the full statistic (deterministic, so a tight tolerance).
        assertThat(count.acceleration()).isCloseTo(full.acceleration(), within(1e-12));

        // Statistical check: with B = 20,000 each standard error has a relative Monte Carlo sd
        // near 1/sqrt(2B) = 0.5%, so 5% between the two is about 7 sd of their difference.
        assertThat(count.standardError()).isCloseTo(full.standardError(), within(0.05 * full.standardError()));
        // ... and both match the binomial standard error sqrt(p(1-p)/n) of a resampled proportion.
        double p = (double) k / n;
        double binomial = Math.sqrt(p * (1 - p) / n);
        assertThat(count.standardError()).isCloseTo(binomial, within(0.03 * binomial));

        // Quantiles of a discrete distribution: the 2.5% and 97.5% points lie on the k/n lattice
        // (or between neighbours); allow one lattice step for Monte Carlo noise.
        double step = 1.0 / n;
        assertThat(count.percentile(0.95).lower()).isCloseTo(full.percentile(0.95).lower(), within(step + 1e-12));
        assertThat(count.percentile(0.95).upper()).isCloseTo(full.percentile(0.95).upper(), within(step + 1e-12));
        assertThat(count.bca(0.95).lower()).isCloseTo(full.bca(0.95).lower(), within(step + 1e-12));
        assertThat(count.bca(0.95).upper()).isCloseTo(full.bca(0.95).upper(), within(step + 1e-12));
    }

    // The tabulated inversion gives the same counts as Commons Math 3.6.1
    // BinomialDistribution.inverseCumulativeProbability (smallest x with F(x) >= u; the two rules
    // differ only when u equals F(x) exactly).
    @ParameterizedTest(name = "n={0}, p={1}")
    @CsvSource({"400, 0.85", "60, 0.2", "400, 0.97", "100000, 0.5", "1000, 0.001"})
    void tabulatedInverseMatchesCommonsMath(int n, double p) {
        BootstrapBinomialSampler sampler = new BootstrapBinomialSampler(n, p);
        BinomialDistribution binomial = new BinomialDistribution(null, n, p);
        SplittableRandom rng = new SplittableRandom(99L);
        for (int i = 0; i < 5000; i++) {
            double u = rng.nextDouble();
            assertThat(sampler.inverse(u)).as("u = %s", u).isEqualTo(binomial.inverseCumulativeProbability(u));
        }
    }
}
