package org.assay.audit;

import java.util.List;
import org.assay.claims.Claim;
import org.assay.stats.Interval;

/**
 * What the audit concluded about one claim. All values are on the metric's fraction scale.
 *
 * @param claim          the claim
 * @param verdict        the verdict
 * @param claimLower     lower end of the claim's rounding interval
 * @param claimUpper     upper end of the claim's rounding interval
 * @param n              units the reproduction evaluated
 * @param population     full test-set size N, or null when unknown
 * @param estimate       the reproduced value
 * @param interval       its interval, with method
 * @param equivalence    the (1 - 2 alpha) interval used for the two one-sided tests
 * @param rangeIfTrue    where a reproduction of this size would fall if the claim were true
 * @param pValue         two-sided p-value of "the true value lies in the claim's rounding interval"
 * @param adjustedP      the same after the audit's multiplicity adjustment (Holm by default) across its claims
 * @param margin         equivalence margin
 * @param difference     estimate minus the nearest end of the claim's interval (0 when inside)
 * @param itemsToSettle  approximate subsample size at which an inconclusive claim would be settled, or null
 * @param reason         for NOT_COMPUTABLE: why
 * @param notes          method notes and cautions specific to this claim
 * @param histogram      for bootstrap evidence: the resampled values in bins (for plots); otherwise null
 */
public record Finding(
        Claim claim,
        Verdict verdict,
        double claimLower,
        double claimUpper,
        long n,
        Long population,
        double estimate,
        Interval interval,
        Interval equivalence,
        double[] rangeIfTrue,
        double pValue,
        double adjustedP,
        double margin,
        double difference,
        Long itemsToSettle,
        String reason,
        List<String> notes,
        Histogram histogram) {

    /** "below", "above" or "within" the claim's rounding interval. */
    public String direction() {
        if (difference < 0) return "below";
        if (difference > 0) return "above";
        return "within";
    }

    static Finding notComputable(Claim claim, double lo, double hi, String reason) {
        return new Finding(claim, Verdict.NOT_COMPUTABLE, lo, hi, 0, null, Double.NaN, null, null, null,
                Double.NaN, Double.NaN, Double.NaN, Double.NaN, null, reason, List.of(), null);
    }
}
