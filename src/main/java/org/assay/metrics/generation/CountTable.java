package org.assay.metrics.generation;

import java.util.Arrays;
import org.assay.metrics.UnitTable;

/**
 * Per-item whole-number statistics (n-gram counts and lengths), stored row-major as ints: item
 * i's statistics are {@code counts[i*width .. i*width+width)}. Ints rather than doubles halve the
 * memory of a large corpus; sums are taken in doubles, exact for any realistic corpus.
 */
final class CountTable implements UnitTable {
    private final int[] counts;
    private final int width;

    CountTable(int[] counts, int width) {
        if (width <= 0 || counts.length % width != 0) throw new IllegalArgumentException("length not a multiple of width");
        this.counts = counts;
        this.width = width;
    }

    @Override public int units() { return counts.length / width; }
    @Override public int width() { return width; }

    /** Item i's statistics (a copy). */
    int[] row(int i) { return Arrays.copyOfRange(counts, i * width, (i + 1) * width); }

    @Override
    public void addUnit(int i, double weight, double[] sums) {
        int at = i * width;
        for (int c = 0; c < width; c++) sums[c] += weight * counts[at + c];
    }

    /**
     * The same sums as the default (unit by unit through {@link #addUnit}), in one pass over the
     * rows with whole-number arithmetic: this is a bootstrap resample's whole cost for BLEU, and the
     * per-unit calls were most of it. Exact: the long sums equal the double sums of the default
     * whenever those are exact (below 2^53).
     */
    @Override
    public double[] weightedSums(int[] weights) {
        long[] sums = new long[width];
        int n = units();
        for (int i = 0, at = 0; i < n; i++, at += width) {
            long w = weights == null ? 1 : weights[i];
            if (w == 0) continue;
            for (int c = 0; c < width; c++) sums[c] += w * counts[at + c];
        }
        double[] out = new double[width];
        for (int c = 0; c < width; c++) out[c] = sums[c];
        return out;
    }
}
