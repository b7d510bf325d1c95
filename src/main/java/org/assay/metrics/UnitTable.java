package org.assay.metrics;

/**
 * Per-unit statistics, filled once when predictions are read: each resampling unit
 * contributes a fixed-width vector, and a metric's value is a function of the weighted
 * sums of those vectors (DESIGN.md principle 1).
 */
public interface UnitTable {
    int units();

    /** Length of one unit's statistics vector. */
    int width();

    /** Adds {@code weight} times unit {@code i}'s statistics into {@code sums}. */
    void addUnit(int i, double weight, double[] sums);

    /** Weighted sums over all units; {@code weights == null} means every weight is 1. */
    default double[] weightedSums(int[] weights) {
        double[] sums = new double[width()];
        int n = units();
        for (int i = 0; i < n; i++) {
            int w = weights == null ? 1 : weights[i];
            if (w != 0) addUnit(i, w, sums);
        }
        return sums;
    }
}
