package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.stream.IntStream;
import org.apache.commons.math3.distribution.HypergeometricDistribution;
import org.assay.common.UserInputException;
import org.assay.stats.BootstrapTestStatistics.WeightedMean;
import org.junit.jupiter.api.Test;

class BootstrapDistributionTest {
    private static final double[] SKEWED = {
        0.12, 0.35, 0.41, 0.58, 0.66, 0.71, 0.83, 0.97, 1.04, 1.18, 1.25, 1.39, 1.52, 1.77, 2.03,
        2.48, 2.96, 3.71, 4.88, 7.42};

    /** Replicates 1, 2, ..., 199 around an estimate of 100: counts can be done by hand. */
    private static BootstrapDistribution ladder() {
        double[] r = IntStream.rangeClosed(1, 199).asDoubleStream().toArray();
        return new BootstrapDistribution(100, r, 0, 50, false, false);
    }

    // Efron & Tibshirani (1993), An Introduction to the Bootstrap, eq. 14.15 for the sample mean:
    // the jackknife deviations are (x_i - mean)/(n - 1), so a = sum d^3 / (6 (sum d^2)^1.5)
    // with d_i = x_i - mean. Computed here from the data, not from any jackknife.
    @Test
    void accelerationOfTheMeanMatchesTheTextbookClosedForm() {
        double mean = java.util.Arrays.stream(SKEWED).average().orElseThrow();
        double squares = 0;
        double cubes = 0;
        for (double v : SKEWED) {
            squares += (v - mean) * (v - mean);
            cubes += (v - mean) * (v - mean) * (v - mean);
        }
        double expected = cubes / (6 * Math.pow(squares, 1.5));
        BootstrapDistribution d = new BootstrapEngine(200, 1L, 1).run(new WeightedMean(SKEWED));
        assertThat(expected).isPositive(); // right-skewed data
        assertThat(d.acceleration()).isCloseTo(expected, within(1e-12));
    }

    // By hand from the rule in the javadoc: 199 replicates 1..199, B + 1 = 200.
    @Test
    void pValueFollowsThePercentileInversionWithPlusOneCorrection() {
        BootstrapDistribution d = ladder();
        assertThat(d.twoSidedPValue(95, 105)).isEqualTo(1.0);      // estimate inside
        assertThat(d.twoSidedPValue(100, 100)).isEqualTo(1.0);
        // c = 150: #(t <= 150) = 150, #(t >= 150) = 50 -> 2 * 51 / 200
        assertThat(d.twoSidedPValue(150, 160)).isEqualTo(0.51);
        // c = 10 (the upper end is nearest): #(t <= 10) = 10 -> 2 * 11 / 200
        assertThat(d.twoSidedPValue(2, 10)).isEqualTo(0.11);
        // beyond every replicate: 2 * 1 / 200
        assertThat(d.twoSidedPValue(500, 600)).isEqualTo(0.01);
        assertThat(d.twoSidedPValue(-3, -2)).isEqualTo(0.01);
        assertThatThrownBy(() -> d.twoSidedPValue(2, 1)).isInstanceOf(IllegalArgumentException.class);
    }

    // By hand: with replicates 1..199 the linear rule puts q(p) at 1 + 198 p.
    @Test
    void percentileBasicAndRangeIfTrueOnAKnownLadder() {
        BootstrapDistribution d = ladder();
        Interval p = d.percentile(0.9);   // q(0.05) = 10.9, q(0.95) = 189.1
        assertThat(p.lower()).isCloseTo(10.9, within(1e-12));
        assertThat(p.upper()).isCloseTo(189.1, within(1e-12));
        assertThat(p.method()).isEqualTo("bootstrap percentile");
        Interval b = d.basic(0.9);        // 2*100 - 189.1, 2*100 - 10.9
        assertThat(b.lower()).isCloseTo(10.9, within(1e-12));
        assertThat(b.upper()).isCloseTo(189.1, within(1e-12));
        assertThat(b.method()).isEqualTo("bootstrap basic");
        double[] range = d.rangeIfTrue(40, 0.9); // 40 + (10.9 - 100), 40 + (189.1 - 100)
        assertThat(range[0]).isCloseTo(-49.1, within(1e-12));
        assertThat(range[1]).isCloseTo(129.1, within(1e-12));
    }

    // A claim just outside the 95% percentile interval has p near 0.05; one well inside the
    // bulk is not rejected. Consistency of the two documented rules (common practice).
    @Test
    void pValueAndPercentileIntervalAgree() {
        BootstrapDistribution d = new BootstrapEngine(4000, 11L, 2).run(new WeightedMean(SKEWED));
        Interval i = d.percentile(0.95);
        double justOutside = i.upper() + 1e-9;
        assertThat(d.twoSidedPValue(justOutside, justOutside + 0.1)).isCloseTo(0.05, within(0.002));
        assertThat(d.twoSidedPValue(i.lower() + 0.01, i.lower() + 0.02)).isGreaterThan(0.05);
    }

