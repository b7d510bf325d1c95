package org.assay.metrics.regression;

import java.util.Arrays;

/**
 * One variable's units sorted once by value, with runs of equal values (tie groups) marked.
 * Equal means {@code ==}, so 0.0 and -0.0 tie, as they do for scipy's rankdata.
 */
final class TieOrder {
    /** Unit indices in ascending order of value. */
    final int[] order;
    /** Group g occupies positions {@code start[g] .. start[g+1])} of {@link #order}. */
    final int[] start;
    /** The tie group of each unit. */
    final int[] groupOf;

    TieOrder(double[] values) {
        int n = values.length;
        Integer[] boxed = new Integer[n];
        for (int i = 0; i < n; i++) boxed[i] = i;
        Arrays.sort(boxed, (a, b) -> values[a] < values[b] ? -1 : values[a] > values[b] ? 1 : 0);
        order = new int[n];
        groupOf = new int[n];
        int[] starts = new int[n + 1];
        int groups = 0;
        for (int p = 0; p < n; p++) {
            order[p] = boxed[p];
            if (p == 0 || values[order[p]] != values[order[p - 1]]) starts[groups++] = p;
            groupOf[order[p]] = groups - 1;
        }
        starts[groups] = n;
        start = Arrays.copyOf(starts, groups + 1);
    }

    int groups() { return start.length - 1; }

    int groupSize(int g) { return start[g + 1] - start[g]; }

    /**
     * Each unit's mid-rank among the data with unit i repeated {@code weights[i]} times
     * ({@code null}: once each), minus the mean rank (W + 1) / 2. A tie group of total weight
     * t after b lighter-valued copies holds ranks b+1 .. b+t, whose mean is b + (t + 1) / 2.
     * Values are multiples of 1/2, so they are exact.
     */
    double[] centredRanks(int[] weights, long total) {
        double[] rank = new double[order.length];
        long below = 0;
        for (int g = 0; g < groups(); g++) {
            long t = 0;
            for (int p = start[g]; p < start[g + 1]; p++) t += weights == null ? 1 : weights[order[p]];
            double centred = below + t / 2.0 - total / 2.0;
            for (int p = start[g]; p < start[g + 1]; p++) rank[order[p]] = centred;
            below += t;
        }
        return rank;
    }
}
