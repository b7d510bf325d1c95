package org.assay.stats;

/**
 * A confidence interval on the metric's own scale (fractions, not percent), with the
 * name of the method that produced it so every report can say how it was computed.
 */
public record Interval(double lower, double upper, double confidence, String method) {
    public Interval {
        if (Double.isNaN(lower) || Double.isNaN(upper)) {
            throw new IllegalArgumentException("interval bound is NaN (" + method + ")");
        }
        if (lower > upper) {
            throw new IllegalArgumentException("lower " + lower + " > upper " + upper + " (" + method + ")");
        }
    }

    public double halfWidth() { return (upper - lower) / 2; }

    public boolean contains(double x) { return x >= lower && x <= upper; }

    /** True when this interval and [lo, hi] share at least one point. */
    public boolean overlaps(double lo, double hi) { return lower <= hi && lo <= upper; }
}
