package org.assay.audit.checks;

import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;

/** Findings for checks that need information the claims file does not give (deliverable: no error). */
final class NotChecked {
    private NotChecked() {}

    static CheckFinding missingTestSize(String rule, ClaimTable table, Claim c) {
        return CheckFinding.of(rule, CheckKind.NOT_CHECKED, table.id(), List.of(c),
                "not checked: test_size unknown for " + Claims.quote(c) + ".",
                "add test_size: N to table " + table.id() + " (or to the claim) in the claims file", Map.of());
    }

    static CheckFinding missingClassCounts(String rule, ClaimTable table, Claim c, String needed) {
        return CheckFinding.of(rule, CheckKind.NOT_CHECKED, table.id(), List.of(c),
                "not checked: " + needed.replaceFirst("^the ", "") + " unknown for " + Claims.quote(c) + ".",
                "add class_counts: {label: count, ...} to table " + table.id() + " in the claims file", Map.of());
    }
}
