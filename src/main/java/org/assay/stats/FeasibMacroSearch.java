package org.assay.stats;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The bounded search behind {@link RatioFeasibility#macroRecall}: classes are added one at a
 * time (smallest first) and the exact partial sums of TP_c/n_c are kept as numerators over the
 * least common multiple of the class sizes so far. A partial sum that can no longer reach any
 * rounding interval, even with every remaining class fully right or fully wrong, is dropped after
 * offering its nearest completion (all remaining right, or all wrong) as a nearest-value
 * candidate, so nearest values stay exact. The largest class is never enumerated: for each kept
 * sum its k/n_max values form one arithmetic progression, queried in O(1).
 */
final class FeasibMacroSearch {
    private static final long GENERATED_CAP = 4_000_000;
    private static final FeasibSearch.Witness OUTSIDE = (num, den) -> {
        throw new IllegalStateException("a dropped partial sum cannot print as the claim");
    };

    private final long[] counts;
    private final int largest;
    private final int k;
    private final FeasibSearch search;
    private final long low;     // the hull of all rounding intervals, over q
    private final long high;
    private final long q;
    private final int[] order;  // the classes other than the largest, smallest first
    private final List<long[]> layers = new ArrayList<>();
    private final List<Long> lcms = new ArrayList<>();

    FeasibMacroSearch(Printed printed, long[] counts, int largest, FeasibSearch search) {
        this.counts = counts;
        this.largest = largest;
        this.k = counts.length;
        this.search = search;
        long lo = Long.MAX_VALUE;
        long hi = Long.MIN_VALUE;
        long common = 0;
        for (RoundingRule rule : RoundingRule.values()) {
            GridWindow w = GridWindow.of(printed, rule);
            lo = Math.min(lo, w.low);
            hi = Math.max(hi, w.high);
            common = w.q;
        }
        this.low = lo;
        this.high = hi;
        this.q = common;
        this.order = java.util.stream.IntStream.range(0, k).filter(c -> c != largest).boxed()
                .sorted((a, b) -> Long.compare(counts[a], counts[b])).mapToInt(Integer::intValue).toArray();
    }

    /** True when enumerating every partial sum without pruning stays under the cap. */
    boolean small() {
        long product = 1;
        for (int c : order) {
            if (product > RatioFeasibility.STATE_CAP / (counts[c] + 1)) return false;
            product *= counts[c] + 1;
        }
        return true;
    }

    /** Runs the search, feeding every achievable value it reaches to the search; false when it hit a cap. */
    boolean run() {
        try {
            return explore();
        } catch (ArithmeticException overflow) {
            return false;                                 // a common denominator outgrew long
        }
    }

    private boolean explore() {
        long lcm = 1;
        long[] current = {0};
        layers.add(current);
        lcms.add(lcm);
        for (int i = 0; i < order.length; i++) {
            long n = counts[order[i]];
            long next = Math.multiplyExact(lcm / gcd(lcm, n), n);
            if ((long) current.length * (n + 1) > GENERATED_CAP) return false;
            long scale = next / lcm;
            long step = next / n;
            long[] sums = new long[current.length * (int) (n + 1)];
            int m = 0;
            for (long r : current) {
                long base = Math.multiplyExact(r, scale);
                for (long t = 0; t <= n; t++) sums[m++] = base + t * step;
            }
            Arrays.sort(sums);
            long remaining = k - (i + 1);                 // classes still to add, the largest included
            long remainingNum = Math.multiplyExact(remaining, next);
            long denominator = Math.multiplyExact(k, next);
            // Keep r when r/next + remaining >= K*lo and r/next <= K*hi (rounded outward: keeping
            // too many is harmless, dropping too many is not).
            long keepMin = GridWindow.floorMulDiv(Math.multiplyExact(k, low), next, q) - remainingNum;
            long keepMax = GridWindow.ceilMulDiv(Math.multiplyExact(k, high), next, q);
            long[] kept = new long[m];
            int size = 0;
            boolean belowSeen = false;
            long below = 0;
            boolean aboveSeen = false;
            long above = 0;
            for (int j = 0; j < m; j++) {
                long r = sums[j];
                if (j > 0 && r == sums[j - 1]) continue;
                if (r < keepMin) {
                    belowSeen = true;
                    below = r;                            // sorted: the last one is the largest
                } else if (r > keepMax) {
                    if (!aboveSeen) above = r;
                    aboveSeen = true;
                } else {
                    kept[size++] = r;
                }
            }
            if (belowSeen) search.grid(denominator, below + remainingNum, below + remainingNum, OUTSIDE);
            if (aboveSeen) search.grid(denominator, above, above, OUTSIDE);
            if (size > RatioFeasibility.STATE_CAP) return false;
            current = Arrays.copyOf(kept, size);
            lcm = next;
            layers.add(current);
            lcms.add(lcm);
        }
        long nMax = counts[largest];
        long last = Math.multiplyExact(lcm / gcd(lcm, nMax), nMax);
        long denominator = Math.multiplyExact(k, last);
        long scale = last / lcm;
        long step = last / nMax;
        for (long r : current) {
            long base = Math.multiplyExact(r, scale);
            search.progression(denominator, base, step, nMax,
                    (num, den) -> witness(r, (num - base) / step));
        }
        return true;
    }

    /** Recovers one choice of TP per class from a kept partial sum by walking back through the layers. */
    private String witness(long sum, long rightInLargest) {
        long[] right = new long[k];
        right[largest] = rightInLargest;
        long r = sum;
        for (int i = order.length; i >= 1; i--) {
            int c = order[i - 1];
            long n = counts[c];
            long lcm = lcms.get(i);
            long scale = lcm / lcms.get(i - 1);
            long step = lcm / n;
            long[] previous = layers.get(i - 1);
            boolean found = false;
            for (long t = 0; t <= n && !found; t++) {
                long rest = r - t * step;
                if (rest >= 0 && rest % scale == 0 && Arrays.binarySearch(previous, rest / scale) >= 0) {
                    right[c] = t;
                    r = rest / scale;
                    found = true;
                }
            }
            if (!found) throw new IllegalStateException("partial sum without a predecessor");
        }
        return RatioFeasibility.perClass(right, counts);
    }

    private static long gcd(long a, long b) {
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return a;
    }
}
