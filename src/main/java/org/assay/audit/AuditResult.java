package org.assay.audit;

import java.util.List;
import org.assay.claims.ClaimsFile;

/**
 * The outcome of an audit: a finding per tested claim, the claims not tested, the inputs with
 * their hashes, the settings, and warnings raised while reading; the user's notes, and per table
 * how its subsample was drawn (what the manifest says), for the replication notes; the paired
 * comparisons of reproduced rows, and how p-values were adjusted and compared rows tested.
 */
public record AuditResult(
        ClaimsFile claims,
        List<Finding> findings,
        List<UnauditedClaim> unaudited,
        List<InputFile> inputs,
        EstimationSettings settings,
        double margin,
        List<String> warnings,
        org.assay.audit.checks.CheckResult checks,
        UserNotes notes,
        java.util.Map<String, List<String>> sampling,
        List<Comparison> comparisons,
        org.assay.stats.MultiplicityMethod multiplicity,
        PairedMethod pairedMethod) {

    public long count(Verdict v) { return findings.stream().filter(f -> f.verdict() == v).count(); }
}
