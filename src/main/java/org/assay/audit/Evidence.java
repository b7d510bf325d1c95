package org.assay.audit;

import org.assay.stats.Interval;

/**
 * What a reproduction says about the true value of one metric: intervals at any level, a
 * p-value against a claimed range, and where a reproduction would fall if a claim were true.
 * One implementation per method family: exact counts, DeLong, bootstrap.
 */
interface Evidence {
    double estimate();

    /** The interval the user asked for (or the default one) at the given confidence. */
    Interval interval(double confidence);

    /** Two-sided p-value of H0: the true value lies in [lo, hi]. */
    double pValue(double lo, double hi);

    /** The central {@code confidence} range of estimates a reproduction of this size would give if the truth were in [lo, hi]. */
    double[] rangeIfTrue(double lo, double hi, double confidence);

    /** Standard error of the estimate (with the finite-population correction when it applies). */
    double standardError();

    /**
     * Approximate standard error if {@code n} units had been evaluated instead, for saying how many
     * items would settle an inconclusive claim.
     */
    double standardErrorAt(long n);

    /** Notes on how the evidence was computed (shortcuts used, corrections applied). */
    java.util.List<String> notes();

    /** The resampled values in bins, for a plot; null when the evidence is not a bootstrap. */
    default Histogram histogram() { return null; }

    /** Notes about one claim tested against this evidence (for example a claim no count can produce). */
    default java.util.List<String> claimNotes(double lo, double hi) { return java.util.List.of(); }
}
