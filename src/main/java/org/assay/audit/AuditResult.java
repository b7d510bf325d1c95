package org.assay.audit;

import java.util.List;
import org.assay.claims.ClaimsFile;

/**
 * The outcome of an audit: a finding per tested claim, the claims not tested, the inputs with
 * their hashes, the settings, and warnings raised while reading.
 */
public record AuditResult(
        ClaimsFile claims,
        List<Finding> findings,
        List<UnauditedClaim> unaudited,
        List<InputFile> inputs,
        EstimationSettings settings,
        double margin,
        List<String> warnings,
        org.assay.audit.checks.CheckResult checks) {

    public long count(Verdict v) { return findings.stream().filter(f -> f.verdict() == v).count(); }
}
