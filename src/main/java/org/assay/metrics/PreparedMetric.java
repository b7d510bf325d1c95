package org.assay.metrics;

import org.assay.stats.Resampled;

/**
 * A metric bound to one data set, ready for estimation.
 *
 * @param definition the metric
 * @param statistic  the resamplable statistic (its estimate is the metric's value)
 * @param successes  for COUNT metrics: units with outcome 1; otherwise -1
 * @param scores     for ROC_AUC: the positive-class scores; otherwise null
 * @param positive   for ROC_AUC: whether each unit is a positive; otherwise null
 */
public record PreparedMetric(
        MetricDefinition definition,
        Resampled statistic,
        long successes,
        double[] scores,
        boolean[] positive) {

    public double value() { return statistic.estimate(); }

    public int units() { return statistic.units(); }
}
