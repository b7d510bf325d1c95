package org.assay.audit.checks;

import java.util.List;
import java.util.Map;
import org.assay.claims.ClaimsFile;

/**
 * The claim-only checks of one claims file: findings in table and rule order, and how many
 * checks each rule ran (a rule that ran and found nothing is evidence too).
 */
public record CheckResult(ClaimsFile claims, List<CheckFinding> findings, Map<String, Integer> checksRun) {
    public CheckResult {
        findings = List.copyOf(findings);
        checksRun = Map.copyOf(checksRun);
    }

    public long count(CheckKind kind) { return findings.stream().filter(f -> f.kind() == kind).count(); }

    public List<CheckFinding> problems() { return findings.stream().filter(f -> f.kind().isProblem()).toList(); }
}
