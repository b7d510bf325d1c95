package org.assay.stats;

/**
 * The distribution of the count X of successes in a simple random sample of n items, drawn
 * without replacement from N items of which K are successes (the hypergeometric distribution),
 * tabulated only where its probabilities are not negligible.
 *
 * <p>The terms come from the ratio of consecutive probabilities,
 * P(X = k + 1) / P(X = k) = (K &minus; k)(n &minus; k) / ((k + 1)(N &minus; K &minus; n + k + 1))
 * (Johnson, Kemp &amp; Kotz, Univariate Discrete Distributions, 3rd ed. 2005, section 6.3), walked
 * outward from the mode until a term falls below {@link #NEGLIGIBLE} times the mode's, and are
 * normalised by their sum. The walk covers about 10 standard deviations on each side, so one
 * table costs O(&radic;n) rather than the O(n) of summing a tail from the end of the support.
 *
 * <p>Written by hand because planning evaluates thousands of these distributions (one per
 * subsample size and count), and Commons Math's {@code HypergeometricDistribution}, which
 * {@link FinitePopulation} uses for single intervals and p-values, sums every tail term by term
 * from the end of the support on each call. {@code HypergeometricWindowTest} holds the two
 * against each other.
 */
final class HypergeometricWindow {
    /**
     * Terms below this fraction of the largest are left out. Past the point where they fall
     * below it the terms shrink at least geometrically, so the mass left out is of the same
     * order: far below the 1e-16 resolution of the probabilities compared here.
     */
    static final double NEGLIGIBLE = 1e-22;

    private final long first;
    private final double[] atMost;    // atMost[i] = P(X <= first + i)
    private final double[] atLeast;   // atLeast[i] = P(X >= first + i)

    private HypergeometricWindow(long first, double[] atMost, double[] atLeast) {
        this.first = first;
        this.atMost = atMost;
        this.atLeast = atLeast;
    }

    /** The count's distribution for a sample of {@code n} from {@code N} items with {@code K} successes. */
    static HypergeometricWindow of(long n, long N, long K) {
        if (N < 1 || n < 0 || n > N || K < 0 || K > N) {
            throw new IllegalArgumentException("need 0 <= n <= N and 0 <= K <= N, got n=" + n + ", N=" + N + ", K=" + K);
        }
        long low = Math.max(0, n - (N - K));
        long high = Math.min(n, K);
        // the mode, floor((n + 1)(K + 1) / (N + 2)); both factors stay below 2^32, so the product fits a long
        long mode = Math.max(low, Math.min(high, (n + 1) * (K + 1) / (N + 2)));
        int capacity = (int) Math.min(high - low + 1, 256);
        double[] up = new double[capacity];        // terms mode, mode + 1, ...
        double[] down = new double[capacity];      // terms mode - 1, mode - 2, ...
        int ups = 0;
        int downs = 0;
        double term = 1;
        up[ups++] = term;
        for (long k = mode; k < high; k++) {
            term *= (double) (K - k) * (n - k) / ((double) (k + 1) * (N - K - n + k + 1));
            if (term < NEGLIGIBLE) break;
            if (ups == up.length) up = java.util.Arrays.copyOf(up, 2 * ups);
            up[ups++] = term;
        }
        term = 1;
        for (long k = mode; k > low; k--) {
            term *= (double) k * (N - K - n + k) / ((double) (K - k + 1) * (n - k + 1));
            if (term < NEGLIGIBLE) break;
            if (downs == down.length) down = java.util.Arrays.copyOf(down, 2 * downs);
            down[downs++] = term;
        }
        int size = ups + downs;
        double[] pmf = new double[size];
        for (int i = 0; i < downs; i++) pmf[i] = down[downs - 1 - i];
        System.arraycopy(up, 0, pmf, downs, ups);
        // cumulative sums from each end, each starting from its small terms so neither tail loses them
        double[] atMost = new double[size];
        double[] atLeast = new double[size];
        double sum = 0;
        for (int i = 0; i < size; i++) atMost[i] = sum += pmf[i];
        double total = sum;
        sum = 0;
        for (int i = size - 1; i >= 0; i--) atLeast[i] = sum += pmf[i];
        for (int i = 0; i < size; i++) {
            atMost[i] /= total;
            atLeast[i] /= total;
        }
        return new HypergeometricWindow(mode - downs, atMost, atLeast);
    }

    /** Smallest count tabulated; every smaller count has a negligible (or zero) probability. */
    long first() { return first; }

    /** Largest count tabulated. */
    long last() { return first + atMost.length - 1; }

    /** P(X &lt;= k). */
    double atMost(long k) {
        if (k < first) return 0;
        if (k > last()) return 1;
        return atMost[(int) (k - first)];
    }

    /** P(X &gt;= k). */
    double atLeast(long k) {
        if (k < first) return 1;
        if (k > last()) return 0;
        return atLeast[(int) (k - first)];
    }

    /** P(a &lt;= X &lt;= b), 0 when a &gt; b; from the nearer tail, so a small probability keeps its digits. */
    double between(long a, long b) {
        if (a > b) return 0;
        long middle = first + atMost.length / 2;
        double p;
        if (b < middle) p = atMost(b) - atMost(a - 1);
        else if (a > middle) p = atLeast(a) - atLeast(b + 1);
        else p = 1 - atMost(a - 1) - atLeast(b + 1);
        return Math.max(0, p);
    }

    /** The largest k with P(X &lt;= k) &lt; level; first() &minus; 1 when none in the table is. */
    long largestWithAtMostBelow(double level) {
        int lo = -1;
        int hi = atMost.length - 1;    // atMost rises with the index
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (atMost[mid] < level) lo = mid; else hi = mid - 1;
        }
        return first + lo;
    }

    /** The smallest k with P(X &gt;= k) &lt; level; last() + 1 when none in the table is. */
    long smallestWithAtLeastBelow(double level) {
        int lo = 0;
        int hi = atLeast.length;       // atLeast falls with the index
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (atLeast[mid] < level) hi = mid; else lo = mid + 1;
        }
        return first + lo;
    }

    /** The smallest k with P(X &gt;= k) &lt;= level; last() + 1 when none in the table is. */
    long smallestWithAtLeastAtMost(double level) {
        int lo = 0;
        int hi = atLeast.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (atLeast[mid] <= level) hi = mid; else lo = mid + 1;
        }
        return first + lo;
    }

    /** The largest k with P(X &lt;= k) &lt;= level; first() &minus; 1 when none in the table is. */
    long largestWithAtMostAtMost(double level) {
        int lo = -1;
        int hi = atMost.length - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (atMost[mid] <= level) lo = mid; else hi = mid - 1;
        }
        return first + lo;
    }
}
