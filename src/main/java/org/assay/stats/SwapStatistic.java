package org.assay.stats;

/**
 * The difference between two systems' metric values on the same units, recomputed after swapping
 * some units' outputs between the systems: what approximate randomization resamples
 * ({@link ApproximateRandomization}). Implementations must be safe to call from several threads.
 */
public interface SwapStatistic {
    /** Number of paired units. */
    int units();

    /** The difference A &minus; B on the data as observed (no unit swapped). */
    double observed();

    /**
     * The difference A&prime; &minus; B&prime; where, for every unit i with {@code swap[i]}, A&prime; takes
     * B's output for unit i and B&prime; takes A's. NaN when the metric is undefined for the swapped outputs.
     */
    double swapped(boolean[] swap);
}
