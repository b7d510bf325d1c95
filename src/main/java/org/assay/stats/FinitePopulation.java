package org.assay.stats;

import org.apache.commons.math3.distribution.HypergeometricDistribution;

/**
 * Exact methods for a count observed in a simple random sample, without replacement, of
 * {@code n} items from a finite test set of {@code N} items of which {@code K} are successes
 * (DESIGN.md principle 3). The sample count k then follows the hypergeometric distribution.
 *
 * <p>Probabilities come from Commons Math {@link HypergeometricDistribution}'s pmf (Loader's
 * saddle-point expansion), summed by {@link HypergeometricTails} only where the terms matter, so
 * small tails keep their relative accuracy and a tail costs O(standard deviation) terms. Commons Math takes {@code int} sizes, so N is limited to
 * {@link Integer#MAX_VALUE}; larger values are rejected rather than truncated.
 */
public final class FinitePopulation {
    /** Method name carried by {@link #exactInterval}'s result. */
    public static final String EXACT_METHOD = "exact hypergeometric (finite population)";

    private FinitePopulation() {}

    /** P(X = k). */
    public static double pmf(long k, long n, long N, long K) {
        return tails(n, N, K).pmf(clampToInt(k));
    }

    /** P(X &lt;= k). */
    public static double cdf(long k, long n, long N, long K) {
        return tails(n, N, K).atMost(k);
    }

    /** P(X &gt; k), the survival function in scipy's sense. */
    public static double sf(long k, long n, long N, long K) {
        return tails(n, N, K).atLeast(k + 1);
    }

    /**
     * The central exact interval for the success fraction K/N of the finite test set, after
     * observing k successes in a simple random sample of n items without replacement.
     *
     * <p>It inverts the two one-sided hypergeometric tests at level &alpha;/2 each, over integer
     * K: K is kept when P(X &gt;= k | K) &gt; &alpha;/2 and P(X &lt;= k | K) &gt; &alpha;/2. This
     * is the finite-population analogue of the Clopper&ndash;Pearson interval; see Buonaccorsi
     * (1987), "A note on confidence intervals for proportions in finite populations", The American
     * Statistician 41:215&ndash;218, and Wendell &amp; Schmee (1996), "Exact inference for proportions
     * from a stratified finite population", JASA 91:825&ndash;830. The kept set is exactly the set
     * of K with {@link #twoSidedPValue} &gt; &alpha;.
     *
     * <p>Each tail is monotone in K (P(X &gt;= k | K) rises with K, P(X &lt;= k | K) falls), so
     * each bound is found by binary search over K: O(log N) tail evaluations. Bounds are returned
     * on the fraction scale (K/N). When n == N the sample is the whole test set and the interval
     * is the point k/N.
     */
    public static Interval exactInterval(long k, long n, long N, double confidence) {
        checkSample(k, n, N);
        ProportionChecks.checkConfidence(confidence);
        if (n == N) {
            double p = (double) k / N;
            return new Interval(p, p, confidence, EXACT_METHOD);
        }
        double halfAlpha = (1 - confidence) / 2;
        // Smallest K whose upper tail P(X >= k | K) exceeds alpha/2; K = N always qualifies.
        long lo = k;
        long hi = N;
        while (lo < hi) {
            long mid = lo + (hi - lo) / 2;
            if (tails(n, N, mid).atLeast(k) > halfAlpha) hi = mid; else lo = mid + 1;
        }
        long lowerK = lo;
        // Largest K whose lower tail P(X <= k | K) exceeds alpha/2; K = 0 always qualifies.
        lo = 0;
        hi = N - (n - k);
        while (lo < hi) {
            long mid = lo + (hi - lo + 1) / 2;
            if (tails(n, N, mid).atMost(k) > halfAlpha) lo = mid; else hi = mid - 1;
        }
        long upperK = lo;
        return new Interval((double) lowerK / N, (double) upperK / N, confidence, EXACT_METHOD);
    }

    /**
     * Two-sided p-value of the hypothesis "the test set has K successes" after observing k:
     * min(1, 2&middot;min(P(X &lt;= k), P(X &gt;= k))), the doubled one-sided p-value. This is the
     * definition consistent with the central {@link #exactInterval}: K lies in the interval at
     * confidence 1 &minus; &alpha; exactly when this p-value exceeds &alpha;.
     */
    public static double twoSidedPValue(long k, long n, long N, long K) {
        checkSample(k, n, N);
        HypergeometricTails d = tails(n, N, K);
        double lowerTail = d.atMost(k);
        double upperTail = d.atLeast(k);
        return Math.min(1, 2 * Math.min(lowerTail, upperTail));
    }

    /**
     * The range of counts a random subsample of n from this test set would show:
     * {lower, upper} = the quantiles at {@code lowerProb} and {@code upperProb}, each the
     * smallest k with P(X &lt;= k) &gt;= prob (scipy's {@code ppf} convention).
     * Requires 0 &lt; lowerProb &lt;= upperProb &lt;= 1.
     */
    public static long[] quantiles(long n, long N, long K, double lowerProb, double upperProb) {
        checkProbabilities(lowerProb, upperProb);
        HypergeometricTails d = tails(n, N, K);
        return new long[] {d.quantile(lowerProb), d.quantile(upperProb)};
    }

    /**
     * The finite-population correction (N &minus; n)/(N &minus; 1) that multiplies the variance of a
     * mean from a sample of n drawn without replacement from N items (Cochran, Sampling
     * Techniques, 3rd ed. 1977, section 2.4). It is 0 when n == N (including N == 1).
     */
    public static double correction(long n, long N) {
        if (N < 1 || n < 1 || n > N) {
            throw new IllegalArgumentException("need 1 <= n <= N, got n=" + n + ", N=" + N);
        }
        return n == N ? 0 : (double) (N - n) / (N - 1);
    }

    static void checkProbabilities(double lowerProb, double upperProb) {
        if (!(lowerProb > 0 && lowerProb <= upperProb && upperProb <= 1)) {
            throw new IllegalArgumentException(
                    "need 0 < lowerProb <= upperProb <= 1, got " + lowerProb + ", " + upperProb);
        }
    }

    private static void checkSample(long k, long n, long N) {
        if (N < 1 || n < 1 || n > N) {
            throw new IllegalArgumentException("need 1 <= n <= N, got n=" + n + ", N=" + N);
        }
        if (k < 0 || k > n) {
            throw new IllegalArgumentException("need 0 <= k <= n, got k=" + k + ", n=" + n);
        }
    }

    private static HypergeometricTails tails(long n, long N, long K) {
        if (N > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("test-set size " + N + " is above " + Integer.MAX_VALUE);
        }
        if (N < 1 || n < 0 || n > N || K < 0 || K > N) {
            throw new IllegalArgumentException("need 0 <= n <= N and 0 <= K <= N, got n=" + n + ", N=" + N + ", K=" + K);
        }
        return new HypergeometricTails((int) n, (int) N, (int) K);
    }

    /** k outside the int range lies outside every support here; clamping keeps the answer exact. */
    private static int clampToInt(long x) {
        return (int) Math.max(Integer.MIN_VALUE + 1L, Math.min(Integer.MAX_VALUE, x));
    }
}
