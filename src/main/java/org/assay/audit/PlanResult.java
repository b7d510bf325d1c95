package org.assay.audit;

import java.util.List;
import org.assay.claims.Claim;

/**
 * The plans for one claim or for every claim of a table, and the claims that could not be planned
 * with the reason (nothing is dropped silently).
 */
public record PlanResult(PlanSettings settings, String table, List<ClaimPlan> plans, List<Skipped> skipped) {
    public PlanResult {
        plans = List.copyOf(plans);
        skipped = List.copyOf(skipped);
    }

    /** A claim that was not planned, and why. */
    public record Skipped(Claim claim, String reason) {}

    /** The size that serves every planned claim: the largest of their sizes; null when one of them has none. */
    public Long nForAll() {
        long max = 0;
        for (ClaimPlan p : plans) {
            if (p.n() == null) return null;
            max = Math.max(max, p.n());
        }
        return plans.isEmpty() ? null : max;
    }
}
