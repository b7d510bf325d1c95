package org.assay.audit;

/** The project's verdict words for a claim with a reproduction (DESIGN.md "Verdicts"). */
public enum Verdict {
    /** Not contradicted, and the reproduction shows agreement within the margin (two one-sided tests). */
    CONSISTENT("consistent"),
    /** Not contradicted, but the reproduction is too small to show agreement within the margin. */
    INCONCLUSIVE("inconclusive"),
    /** The claim lies outside what the reproduction allows, after the multiplicity adjustment. */
    DISCREPANT("discrepant"),
    /** The metric could not be computed from the predictions given; the finding says why. */
    NOT_COMPUTABLE("not computable");

    private final String word;

    Verdict(String word) { this.word = word; }

    public String word() { return word; }
}
