package org.assay.audit.checks;

import java.util.ArrayList;
import java.util.List;
import org.assay.claims.ClaimTable;
import org.assay.claims.ClaimsFile;

/**
 * Runs every claim-only rule over every table of a claims file: the checks a reviewer can make
 * with the paper alone (no predictions).
 */
public final class ClaimChecker {
    private final List<CheckRule> rules = List.of(
            new GranularityRule(),
            new RatioFeasibilityRule(),
            new ConsistencyRules.Range(),
            new ConsistencyRules.F1(),
            new ConsistencyRules.Monotone(),
            new ConsistencyRules.SummaryColumn(),
            new ConsistencyRules.ScaleMixUp(),
            new PrecisionRules.PlusMinus(),
            new PrecisionRules.Digits(),
            new GapRule(),
            new ConfigurationRule(),
            new KnownMetricRule());

    public CheckResult check(ClaimsFile claims) {
        Tally tally = new Tally();
        List<CheckFinding> findings = new ArrayList<>();
        for (ClaimTable t : claims.tables()) {
            for (CheckRule r : rules) findings.addAll(r.check(t, tally));
        }
        return new CheckResult(claims, findings, tally.counts());
    }
}
