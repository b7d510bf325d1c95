package org.assay.stats;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Unpaired comparison of two proportions measured on separate sets of n1 and n2 items: the
 * pooled two-sample z-test and its power by Cohen's arcsine effect size h.
 *
 * <p>For two systems scored on the same test items the paired {@link McNemarTest} is the right
 * test; this unpaired view is what a reader can compute from a results table alone, and it is
 * conservative when the systems' errors are positively correlated (see {@link PairedGapRange}).
 */
public final class TwoProportionTest {
    private TwoProportionTest() {}

    /**
     * Two-sided p-value of the two-sample z-test for H0: p1 = p2 with the pooled variance
     * p&#772;(1 &minus; p&#772;)(1/n1 + 1/n2), p&#772; = (n1&middot;p1 + n2&middot;p2)/(n1 + n2): the test for two
     * independent proportions in Fleiss, Levin &amp; Paik, Statistical Methods for Rates and
     * Proportions, 3rd ed. (Wiley, 2003), without continuity correction; its square is Pearson's
     * chi-square statistic of the 2&times;2 table. Same as statsmodels {@code proportions_ztest} with two
     * samples. When p1 = p2 the result is 1 (statsmodels gives NaN when both are 0 or both 1, 0/0).
     */
    public static double pValue(double p1, double p2, long n1, long n2) {
        PowerChecks.proportion("first proportion", p1);
        PowerChecks.proportion("second proportion", p2);
        PowerChecks.items("first sample size", n1);
        PowerChecks.items("second sample size", n2);
        if (p1 == p2) return 1;
        double pooled = (p1 * n1 + p2 * n2) / ((double) n1 + n2);
        double variance = pooled * (1 - pooled) * (1.0 / n1 + 1.0 / n2);
        return PowerNormal.twoSidedPValue((p1 - p2) / Math.sqrt(variance));
    }

    /**
     * Cohen's effect size for two proportions, h = 2&middot;asin(&radic;p1) &minus;
     * 2&middot;asin(&radic;p2) (Cohen, Statistical Power Analysis for the Behavioral Sciences, 2nd
     * ed. 1988, chapter 6). The arcsine transformation makes the sampling variance of a proportion
     * about 1/n whatever its value.
     */
    public static double cohensH(double p1, double p2) {
        PowerChecks.proportion("first proportion", p1);
        PowerChecks.proportion("second proportion", p2);
        return 2 * Math.asin(Math.sqrt(p1)) - 2 * Math.asin(Math.sqrt(p2));
    }

    /**
     * Power of the two-sided level-alpha test of p1 = p2 when the true proportions are p1 and p2
     * (Cohen 1988, chapter 6): &Phi;(|h|&middot;&radic;m &minus; z) + &Phi;(&minus;|h|&middot;&radic;m
     * &minus; z) with m = n1&middot;n2/(n1 + n2) and z the two-sided critical value, both tails
     * kept. This is what statsmodels {@code NormalIndPower().power(effect_size =
     * proportion_effectsize(p1, p2), nobs1 = n1, alpha = alpha, ratio = n2/n1, alternative =
     * "two-sided")} computes.
     *
     * <p>Fed the observed proportions it gives the power to detect a true gap of the observed
     * size, not a probability that the observed gap is real.
     */
    public static double power(double p1, double p2, long n1, long n2, double alpha) {
        PowerChecks.items("first sample size", n1);
        PowerChecks.items("second sample size", n2);
        PowerChecks.alpha(alpha);
        double h = cohensH(p1, p2);
        return PowerNormal.twoSidedPower(Math.abs(h) * Math.sqrt(harmonicSize(n1, n2)), alpha);
    }

    /**
     * The minimal detectable difference d: the smallest d &gt;= 0 such that a system at p + d,
     * compared with one at p, each on its own n items, is detected by the two-sided level-alpha
     * test with the given power under {@link #power}. The gap is measured upward from p; for the
     * downward gap use 1 &minus; p (the arcsine power is symmetric under p &rarr; 1 &minus; p).
     *
     * <p>The effect size h is found by Brent's method (Commons Math {@link BrentSolver}) on the
     * exact two-tailed power, then d = sin&sup2;(asin(&radic;p) + h/2) &minus; p. Returns
     * {@link Double#POSITIVE_INFINITY} when even p + d = 1 does not reach the power: then no gap
     * above p can be resolved with n items.
     *
     * @param power target power, alpha &lt; power &lt; 1
     */
    public static double minimalDetectableDifference(double p, long n, double alpha, double power) {
        PowerChecks.proportion("proportion", p);
        PowerChecks.items("sample size", n);
        PowerChecks.alpha(alpha);
        PowerChecks.power(power, alpha);
        double root = Math.sqrt(harmonicSize(n, n));
        double base = Math.asin(Math.sqrt(p));
        double hMax = Math.PI - 2 * base;          // the h of p + d = 1
        if (PowerNormal.twoSidedPower(hMax * root, alpha) < power) return Double.POSITIVE_INFINITY;
        double h = new BrentSolver(1e-15, 1e-15)
                .solve(10_000, x -> PowerNormal.twoSidedPower(x * root, alpha) - power, 0, hMax);
        double upper = Math.sin(base + h / 2);
        return Math.min(1, upper * upper) - p;
    }

    /** n1&middot;n2/(n1 + n2), the size of one sample with the same variance of the difference. */
    private static double harmonicSize(long n1, long n2) {
        return 1.0 / (1.0 / n1 + 1.0 / n2);
    }
}
