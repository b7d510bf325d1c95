package org.assay.audit;

import java.util.Arrays;

/**
 * A bootstrap distribution in equal-width bins, for plots: the replicates between {@code lower}
 * and {@code lower + width * counts.length} (the last bin includes its upper edge).
 */
public record Histogram(double lower, double width, int[] counts) {
    public Histogram {
        counts = counts.clone();
    }

    public double upper() { return lower + width * counts.length; }

    public int total() { return Arrays.stream(counts).sum(); }

    /** {@code bins} equal bins over the range of {@code values}; one bin of width 0 when all are equal. */
    public static Histogram of(double[] values, int bins) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            if (!Double.isFinite(v)) continue;
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        if (lo > hi) return new Histogram(0, 0, new int[0]);
        if (lo == hi) return new Histogram(lo, 0, new int[] {values.length});
        double width = (hi - lo) / bins;
        int[] counts = new int[bins];
        for (double v : values) {
            if (!Double.isFinite(v)) continue;
            counts[Math.min(bins - 1, (int) ((v - lo) / width))]++;
        }
        return new Histogram(lo, width, counts);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Histogram h && lower == h.lower && width == h.width && Arrays.equals(counts, h.counts);
    }

    @Override
    public int hashCode() { return 31 * Double.hashCode(lower) + Arrays.hashCode(counts); }

    @Override
    public String toString() { return "Histogram[" + lower + " + " + width + " x " + Arrays.toString(counts) + "]"; }
}
