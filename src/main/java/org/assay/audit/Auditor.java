package org.assay.audit;

import org.assay.common.Progress;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.claims.ClaimsFile;
import org.assay.claims.ClaimsReader;
import org.assay.common.UserInputException;
import org.assay.data.EvaluationData;
import org.assay.metrics.MetricRegistry;
import org.assay.metrics.PreparedMetric;
import org.assay.stats.MultiplicityMethod;

/**
 * Runs an audit: reads the claims and each reproduction's predictions, computes the evidence
 * for every claim of the reproduced rows, adjusts the p-values across the whole audit (Holm by
 * default, Benjamini&ndash;Hochberg on request) and assigns the verdicts; then compares the pairs
 * of reproduced rows the tables name under {@code compare:} ({@link PairedComparisons}).
 */
public final class Auditor {
    private final Progress progress;

    public Auditor() { this(Progress.NONE); }

    /** @param progress where reading and resampling report how far they have got */
    public Auditor(Progress progress) { this.progress = progress; }

    public AuditResult run(AuditRequest request) {
        ClaimsFile claims = ClaimsReader.read(request.claims());
        List<InputFile> inputs = new ArrayList<>();
        inputs.add(InputFile.of("claims", request.claims()));
        inputs.get(0).sha256();   // hashed as read (InputFile hashes lazily)
        List<String> warnings = new ArrayList<>();
        Estimator estimator = new Estimator(request.settings(), progress);
        ClaimAssessor assessor = new ClaimAssessor(request.settings());

        List<Finding> findings = new ArrayList<>();
        Set<Claim> audited = new LinkedHashSet<>();
        Map<String, List<String>> sampling = new java.util.LinkedHashMap<>();
        UserNotes notes = request.notes();
        Map<List<String>, Reproduction.Outputs> reproduced = new java.util.LinkedHashMap<>();
        for (Reproduction r : request.reproductions()) {
            ClaimTable table = selectTable(claims, r);
            if (r.tableId() == null) notes = notes.naming(table.id());
            String row = selectRow(claims, table, r);
            Reproduction.Outputs outputs = r.read(progress);
            reproduced.put(List.of(table.id(), row), outputs);
            outputs.inputs().forEach(InputFile::sha256);   // the report describes the files as they were read
            inputs.addAll(outputs.inputs());
            sampling.put(table.id(), sampling(outputs, warnings));
            for (String typo : notes.unmatched(table.id(), table.claims())) {
                warnings.add("the audit file has a note for column '" + typo + "' of table " + table.id()
                        + ", which no claim has; it is not shown");
            }
            for (Reproduction.Part part : outputs.parts()) {
                part.data().warnings().stream().filter(w -> !warnings.contains(w)).forEach(warnings::add);
                checkSizes(claims, table, part.data(), table.testSize() == null ? null : table.testSize().longValue());
            }

            Map<String, Evidence> cache = new HashMap<>();
            Map<String, String> settingsOf = new HashMap<>();
            Map<String, String> strata = stratumOfId(outputs, warnings);
            for (Claim c : table.claims()) {
                if (!row.equals(c.row())) continue;
                audited.add(c);
                double[] ci = c.value().roundingInterval(c.scale());
                if (!MetricRegistry.knows(c.metric())) {
                    throw new UserInputException(claims.file(), c.location().describe(),
                            "unknown metric '" + c.metric() + "'", "known metrics: "
                            + String.join(", ", MetricRegistry.all().stream().map(d -> d.id()).toList()));
                }
                Reproduction.Part part = outputs.partFor(c);
                if (part == null) {
                    findings.add(Finding.notComputable(c, ci[0], ci[1], "no outputs were given for column '"
                            + String.join(" / ", c.column()) + "'"));
                    continue;
                }
                EvaluationData data = part.data();
                Integer size = c.testSizeIn(table);
                Long population = size == null ? null : size.longValue();
                List<String> tableNotes = tableNotes(table, data, population, part.manifestGiven());
                if (data instanceof org.assay.data.retrieval.RetrievalDirection d) {
                    tableNotes.add("ranked " + d.describe());   // the tie policy and depth the value depends on
                }
                Evidence evidence;
                try {
                    String key = System.identityHashCode(part) + c.metric() + c.params() + population;
                    evidence = cache.get(key);
                    if (evidence == null) {
                        PreparedMetric m = MetricRegistry.get(c.metric()).prepare(data, c.params());
                        if (m.notComputable() != null) throw UserInputException.usage(m.notComputable(), null);
                        evidence = estimator.evidence(m, population, strata == null ? null : stratumOf(data, strata));
                        cache.put(key, evidence);
                        if (m.configuration() != null) settingsOf.put(key, m.configuration());
                    }
                    if (settingsOf.containsKey(key)) {
                        // a generation score means little without the settings it was computed with
                        tableNotes = new ArrayList<>(tableNotes);
                        tableNotes.add("computed with " + settingsOf.get(key));
                        List<String> missing = org.assay.audit.checks.ConfigurationRule.missingSettings(c);
                        if (!missing.isEmpty()) {
                            tableNotes.add("the claim does not state its " + String.join(", ", missing)
                                    + " setting" + (missing.size() > 1 ? "s" : "") + ", so the defaults were used; "
                                    + c.metric() + " moves with these settings by more than a printed decimal, so "
                                    + "agreement or a difference of about a point says little until they are known");
                        }
                    }
                } catch (UserInputException e) {
                    findings.add(Finding.notComputable(c, ci[0], ci[1], e.problem()));
                    continue;
                }
                double margin = c.margin() != null ? c.margin() : request.margin();
                findings.add(assessor.assess(c, evidence, data.size(), population, margin, tableNotes));
            }
        }
        List<Finding> adjusted = adjust(findings, assessor, request.multiplicity());
        List<UnauditedClaim> unaudited = new ArrayList<>();
        for (Claim c : claims.allClaims()) {
            if (!audited.contains(c)) {
                unaudited.add(new UnauditedClaim(c, "no predictions were given for row '" + c.row() + "' of table "
                        + c.tableId()));
            }
        }
        var checks = new org.assay.audit.checks.ClaimChecker().check(claims);
        List<Comparison> comparisons = new PairedComparisons(request.settings(), request.pairedMethod(),
                request.multiplicity()).run(claims, reproduced);
        return new AuditResult(claims, adjusted, unaudited, inputs, request.settings(), request.margin(), warnings, checks,
                notes, sampling, comparisons, request.multiplicity(), request.pairedMethod());
    }

