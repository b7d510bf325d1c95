package org.assay.metrics;

/** Which family of interval methods fits a metric (DESIGN.md principle 4). */
public enum MetricKind {
    /** A proportion of units with a 0/1 outcome: exact binomial / hypergeometric methods. */
    COUNT,
    /** Binary ROC AUC: DeLong's variance. */
    ROC_AUC,
    /** Anything else: bootstrap over the metric's resampling unit. */
    OTHER
}
