package org.assay.metrics;

import org.assay.stats.CategoryCounts;

/**
 * A {@link SumMetric} over a {@link OneHotUnitTable}: every unit adds 1 to one cell (a
 * confusion-matrix cell, a correct flag), so the metric depends only on the cell counts. The
 * bootstrap then draws the resampled counts directly ({@link CategoryCounts}), and the
 * leave-one-out value of a unit depends only on its cell, so the jackknife costs one metric
 * evaluation per cell.
 */
public final class CellStatistic implements CategoryCounts {
    private final OneHotUnitTable table;
    private final SumMetric metric;

    public CellStatistic(OneHotUnitTable table, SumMetric metric) {
        this.table = table;
        this.metric = metric;
    }

    /** The same statistic as a plain sum over units, for paired methods that need each unit's statistics. */
    public SumStatistic asSum() { return new SumStatistic(table, metric); }

    @Override public int units() { return table.units(); }

    @Override public double estimate() { return metric.value(table.weightedSums(null)); }

    @Override public double value(int[] weights) { return metric.value(table.weightedSums(weights)); }

    @Override
    public long[] categoryCounts() {
        double[] sums = table.weightedSums(null);
        long[] counts = new long[sums.length];
        for (int c = 0; c < sums.length; c++) counts[c] = (long) sums[c];
        return counts;
    }

    @Override public double valueOfCounts(double[] counts) { return metric.value(counts.clone()); }

    @Override
    public double[] jackknife() {
        double[] total = table.weightedSums(null);
        double[] byCell = new double[table.width()];
        boolean[] done = new boolean[table.width()];
        double[] out = new double[table.units()];
        for (int i = 0; i < out.length; i++) {
            int c = table.cellOf(i);
            if (!done[c]) {
                total[c] -= 1;
                byCell[c] = metric.value(total);
                total[c] += 1;
                done[c] = true;
            }
            out[i] = byCell[c];
        }
        return out;
    }
}
