package org.assay.stats;

import org.apache.commons.math3.distribution.HypergeometricDistribution;

/**
 * Tail probabilities of one hypergeometric distribution (n draws from N items of which K are
 * successes) summed only where they matter. Commons Math sums a tail over the whole support,
 * from its far end: exact, but O(n) per call, minutes for an audit of ten million rows that
 * inverts the tails a few hundred times. Here the smaller tail is summed from the given point
 * outward, where the terms shrink (the pmf is log-concave, so past the mode they only decrease),
 * and the sum stops once a term falls below 1e-20 of it: the rest is far below double precision.
 * The larger tail is one minus the other one, which is then at most about a half, so both keep
 * their relative accuracy. Each term is Commons Math's pmf (Loader's saddle-point expansion),
 * so a call costs O(standard deviation) terms instead of O(n).
 */
final class HypergeometricTails {
    private static final double NEGLIGIBLE = 1e-20;

    private final HypergeometricDistribution distribution;
    private final int lower;
    private final int upper;
    private final int mode;

    HypergeometricTails(int n, int N, int K) {
        // A null RandomGenerator: nothing is sampled, and the default RNG is costly to build.
        this.distribution = new HypergeometricDistribution(null, N, K, n);
        this.lower = distribution.getSupportLowerBound();
        this.upper = distribution.getSupportUpperBound();
        // the mode of the hypergeometric law: floor((n + 1)(K + 1) / (N + 2))
        long m = (long) Math.floor((n + 1.0) * (K + 1.0) / (N + 2.0));
        this.mode = (int) Math.max(lower, Math.min(upper, m));
    }

    double pmf(int x) { return distribution.probability(x); }

    /** P(X &lt;= x). */
    double atMost(long x) {
        if (x < lower) return 0;
        if (x >= upper) return 1;
        if (x < mode) return sumDown((int) x);
        return 1 - sumUp((int) x + 1);
    }

    /** P(X &gt;= x). */
    double atLeast(long x) {
        if (x <= lower) return 1;
        if (x > upper) return 0;
        if (x > mode) return sumUp((int) x);
        return 1 - sumDown((int) x - 1);
    }

    /**
     * The smallest x with P(X &lt;= x) &gt;= p, for 0 &lt; p &lt;= 1 (the rule of scipy's ppf and of
     * Commons Math's inverseCumulativeProbability), by bisection over the support.
     */
    int quantile(double p) {
        if (p >= 1) return upper;
        int lo = lower;
        int hi = upper;
        while (lo < hi) {
            int mid = (int) (((long) lo + hi) >>> 1);
            if (atMost(mid) >= p) hi = mid; else lo = mid + 1;
        }
        return lo;
    }

    /** P(X &gt;= from) for from above the mode: terms from there up, until negligible. */
    private double sumUp(int from) {
        double sum = 0;
        for (int x = from; x <= upper; x++) {
            double term = distribution.probability(x);
            sum += term;
            if (term == 0 || term < NEGLIGIBLE * sum) break;   // past the mode the rest only shrinks
        }
        return sum;
    }

    /** P(X &lt;= from) for from below the mode: terms from there down, until negligible. */
    private double sumDown(int from) {
        double sum = 0;
        for (int x = from; x >= lower; x--) {
            double term = distribution.probability(x);
            sum += term;
            if (term == 0 || term < NEGLIGIBLE * sum) break;   // past the mode the rest only shrinks
        }
        return sum;
    }
}
