package org.assay.stats;

/**
 * Exact power of the tests on a proportion claimed for a finite test set, as functions of the
 * subsample size n, for planning a reproduction. The subsample is a simple random sample of n of
 * the test set's N items, so its count X of successes is hypergeometric given the test set's count
 * K (DESIGN.md principle 3); every probability here is a sum over that distribution
 * ({@link HypergeometricWindow}), none is a normal approximation.
 *
 * <p>The tests are those of {@link FinitePopulation}, on counts:
 * <ul>
 *   <li><b>Discrepancy.</b> A claim is the set of counts [claimLow, claimHigh] that round to it; a
 *       sample count k contradicts it when {@link FinitePopulation#twoSidedPValue} is below
 *       testAlpha for every count in that set. Since P(X &lt;= k | K) falls and P(X &gt;= k | K)
 *       rises as K grows, that happens exactly when P(X &lt;= k | claimLow) &lt; testAlpha/2 or
 *       P(X &gt;= k | claimHigh) &lt; testAlpha/2: the rejection region is k &lt;= a lower cut or
 *       k &gt;= an upper cut.</li>
 *   <li><b>Agreement</b> (two one-sided tests, Schuirmann 1987, J. Pharmacokinet. Biopharm.
 *       15:657&ndash;680). The exact interval {@link FinitePopulation#exactInterval} at
 *       equivalenceConfidence lies inside the band of counts [bandLow, bandHigh]. Its lower end is
 *       the smallest K with P(X &gt;= k | K) above the tail level, so it is at least bandLow exactly
 *       when P(X &gt;= k | bandLow &minus; 1) is at most that level; likewise for the upper end.</li>
 *   <li><b>Consistency</b>: agreement, and no discrepancy.</li>
 * </ul>
 *
 * <p>Exact power is not monotone in n: the cut-offs move in whole counts, so the power zigzags as
 * n grows (Chernick &amp; Liu 2002, "The saw-toothed behavior of power versus sample size and
 * software solutions", The American Statistician 56:149&ndash;155). {@link SampleSizeSearch#fromThenOn}
 * handles that.
 */
public final class ExactCountPlan {
    private final long testSize;
    private final long claimLow;
    private final long claimHigh;
    private final double halfTestAlpha;
    private final long bandLow;
    private final long bandHigh;
    private final double equivalenceTail;

    /**
     * @param testSize              N, the test set's items
     * @param claimLow              smallest count of the test set the claim allows
     * @param claimHigh             largest count the claim allows (&gt;= claimLow)
     * @param testAlpha             a sample count is discrepant when its two-sided p-value is below this
     * @param bandLow               smallest count the agreement interval's lower end may take
     * @param bandHigh              largest count the agreement interval's upper end may take
     * @param equivalenceConfidence confidence of the agreement interval (1 &minus; 2&alpha; for two one-sided tests at &alpha;)
     */
    public ExactCountPlan(long testSize, long claimLow, long claimHigh, double testAlpha, long bandLow, long bandHigh,
                          double equivalenceConfidence) {
        if (testSize < 1 || claimLow < 0 || claimLow > claimHigh || claimHigh > testSize) {
            throw new IllegalArgumentException("need 0 <= claimLow <= claimHigh <= N, got " + claimLow + ", " + claimHigh
                    + ", N=" + testSize);
        }
        if (!(testAlpha > 0 && testAlpha < 1)) throw new IllegalArgumentException("testAlpha " + testAlpha);
        ProportionChecks.checkConfidence(equivalenceConfidence);
        this.testSize = testSize;
        this.claimLow = claimLow;
        this.claimHigh = claimHigh;
        this.halfTestAlpha = testAlpha / 2;
        this.bandLow = bandLow;
        this.bandHigh = bandHigh;
        // the same expression FinitePopulation.exactInterval uses for each tail
        this.equivalenceTail = (1 - equivalenceConfidence) / 2;
    }

    public long testSize() { return testSize; }

    /**
     * {lower, upper}: a sample count k &lt;= lower or k &gt;= upper is discrepant, any other is not.
     * lower may be &minus;1 and upper n + 1 (no discrepant count on that side).
     */
    public long[] discrepantCuts(long n) {
        checkSize(n);
        long lower = HypergeometricWindow.of(n, testSize, claimLow).largestWithAtMostBelow(halfTestAlpha);
        long upper = HypergeometricWindow.of(n, testSize, claimHigh).smallestWithAtLeastBelow(halfTestAlpha);
        return new long[] {Math.max(-1, lower), Math.min(n + 1, upper)};
    }

    /** Probability that a subsample of n is discrepant when the test set's true count is trueCount. */
    public double discrepantPower(long n, long trueCount) {
        long[] cuts = discrepantCuts(n);
        HypergeometricWindow w = HypergeometricWindow.of(n, testSize, checkCount(trueCount));
        return Math.min(1, w.atMost(cuts[0]) + w.atLeast(cuts[1]));
    }

