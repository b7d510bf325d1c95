package org.assay.stats;

/**
 * Sample quantiles of an already sorted array by linear interpolation between order
 * statistics: Hyndman &amp; Fan (1996, Amer. Statist. 50:361-365) definition 7, the default
 * of numpy.percentile ("linear") and of R's quantile(type = 7), and the rule
 * scipy.stats.bootstrap uses for its interval endpoints.
 *
 * <p>Written by hand rather than with Commons Math {@code Percentile(R_7)}: the replicates
 * are sorted once, and that class copies and re-partitions the array on every call and
 * rejects probability 0, which a BCa-adjusted level can reach.
 */
final class BootstrapQuantile {
    private BootstrapQuantile() {}

    /** Quantile at probability {@code p} in [0, 1]: position h = (B - 1) p, 0-based. */
    static double linear(double[] sorted, double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("quantile probability " + p + " is outside [0, 1]");
        }
        int last = sorted.length - 1;
        double h = last * p;
        int below = (int) Math.floor(h);
        if (below >= last) return sorted[last];
        double fraction = h - below;
        double lower = sorted[below];
        double upper = sorted[below + 1];
        // lower == upper needs no interpolation; this also keeps the result exact on ties
        return lower == upper ? lower : lower + fraction * (upper - lower);
    }
}
