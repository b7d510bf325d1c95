package org.assay.audit;

import java.util.List;
import org.assay.stats.Interval;

/**
 * What two reproductions on the same items say about the gap between two systems (A &minus; B, on the
 * metric's fraction scale): its estimate and interval, and a two-sided p-value of H0: no difference.
 * One implementation per method family: McNemar for counts, paired DeLong for ROC AUC, the paired
 * bootstrap, approximate randomization.
 */
interface PairedEvidence {
    /** The reproduced gap A &minus; B. */
    double gap();

    /** An interval for the gap at the given confidence, with its method. */
    Interval interval(double confidence);

    /** Two-sided p-value of H0: the systems do not differ on this metric. */
    double pValue();

    /** The name of the test behind {@link #pValue()}. */
    String test();

    /** How the evidence was computed (corrections, fallbacks). */
    List<String> notes();

    /** For count metrics: items counted (outcome 1) for A only and for B only; otherwise null. */
    default long[] discordant() { return null; }
}