    /**
     * How the reproduction's units were chosen, as far as its manifest says, for the report; a
     * manifest assay drew is redrawn to verify it, and a contiguous block of ids is warned about.
     */
    private static List<String> sampling(Reproduction.Outputs outputs, List<String> warnings) {
        List<String> out = new ArrayList<>();
        for (InputFile f : outputs.inputs()) {
            if (!f.role().startsWith("manifest")) continue;
            SubsampleManifests.Check check = SubsampleManifests.check(f.path());
            out.addAll(check.description());
            check.warnings().stream().filter(w -> !warnings.contains(w)).forEach(warnings::add);
        }
        return out;
    }

    /** Each id's stratum when the reproduction's manifest was drawn stratified by assay and can be read back, else null. */
    private static Map<String, String> stratumOfId(Reproduction.Outputs outputs, List<String> warnings) {
        for (InputFile f : outputs.inputs()) {
            if (!f.role().startsWith("manifest")) continue;
            try {
                Map<String, String> strata = SubsampleManifests.strata(f.path());
                if (strata != null) return strata;
            } catch (UserInputException e) {
                String w = f.path() + ": the strata of this stratified manifest cannot be read back (" + e.problem()
                        + "), so its bootstrap intervals treat the draw as simple random";
                if (!warnings.contains(w)) warnings.add(w);
            }
        }
        return null;
    }

