package org.assay.stats;

import org.apache.commons.math3.distribution.NormalDistribution;

/** The standard normal pieces the power formulas share. */
final class PowerNormal {
    // A null RandomGenerator: nothing is sampled, and the default RNG is costly to build.
    private static final NormalDistribution STANDARD = new NormalDistribution(null, 0, 1);

    private PowerNormal() {}

    /** &Phi;(x); Commons Math computes it through erfc, so a far lower tail keeps its relative accuracy. */
    static double cdf(double x) {
        return STANDARD.cumulativeProbability(x);
    }

    /** The two-sided critical value z with P(|Z| &gt; z) = alpha. */
    static double twoSidedCritical(double alpha) {
        return STANDARD.inverseCumulativeProbability(1 - alpha / 2);
    }

    /** P(|Z| &gt; |z|) = 2&middot;&Phi;(&minus;|z|), from the lower tail rather than 1 minus a number near 1. */
    static double twoSidedPValue(double z) {
        return 2 * STANDARD.cumulativeProbability(-Math.abs(z));
    }

    /**
     * Power of a two-sided level-alpha test whose statistic is N(shift, 1) under the alternative
     * and N(0, 1) under the null: &Phi;(shift &minus; z) + &Phi;(&minus;shift &minus; z). Both tails
     * are kept, so the power at shift 0 is alpha.
     */
    static double twoSidedPower(double shift, double alpha) {
        double z = twoSidedCritical(alpha);
        return cdf(shift - z) + cdf(-shift - z);
    }
}
