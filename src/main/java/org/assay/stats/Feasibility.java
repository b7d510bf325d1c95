package org.assay.stats;

/**
 * Whether a printed value can arise from some outcome on the stated test set, per rounding rule.
 *
 * @param roundedFeasible   some outcome prints as the value under half-up or half-even rounding
 * @param halfUpFeasible    some outcome prints as the value under half-up rounding
 * @param halfEvenFeasible  some outcome prints as the value under half-even rounding
 * @param truncatedFeasible some outcome prints as the value when extra digits are dropped
 * @param witness           concrete counts of one such outcome (for the rounded check when it
 *                          succeeds, else for truncation), or null when there is none
 * @param nearestBelow      the nearest achievable value below the rounded interval (the union of
 *                          the half-up and half-even intervals), printed half-up with the same
 *                          decimals; null when there is none
 * @param nearestAbove      likewise above the rounded interval
 * @param exhaustive        false when a search was cut short: then a false flag means "not
 *                          found", not "impossible", and the claim must not be called infeasible
 * @param note              a plain-words remark (which rule the witness needs, why a search
 *                          stopped), or null
 */
public record Feasibility(boolean roundedFeasible, boolean halfUpFeasible, boolean halfEvenFeasible,
                          boolean truncatedFeasible, String witness, String nearestBelow,
                          String nearestAbove, boolean exhaustive, String note) {

    /** True only when the search was complete and no outcome prints as the value under any rule. */
    public boolean provenInfeasible() {
        return exhaustive && !roundedFeasible && !truncatedFeasible;
    }
}