    /** The stratum index of every unit of {@code data}, or null when some unit has no stratum (then simple resampling). */
    private static int[] stratumOf(EvaluationData data, Map<String, String> strata) {
        List<String> ids = ReproductionPairing.unitIds(data);
        Map<String, Integer> index = new java.util.LinkedHashMap<>();
        int[] out = new int[ids.size()];
        for (int i = 0; i < out.length; i++) {
            String s = strata.get(ids.get(i));
            if (s == null) return null;
            out[i] = index.computeIfAbsent(s, k -> index.size());
        }
        return out;
    }

    /** The multiplicity adjustment (Holm 1979 by default) over every computable claim of the audit. */
    private static List<Finding> adjust(List<Finding> findings, ClaimAssessor assessor, MultiplicityMethod method) {
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < findings.size(); i++) if (findings.get(i).verdict() != Verdict.NOT_COMPUTABLE) idx.add(i);
        double[] p = new double[idx.size()];
        for (int j = 0; j < p.length; j++) p[j] = findings.get(idx.get(j)).pValue();
        double[] adjustedP = method.adjust(p);
        List<Finding> out = new ArrayList<>(findings);
        for (int j = 0; j < p.length; j++) out.set(idx.get(j), assessor.withAdjustedP(findings.get(idx.get(j)), adjustedP[j]));
        return out;
    }

    private static ClaimTable selectTable(ClaimsFile claims, Reproduction r) {
        if (r.tableId() == null) {
            if (claims.tables().size() == 1) return claims.tables().get(0);
            throw UserInputException.usage("the claims file " + claims.file() + " has " + claims.tables().size()
                    + " tables", "name the reproduced one with --table (tables: "
                    + String.join(", ", claims.tables().stream().map(ClaimTable::id).toList()) + ")");
        }
        return claims.tables().stream().filter(t -> t.id().equals(r.tableId())).findFirst()
                .orElseThrow(() -> UserInputException.usage("table '" + r.tableId() + "' is not in " + claims.file(),
                        "tables: " + String.join(", ", claims.tables().stream().map(ClaimTable::id).toList())));
    }

    private static String selectRow(ClaimsFile claims, ClaimTable table, Reproduction r) {
        Set<String> rows = new LinkedHashSet<>();
        for (Claim c : table.claims()) rows.add(c.row());
        if (r.row() == null) {
            if (rows.size() == 1) return rows.iterator().next();
            throw UserInputException.usage("table " + table.id() + " has rows " + String.join(", ", rows),
                    "name the reproduced row with --row");
        }
        if (!rows.contains(r.row())) {
            throw UserInputException.usage("row '" + r.row() + "' is not in table " + table.id() + " of " + claims.file(),
                    "rows: " + String.join(", ", rows));
        }
        return r.row();
    }

    private static void checkSizes(ClaimsFile claims, ClaimTable table, EvaluationData data, Long population) {
        if (population != null && data.size() > population) {
            // The table keeps no line of its own; its first claim's line points the user at the table.
            String at = table.claims().isEmpty() ? null : table.claims().get(0).location().describe();
            throw new UserInputException(claims.file(), at, "table " + table.id() + " has test_size " + population
                    + " but the predictions " + data.source() + " hold " + data.size() + " examples",
                    "correct test_size, or check that the predictions belong to this table");
        }
    }

    private static List<String> tableNotes(ClaimTable table, EvaluationData data, Long population, boolean manifestGiven) {
        List<String> notes = new ArrayList<>();
        if (population == null) {
            notes.add("the test-set size is unknown, so intervals use infinite-population methods; "
                    + "set test_size to use the finite-population correction");
        } else if (data.size() < population && !manifestGiven) {
            notes.add("no subsample manifest was given: the statistics assume the " + data.size() + " examples are a simple "
                    + "random sample of the " + population + "-item test set");
        }
        if (table.runs() > 1) {
            notes.add("the claim averages " + table.runs() + " runs; run-to-run variation is not part of this interval");
        }
        return notes;
    }
}
