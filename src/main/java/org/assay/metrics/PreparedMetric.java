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
 * @param notComputable why these outputs cannot give this metric (a K beyond the scored depth), or null
 * @param configuration the settings the value depends on, in one line (generation metrics), or null
 */
public record PreparedMetric(
        MetricDefinition definition,
        Resampled statistic,
        long successes,
        double[] scores,
        boolean[] positive,
        String notComputable,
        String configuration) {

    public PreparedMetric(MetricDefinition definition, Resampled statistic, long successes, double[] scores,
                          boolean[] positive) {
        this(definition, statistic, successes, scores, positive, null, null);
    }

    public double value() { return statistic.estimate(); }

    public int units() { return statistic.units(); }
}
