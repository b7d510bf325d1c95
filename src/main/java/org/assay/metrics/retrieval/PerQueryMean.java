package org.assay.metrics.retrieval;

import org.assay.metrics.SumMetric;
import org.assay.metrics.SumStatistic;
import org.assay.metrics.UnitTable;

/**
 * The mean of one precomputed value per query: the unit table holds (value, 1) per query and the
 * metric is sum(value) / sum(1), so weights and the leave-one-out jackknife come from
 * {@link SumStatistic} in O(n).
 */
final class PerQueryMean implements UnitTable {
    private final double[] values;

    PerQueryMean(double[] values) { this.values = values; }

    static SumStatistic statistic(double[] values) {
        return new SumStatistic(new PerQueryMean(values), MEAN);
    }

    static final SumMetric MEAN = sums -> sums[1] == 0 ? Double.NaN : sums[0] / sums[1];

    @Override public int units() { return values.length; }
    @Override public int width() { return 2; }

    @Override
    public void addUnit(int i, double weight, double[] sums) {
        sums[0] += weight * values[i];
        sums[1] += weight;
    }
}
