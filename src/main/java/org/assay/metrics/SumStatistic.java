package org.assay.metrics;

import org.assay.stats.Resampled;

/**
 * Binds a {@link SumMetric} to its unit table so the bootstrap can resample it with weights.
 * The jackknife subtracts one unit's statistics from the total sums: no re-run of the metric
 * over n-1 units. One-hot tables have their own statistic, {@link CellStatistic}.
 */
public final class SumStatistic implements Resampled {
    private final UnitTable table;
    private final SumMetric metric;

    public SumStatistic(UnitTable table, SumMetric metric) {
        this.table = table;
        this.metric = metric;
    }

    public UnitTable table() { return table; }

    /** The function of the summed statistics. */
    public SumMetric metric() { return metric; }

    /** The statistic on unit {@code i} alone: for a count metric, that unit's 0/1 outcome. */
    public double unitValue(int i) {
        double[] sums = new double[table.width()];
        table.addUnit(i, 1, sums);
        return metric.value(sums);
    }

    @Override public int units() { return table.units(); }

    @Override public double estimate() { return metric.value(table.weightedSums(null)); }

    @Override public double value(int[] weights) { return metric.value(table.weightedSums(weights)); }

    @Override
    public double[] jackknife() {
        double[] total = table.weightedSums(null);
        int n = table.units();
        double[] out = new double[n];
        double[] work = new double[total.length];
        for (int i = 0; i < n; i++) {
            System.arraycopy(total, 0, work, 0, total.length);
            table.addUnit(i, -1, work);
            out[i] = metric.value(work);
        }
        return out;
    }
}
