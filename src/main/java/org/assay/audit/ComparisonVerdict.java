package org.assay.audit;

/**
 * What a paired comparison of two reproduced rows concluded about the ordering the table printed
 * (the project's own words; README "Compared rows"). The claimed ordering is the sign of the
 * printed difference A &minus; B; the test is two-sided at 1 &minus; confidence, on the p-value adjusted
 * across the audit's comparisons.
 */
public enum ComparisonVerdict {
    /** The reproduced gap has the printed sign and the adjusted p-value is below alpha. */
    ORDERING_REPLICATED("ordering replicated"),
    /** The adjusted p-value is not below alpha: these items cannot tell the rows apart. */
    ORDERING_NOT_SHOWN("ordering not shown"),
    /** The reproduced gap has the opposite sign and the adjusted p-value is below alpha. */
    ORDERING_REVERSED("ordering reversed"),
    /** The two printed values are equal, so the table claims no ordering; the gap is still reported. */
    NO_ORDERING_CLAIMED("no ordering claimed"),
    /** The gap could not be computed from the outputs; the comparison says why. */
    NOT_COMPUTABLE("not computable");

    private final String word;

    ComparisonVerdict(String word) { this.word = word; }

    public String word() { return word; }

    /**
     * The verdict for a printed gap (its sign is the claimed ordering), a reproduced gap and the
     * adjusted p-value of "no difference".
     */
    static ComparisonVerdict of(double printedGap, double reproducedGap, double adjustedP, double alpha) {
        if (printedGap == 0) return NO_ORDERING_CLAIMED;
        if (!(adjustedP < alpha) || reproducedGap == 0) return ORDERING_NOT_SHOWN;
        return Math.signum(reproducedGap) == Math.signum(printedGap) ? ORDERING_REPLICATED : ORDERING_REVERSED;
    }
}