    /** {lowest, highest} sample counts whose agreement interval lies inside the band; lowest &gt; highest when none. */
    public long[] agreementRange(long n) {
        checkSize(n);
        long lowest = bandLow <= 0 ? 0
                : bandLow > testSize ? n + 1
                : HypergeometricWindow.of(n, testSize, bandLow - 1).smallestWithAtLeastAtMost(equivalenceTail);
        long highest = bandHigh >= testSize ? n
                : bandHigh < 0 ? -1
                : HypergeometricWindow.of(n, testSize, bandHigh + 1).largestWithAtMostAtMost(equivalenceTail);
        return new long[] {Math.max(0, lowest), Math.min(n, highest)};
    }

    /** {lowest, highest} sample counts that agree and are not discrepant; lowest &gt; highest when none. */
    public long[] consistentRange(long n) {
        long[] agree = agreementRange(n);
        long[] cuts = discrepantCuts(n);
        return new long[] {Math.max(agree[0], cuts[0] + 1), Math.min(agree[1], cuts[1] - 1)};
    }

    /** Probability that the two one-sided tests show agreement when the true count is trueCount. */
    public double agreementPower(long n, long trueCount) {
        long[] r = agreementRange(n);
        return HypergeometricWindow.of(n, testSize, checkCount(trueCount)).between(r[0], r[1]);
    }

    /** Probability of agreement without discrepancy (the audit's "consistent") when the true count is trueCount. */
    public double consistentPower(long n, long trueCount) {
        long[] r = consistentRange(n);
        return HypergeometricWindow.of(n, testSize, checkCount(trueCount)).between(r[0], r[1]);
    }

    /**
     * The exact interval for the test set's fraction after k successes in a sample of n: the same
     * interval as {@link FinitePopulation#exactInterval} (the same tail rule over integer K), computed
     * from {@link HypergeometricWindow}s so that planning can afford one per subsample size.
     */
    public static Interval interval(long k, long n, long N, double confidence) {
        if (N < 1 || n < 1 || n > N || k < 0 || k > n) {
            throw new IllegalArgumentException("need 1 <= n <= N and 0 <= k <= n, got k=" + k + ", n=" + n + ", N=" + N);
        }
        ProportionChecks.checkConfidence(confidence);
        if (n == N) {
            double p = (double) k / N;
            return new Interval(p, p, confidence, FinitePopulation.EXACT_METHOD);
        }
        double halfAlpha = (1 - confidence) / 2;
        // start both searches near the estimate, a standard deviation apart; the answers are the same
        // as from a search over all of [0, N], in fewer steps
        long guess = Math.max(k, Math.min(N - (n - k), Math.round((double) k * N / n)));
        double p = (double) k / n;
        long step = Math.max(1, Math.round(N * Math.sqrt(Math.max(p * (1 - p), 0.25 / n) / n)));
        // smallest K whose P(X >= k | K) exceeds alpha/2 (it rises with K; at K = N it is 1)
        long lowerK = smallestTrue(K -> HypergeometricWindow.of(n, N, K).atLeast(k) > halfAlpha, k, N, guess, step);
        // largest K whose P(X <= k | K) exceeds alpha/2 (it falls with K; at K = 0 it is 1)
        long upperK = smallestTrue(K -> !(HypergeometricWindow.of(n, N, K).atMost(k) > halfAlpha), 0, N - (n - k) + 1,
                guess, step) - 1;
        return new Interval((double) lowerK / N, (double) upperK / N, confidence, FinitePopulation.EXACT_METHOD);
    }

    /**
     * The smallest K in [from, to] where {@code test} holds, for a test that is false below some K
     * and true from there on, and true at {@code to}: steps out from the guess, doubling, until the
     * answer is bracketed, then bisects.
     */
    private static long smallestTrue(java.util.function.LongPredicate test, long from, long to, long guess, long step) {
        guess = Math.max(from, Math.min(to, guess));
        long lo;   // test false at lo, or lo == from - 1
        long hi;   // test true at hi
        if (test.test(guess)) {
            hi = guess;
            lo = guess - step;
            while (lo >= from && test.test(lo)) {
                hi = lo;
                step *= 2;
                lo = guess - step;
            }
            lo = Math.max(lo, from - 1);
        } else {
            lo = guess;
            hi = guess + step;
            while (hi < to && !test.test(hi)) {
                lo = hi;
                step *= 2;
                hi = guess + step;
            }
            hi = Math.min(hi, to);
        }
        while (hi - lo > 1) {
            long mid = lo + (hi - lo) / 2;
            if (test.test(mid)) hi = mid; else lo = mid;
        }
        return hi;
    }

    private void checkSize(long n) {
        if (n < 1 || n > testSize) throw new IllegalArgumentException("need 1 <= n <= N, got n=" + n + ", N=" + testSize);
    }

    private long checkCount(long count) {
        if (count < 0 || count > testSize) throw new IllegalArgumentException("count " + count + " outside [0, " + testSize + "]");
        return count;
    }
}
