package org.assay.audit;

import java.util.List;
import org.assay.claims.Claim;

/**
 * How many items of a test set to evaluate for one claim. Values are on the metric's fraction
 * scale; a size is null when no subsample size up to {@code searchedUpTo} meets its target.
 *
 * @param method       how the probabilities were computed, in words
 * @param exact        whether they are exact sums over the hypergeometric distribution (count metrics)
 * @param value        the printed value on the fraction scale
 * @param lowerTruth   the true value one margin below the claim the discrepancy test should catch; null when not planned
 * @param higherTruth  the same one margin above; null when not planned
 * @param nInterval    smallest size whose interval half-width is at most the margin
 * @param nDetect      smallest size whose discrepancy test reaches the target power (in each planned direction)
 * @param nAgree       smallest size whose two one-sided tests reach the target power if the claim is right
 * @param searchedUpTo the largest size computed; exact sizes hold at every size from them up to it
 */
public record ClaimPlan(Claim claim, long testSize, String method, boolean exact, double value, double claimLower,
                        double claimUpper, double margin, Double lowerTruth, Double higherTruth, Long nInterval,
                        Long nDetect, Long nAgree, long searchedUpTo, List<PlanRow> rows, List<String> notes) {
    public ClaimPlan {
        rows = List.copyOf(rows);
        notes = List.copyOf(notes);
    }

    /** The size that meets all three targets; null when one of them is met by no size. */
    public Long n() {
        if (nInterval == null || nDetect == null || nAgree == null) return null;
        return Math.max(nInterval, Math.max(nDetect, nAgree));
    }
}
