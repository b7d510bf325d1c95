package org.assay.audit.checks;

/** What a claim-only check found (DESIGN.md "Verdicts", claim on its own, plus our own words). */
public enum CheckKind {
    /** No outcome on the stated test set can print this value, or a range or consistency rule is broken. */
    INFEASIBLE("infeasible"),
    /** More digits than the test set's sampling error supports. */
    OVERSTATED_PRECISION("overstated precision"),
    /** A compared lead smaller than the test set can resolve. */
    UNRESOLVED_GAP("gap not resolvable"),
    /** Possible, but unlikely as printed (a fraction in a percent column, a ± that does not fit its kind). */
    QUESTIONABLE("questionable"),
    /** Information for the reader, not a fault (for example that a rule does not apply). */
    NOTE("note"),
    /** A check that needs information the claims file does not give. */
    NOT_CHECKED("not checked");

    private final String word;

    CheckKind(String word) { this.word = word; }

    public String word() { return word; }

    /** Findings a reviewer should raise with the authors. */
    public boolean isProblem() { return this == INFEASIBLE || this == OVERSTATED_PRECISION || this == UNRESOLVED_GAP
            || this == QUESTIONABLE; }
}
