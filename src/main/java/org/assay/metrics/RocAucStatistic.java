package org.assay.metrics;

import org.assay.stats.Resampled;

/**
 * Binary ROC AUC with ties between a positive and a negative counted one half: the
 * Mann-Whitney U statistic over n_pos * n_neg (Hanley & McNeil 1982, Radiology 143:29-36).
 *
 * <p>Units are sorted by score once; every resample is one weighted pass over tie groups in
 * that order, O(n). The jackknife uses the placement values (DeLong, DeLong &amp;
 * Clarke-Pearson 1988): removing a positive removes its placement among the negatives from U,
 * so all n leave-one-out values cost O(n) after the sort.
 */
public final class RocAucStatistic implements Resampled {
    private final int n;
    private final double[] scores;
    private final boolean[] positive;
    private volatile Sorted sorted;   // built on first use: a DeLong interval never needs it

    /** Units in ascending score order and, at each position, the exclusive end of its tie group. */
    private record Sorted(int[] order, int[] groupEnd) {}

    /** @param scores score per unit (kept, not copied: it must not change); @param positive class per unit */
    public RocAucStatistic(double[] scores, boolean[] positive) {
        if (scores.length != positive.length) throw new IllegalArgumentException("length mismatch");
        this.n = scores.length;
        this.scores = scores;
        this.positive = positive.clone();
    }

    /**
     * Sorts once, with primitives only (a boxed index sort costs about 20 bytes a unit): the
     * scores' order-preserving long keys are sorted, and each unit is then placed, in index order,
     * at the next free position of its key's run. The order equals a stable sort by
     * {@link Double#compare}; tie groups are runs of equal scores ({@code ==}, so -0.0 and 0.0
     * share one).
     */
    private Sorted sorted() {
        Sorted s = sorted;
        if (s != null) return s;
        synchronized (this) {
            if (sorted != null) return sorted;
            long[] keys = new long[n];
            for (int i = 0; i < n; i++) keys[i] = key(scores[i]);
            java.util.Arrays.sort(keys);
            int[] order = new int[n];
            int[] next = new int[n];   // placements made in the run starting at each position
            for (int i = 0; i < n; i++) {
                int start = firstAtLeast(keys, key(scores[i]));
                order[start + next[start]++] = i;
            }
            int[] groupEnd = next;     // reused: the placement counts are no longer needed
            int start = 0;
            while (start < n) {
                int end = start + 1;
                while (end < n && scores[order[end]] == scores[order[start]]) end++;
                for (int j = start; j < end; j++) groupEnd[j] = end;
                start = end;
            }
            sorted = new Sorted(order, groupEnd);
            return sorted;
        }
    }

    /** A long that sorts as {@link Double#compare} sorts the doubles (scores are never NaN). */
    private static long key(double score) {
        long bits = Double.doubleToLongBits(score);
        return bits ^ ((bits >> 63) & 0x7fffffffffffffffL);
    }

    private static int firstAtLeast(long[] sorted, long key) {
        int lo = 0;
        int hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < key) lo = mid + 1; else hi = mid;
        }
        return lo;
    }

    @Override public int units() { return n; }

    @Override public double estimate() { return value(null); }

    @Override
    public double value(int[] weights) {
        int[] order = sorted().order();
        int[] groupEnd = sorted().groupEnd();
        double u = 0, negBelow = 0, totalPos = 0;
        int start = 0;
        while (start < n) {
            int end = groupEnd[start];
            double pos = 0, neg = 0;
            for (int j = start; j < end; j++) {
                int unit = order[j];
                double w = weights == null ? 1 : weights[unit];
                if (positive[unit]) pos += w; else neg += w;
            }
            u += pos * (negBelow + 0.5 * neg);
            negBelow += neg;
            totalPos += pos;
            start = end;
        }
        double pairs = totalPos * negBelow;
        return pairs == 0 ? Double.NaN : u / pairs;
    }

    /**
     * Placement of each unit: for a positive, the (tie-halved) count of negatives below it;
     * for a negative, the count of positives above it. Unnormalised.
     */
    double[] placements() {
        int[] order = sorted().order();
        int[] groupEnd = sorted().groupEnd();
        double[] place = new double[n];
        int totalNeg = 0, totalPos = 0;
        for (boolean p : positive) { if (p) totalPos++; else totalNeg++; }
        int negBelow = 0, posBelow = 0;
        int start = 0;
        while (start < n) {
            int end = groupEnd[start];
            int pos = 0, neg = 0;
            for (int j = start; j < end; j++) { if (positive[order[j]]) pos++; else neg++; }
            for (int j = start; j < end; j++) {
                int unit = order[j];
                place[unit] = positive[unit]
                        ? negBelow + 0.5 * neg
                        : (totalPos - posBelow - pos) + 0.5 * pos;
            }
            negBelow += neg;
            posBelow += pos;
            start = end;
        }
        return place;
    }

    @Override
    public double[] jackknife() {
        double[] place = placements();
        long nPos = 0, nNeg = 0;
        for (boolean p : positive) { if (p) nPos++; else nNeg++; }
        double u = 0;
        for (int i = 0; i < n; i++) if (positive[i]) u += place[i];
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double pairs = positive[i] ? (nPos - 1) * (double) nNeg : nPos * (double) (nNeg - 1);
            out[i] = pairs == 0 ? Double.NaN : (u - place[i]) / pairs;
        }
        return out;
    }
}
