package org.assay.stats;

/**
 * A statistic that depends only on how many units fall in each of a few categories (each unit in
 * exactly one: a confusion-matrix cell, say). Resampling n units with replacement then makes the
 * category counts Multinomial(n, observed shares), so {@link BootstrapEngine} draws those counts
 * directly (a few conditional binomials per resample) instead of n weights: the same distribution
 * of replicates, at a cost that does not grow with n.
 */
public interface CategoryCounts extends Resampled {
    /** Units in each category; they sum to {@link #units()}. */
    long[] categoryCounts();

    /** The statistic when category c holds {@code counts[c]} units. */
    double valueOfCounts(double[] counts);
}
