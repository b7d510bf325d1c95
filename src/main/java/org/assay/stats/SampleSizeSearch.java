package org.assay.stats;

import java.util.function.LongPredicate;

/**
 * The smallest subsample size that meets a target, in the two forms planning needs.
 */
public final class SampleSizeSearch {
    /** No size in the searched range meets the target. */
    public static final long NONE = -1;

    private SampleSizeSearch() {}

    /**
     * The smallest n in [from, to] with {@code meets(n)}, by bisection, for a target that once met
     * stays met as n grows (a normal-approximation power or half-width, whose standard error falls
     * with n); {@link #NONE} when {@code meets(to)} is false.
     */
    public static long monotone(LongPredicate meets, long from, long to) {
        checkRange(from, to);
        if (!meets.test(to)) return NONE;
        long lo = from;
        long hi = to;
        while (lo < hi) {
            long mid = lo + (hi - lo) / 2;
            if (meets.test(mid)) hi = mid; else lo = mid + 1;
        }
        return lo;
    }

    /**
     * The smallest n in [from, to] from which the target is met at every size up to {@code to}:
     * one more than the largest size that misses it, for a target that zigzags with n (exact power
     * on counts). Every size from {@code to} down to that one is evaluated, so the answer is exact
     * within the range. {@link #NONE} when {@code meets(to)} is false.
     */
    public static long fromThenOn(LongPredicate meets, long from, long to) {
        checkRange(from, to);
        for (long n = to; n >= from; n--) {
            if (!meets.test(n)) return n == to ? NONE : n + 1;
        }
        return from;
    }

    private static void checkRange(long from, long to) {
        if (from < 1 || from > to) throw new IllegalArgumentException("need 1 <= from <= to, got " + from + ", " + to);
    }
}
