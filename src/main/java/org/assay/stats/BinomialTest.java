package org.assay.stats;

import org.apache.commons.math3.distribution.BinomialDistribution;
import org.apache.commons.math3.special.Beta;

/**
 * Exact binomial test and quantiles for a count of successes in n independent trials, the
 * infinite-population case (the test-set size is unknown).
 *
 * <p>Both tails come from the regularized incomplete beta function (Commons Math
 * {@link Beta#regularizedBeta}), P(X &gt;= k) = I_p(k, n &minus; k + 1) and
 * P(X &lt;= k) = I_{1&minus;p}(n &minus; k, k + 1), so a small tail is never computed as
 * 1 minus a number close to 1.
 */
public final class BinomialTest {
    private BinomialTest() {}

    /**
     * Two-sided p-value min(1, 2&middot;min(P(X &lt;= k), P(X &gt;= k))), the doubled one-sided
     * p-value. It is the test that the Clopper&ndash;Pearson interval inverts: p lies in the
     * Clopper&ndash;Pearson interval at confidence 1 &minus; &alpha; exactly when this p-value is
     * at least &alpha; (equality at the bounds).
     */
    public static double twoSidedPValue(long k, long n, double p) {
        ProportionChecks.check(k, n, 0.5);
        checkP(p);
        return Math.min(1, 2 * Math.min(atMost(k, n, p), atLeast(k, n, p)));
    }

    /**
     * The range of counts n trials at success probability p would show: the quantiles at
     * {@code lo} and {@code hi}, each the smallest k with P(X &lt;= k) &gt;= prob (scipy's
     * {@code ppf} convention). Requires 0 &lt; lo &lt;= hi &lt;= 1.
     */
    public static long[] quantiles(long n, double p, double lo, double hi) {
        if (n < 1 || n > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("need 1 <= n <= " + Integer.MAX_VALUE + ", got " + n);
        }
        checkP(p);
        FinitePopulation.checkProbabilities(lo, hi);
        // A null RandomGenerator: nothing is sampled, and the default RNG is costly to build.
        BinomialDistribution d = new BinomialDistribution(null, (int) n, p);
        return new long[] {d.inverseCumulativeProbability(lo), d.inverseCumulativeProbability(hi)};
    }

    static double atLeast(long k, long n, double p) {
        if (k <= 0) return 1;
        if (p == 0) return 0;
        if (p == 1) return 1;
        return Beta.regularizedBeta(p, k, n - k + 1.0);
    }

    static double atMost(long k, long n, double p) {
        if (k >= n) return 1;
        if (p == 0) return 1;
        if (p == 1) return 0;
        return Beta.regularizedBeta(1 - p, n - k, k + 1.0);
    }

    private static void checkP(double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("success probability must be in [0, 1], got " + p);
        }
    }
}
