package org.assay.metrics;

import java.util.Arrays;
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
    private final int[] order;        // unit indices by ascending score
    private final int[] groupEnd;     // exclusive end (in order) of the tie group at each position
    private final boolean[] positive;

    public RocAucStatistic(double[] scores, boolean[] positive) {
        if (scores.length != positive.length) throw new IllegalArgumentException("length mismatch");
        this.n = scores.length;
        this.positive = positive.clone();
        Integer[] boxed = new Integer[n];
        for (int i = 0; i < n; i++) boxed[i] = i;
        Arrays.sort(boxed, (a, b) -> Double.compare(scores[a], scores[b]));
        order = new int[n];
        for (int i = 0; i < n; i++) order[i] = boxed[i];
        groupEnd = new int[n];
        int start = 0;
        while (start < n) {
            int end = start + 1;
            while (end < n && scores[order[end]] == scores[order[start]]) end++;
            for (int j = start; j < end; j++) groupEnd[j] = end;
            start = end;
        }
    }

    @Override public int units() { return n; }

    @Override public double estimate() { return value(null); }

    @Override
    public double value(int[] weights) {
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
