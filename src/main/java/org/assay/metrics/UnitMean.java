package org.assay.metrics;

/**
 * The mean of one precomputed value per unit (a query's reciprocal rank, a sentence's ROUGE-L):
 * the unit table holds (value, 1) per unit and the metric is sum(value) / sum(1), so weights and
 * the leave-one-out jackknife come from {@link SumStatistic} in O(n).
 */
public final class UnitMean implements UnitTable {
    private final double[] values;

    private UnitMean(double[] values) { this.values = values; }

    /** The weighted mean of {@code values}, one per resampling unit (the array is not copied). */
    public static SumStatistic statistic(double[] values) {
        return new SumStatistic(new UnitMean(values), MEAN);
    }

    private static final SumMetric MEAN = sums -> sums[1] == 0 ? Double.NaN : sums[0] / sums[1];

    @Override public int units() { return values.length; }
    @Override public int width() { return 2; }

    @Override
    public void addUnit(int i, double weight, double[] sums) {
        sums[0] += weight * values[i];
        sums[1] += weight;
    }
}
