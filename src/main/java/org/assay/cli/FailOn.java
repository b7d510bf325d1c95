package org.assay.cli;

import org.assay.audit.AuditResult;
import org.assay.audit.Verdict;
import org.assay.common.UserInputException;

/** The --fail-on conditions: which findings make the audit exit with code 1. */
enum FailOn {
    NEVER, DISCREPANT, INCONCLUSIVE, NOT_COMPUTABLE;

    static FailOn parse(String text) {
        return switch (text.trim().toLowerCase(java.util.Locale.ROOT)) {
            case "never" -> NEVER;
            case "discrepant" -> DISCREPANT;
            case "inconclusive" -> INCONCLUSIVE;
            case "not-computable" -> NOT_COMPUTABLE;
            default -> throw UserInputException.usage("unknown --fail-on value '" + text + "'",
                    "use discrepant, inconclusive, not-computable or never");
        };
    }

    boolean met(AuditResult r) {
        return switch (this) {
            case NEVER -> false;
            case DISCREPANT -> r.count(Verdict.DISCREPANT) > 0;
            case INCONCLUSIVE -> r.count(Verdict.DISCREPANT) + r.count(Verdict.INCONCLUSIVE) > 0;
            case NOT_COMPUTABLE -> r.count(Verdict.NOT_COMPUTABLE) > 0;
        };
    }
}
