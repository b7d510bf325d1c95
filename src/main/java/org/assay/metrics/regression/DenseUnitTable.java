package org.assay.metrics.regression;

import org.assay.metrics.UnitTable;

/** A unit table stored row-major: unit i's statistics are {@code stats[i*width .. i*width+width)}. */
final class DenseUnitTable implements UnitTable {
    private final double[] stats;
    private final int width;
    private final int units;

    DenseUnitTable(double[] stats, int width) {
        if (stats.length % width != 0) throw new IllegalArgumentException("length not a multiple of width");
        this.stats = stats;
        this.width = width;
        this.units = stats.length / width;
    }

    @Override public int units() { return units; }
    @Override public int width() { return width; }

    @Override
    public void addUnit(int i, double weight, double[] sums) {
        int at = i * width;
        for (int c = 0; c < width; c++) sums[c] += weight * stats[at + c];
    }
}
