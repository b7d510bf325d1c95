package org.assay.metrics;

/** A metric whose value is a function of weighted sums of its units' statistics. */
public interface SumMetric {
    /** The metric's value from the summed statistics; NaN when it is undefined for them. */
    double value(double[] sums);
}
