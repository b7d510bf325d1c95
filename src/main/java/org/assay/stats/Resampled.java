package org.assay.stats;

/**
 * A statistic the bootstrap engine can resample without knowing what it means.
 *
 * <p>A resample is a vector of non-negative integer weights, one per resampling unit
 * (DESIGN.md principle 1); the statistic re-aggregates its precomputed per-unit statistics
 * with those weights. Nothing is re-parsed or re-sorted per resample.
 */
public interface Resampled {
    /** Number of resampling units (examples, queries, sentences). */
    int units();

    /** The statistic with every unit weighted 1. */
    double estimate();

    /**
     * The statistic under integer weights; {@code weights.length == units()}. Must be
     * safe to call from several threads at once (keep no mutable state in the instance).
     */
    double value(int[] weights);

    /**
     * Leave-one-out values (unit i removed), used for the BCa acceleration. Implementations
     * should use a closed form from the summed statistics where one exists, O(n) overall,
     * not n re-runs of the metric.
     */
    double[] jackknife();
}
