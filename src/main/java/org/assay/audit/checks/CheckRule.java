package org.assay.audit.checks;

import java.util.List;
import org.assay.claims.ClaimTable;

/** One claim-only rule, applied to one table at a time. */
interface CheckRule {
    String name();

    /** Findings for the table; every check run (found fine or not) is counted in {@code tally}. */
    List<CheckFinding> check(ClaimTable table, Tally tally);
}