    @Test
    void bcaFallsBackToPercentileWhenEveryReplicateIsOnOneSide() {
        double[] above = IntStream.rangeClosed(1, 150).asDoubleStream().toArray();
        BootstrapDistribution d = new BootstrapDistribution(0.5, above, 0.1, 10, false, false);
        Interval bca = d.bca(0.95);
        Interval percentile = d.percentile(0.95);
        assertThat(bca.lower()).isEqualTo(percentile.lower());
        assertThat(bca.upper()).isEqualTo(percentile.upper());
        assertThat(bca.method()).isEqualTo("bootstrap percentile (BCa fallback: no replicates on one side of the estimate)");
    }

    @Test
    void bcaWithoutBiasOrAccelerationIsThePercentileInterval() {
        // symmetric ladder around its median 100, a = 0: z0 = 0 and the adjusted levels are alpha/2
        BootstrapDistribution d = ladder();
        assertThat(d.bca(0.9).lower()).isCloseTo(d.percentile(0.9).lower(), within(1e-9));
        assertThat(d.bca(0.9).upper()).isCloseTo(d.percentile(0.9).upper(), within(1e-9));
    }

    // Finite-population correction: the variance of a sample proportion from a simple random
    // sample without replacement is the hypergeometric one, (PQ/n)(N-n)/(N-1) (Cochran 1977,
    // Sampling Techniques, ch. 3, from memory); here the exact value comes from Commons Math
    // HypergeometricDistribution. Statistical check: with B = 20,000 the bootstrap standard
    // error has a relative Monte Carlo sd of about 0.5%, so 3% is a wide margin.
    @Test
    void finitePopulationRescalingGivesTheHypergeometricStandardError() {
        int n = 400;
        int populationSize = 4000;
        int k = 340; // p = 0.85
        BootstrapDistribution plain = new BootstrapEngine(20_000, 3L, 2).runCount(k, n);
        BootstrapDistribution rescaled = plain.withFinitePopulation(n, populationSize);
        double exact = Math.sqrt(new HypergeometricDistribution(null, populationSize, 3400, n)
                .getNumericalVariance()) / n;
        assertThat(rescaled.standardError()).isCloseTo(exact, within(0.03 * exact));
        assertThat(rescaled.estimate()).isEqualTo(plain.estimate());
        assertThat(rescaled.countShortcut()).isTrue();
        assertThat(rescaled.bca(0.95).method()).isEqualTo("bootstrap BCa (finite-population rescaled)");
        assertThat(rescaled.percentile(0.95).method()).isEqualTo("bootstrap percentile (finite-population rescaled)");
        assertThat(rescaled.basic(0.95).method()).isEqualTo("bootstrap basic (finite-population rescaled)");
        assertThat(rescaled.percentile(0.95).upper() - rescaled.percentile(0.95).lower())
                .isLessThan(plain.percentile(0.95).upper() - plain.percentile(0.95).lower());
    }

    @Test
    void wholePopulationObservedGivesZeroWidth() {
        BootstrapDistribution d = new BootstrapEngine(500, 3L, 1).runCount(37, 50).withFinitePopulation(50, 50);
        assertThat(d.standardError()).isZero();
        assertThat(d.bca(0.95)).isEqualTo(new Interval(0.74, 0.74, 0.95, "bootstrap BCa (finite-population rescaled)"));
        assertThat(d.percentile(0.95).lower()).isEqualTo(0.74);
    }

    @Test
    void finitePopulationArgumentsAreChecked() {
        BootstrapDistribution d = new BootstrapEngine(500, 3L, 1).runCount(37, 50);
        assertThatThrownBy(() -> d.withFinitePopulation(40, 1000)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> d.withFinitePopulation(50, 49)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> d.withFinitePopulation(50, 100).withFinitePopulation(50, 100))
                .isInstanceOf(IllegalStateException.class);
        assertThatThrownBy(() -> d.percentile(1.0)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> d.bca(0)).isInstanceOf(UserInputException.class);
    }

    @Test
    void replicatesAreASortedDefensiveCopy() {
        BootstrapDistribution d = new BootstrapEngine(300, 4L, 1).run(new WeightedMean(SKEWED));
        double[] r = d.replicates();
        assertThat(r).isSorted().hasSize(300);
        r[0] = 1e9;
        assertThat(d.replicates()[0]).isNotEqualTo(1e9);
        assertThat(d.resamples()).isEqualTo(300);
    }
}
