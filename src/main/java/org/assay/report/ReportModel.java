package org.assay.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.audit.AuditResult;
import org.assay.audit.Comparison;
import org.assay.audit.ComparisonVerdict;
import org.assay.audit.Finding;
import org.assay.audit.InputFile;
import org.assay.audit.UnauditedClaim;
import org.assay.audit.Verdict;
import org.assay.audit.checks.CheckFinding;
import org.assay.audit.checks.CheckKind;
import org.assay.audit.checks.CheckResult;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.claims.Scale;
import org.assay.stats.MultiplicityMethod;

/**
 * The data the report templates see: plain maps, lists, strings and booleans, every number already
 * formatted for people (on the claim's printed scale). Nothing here computes a statistic; it only
 * arranges what the audit found. Keys are documented in DEVELOPERS.md ("Report templates").
 */
public final class ReportModel {
    private ReportModel() {}

    /** The model of an audit report. */
    public static Map<String, Object> audit(AuditResult r, Provenance p) {
        Map<String, Object> m = new LinkedHashMap<>();
        String title = r.claims().title() != null ? r.claims().title() : String.valueOf(r.claims().file().getFileName());
        m.put("title", title);
        m.put("document", r.claims().document());
        String conf = Display.percent(r.settings().confidence());
        m.put("confidence", conf);
        m.put("equivalence_confidence", Display.percent(1 - 2 * r.settings().alpha()));
        m.put("margin_points", String.format(java.util.Locale.ROOT, "%.2f", r.margin() * 100));
        m.put("margin_fraction", String.valueOf(r.margin()));
        m.put("interval_method", r.settings().interval().id());
        m.put("resamples", String.valueOf(r.settings().resamples()));
        m.put("seed", String.valueOf(r.settings().seed()));
        long tested = r.findings().stream().filter(f -> f.verdict() != Verdict.NOT_COMPUTABLE).count();
        MultiplicityMethod method = r.multiplicity();
        long compared = r.comparisons().stream().filter(c -> c.verdict() != ComparisonVerdict.NOT_COMPUTABLE).count();
        m.put("multiplicity", method.title() + " across " + tested + " claim" + (tested == 1 ? "" : "s")
                + (compared == 0 ? "" : "; " + method.title() + " across " + compared + " compared pair"
                        + (compared == 1 ? "" : "s") + " of rows, separately"));
        m.put("multiplicity_method", method.title());
        m.put("adjusted_p_label", adjustedLabel(method) + " p");
        m.put("paired_test", r.pairedMethod().id());
        m.put("has_comparisons", !r.comparisons().isEmpty());

        List<Map<String, Object>> counts = new ArrayList<>();
        for (Verdict v : Verdict.values()) {
            long n = r.count(v);
            if (n > 0 || v != Verdict.NOT_COMPUTABLE) counts.add(Map.of("verdict", v.word(), "count", String.valueOf(n)));
        }
        if (!r.unaudited().isEmpty()) counts.add(Map.of("verdict", "not audited", "count", String.valueOf(r.unaudited().size())));
        m.put("counts", counts);

        List<Map<String, Object>> tables = new ArrayList<>();
        for (ClaimTable t : r.claims().tables()) {
            List<Finding> fs = r.findings().stream().filter(f -> f.claim().tableId().equals(t.id())).toList();
            if (!fs.isEmpty()) tables.add(table(r, t, fs));
        }
        m.put("tables", tables);
        m.put("has_tables", !tables.isEmpty());

        List<Map<String, Object>> unaudited = new ArrayList<>();
        for (UnauditedClaim u : r.unaudited()) {
            Map<String, Object> c = claim(u.claim());
            c.put("reason", u.reason());
            unaudited.add(c);
        }
        m.put("unaudited", unaudited);
        m.put("has_unaudited", !unaudited.isEmpty());
        m.put("warnings", r.warnings());
        m.put("has_warnings", !r.warnings().isEmpty());
        m.put("checks", checks(r.checks()));
        List<Map<String, Object>> deviations = new ArrayList<>();
        for (Finding f : r.findings()) {
            if (f.verdict() != Verdict.DISCREPANT) continue;
            Claim c = f.claim();
            String text = "Table " + c.tableId() + ", " + c.label() + " (" + metricLabel(c) + "): the paper prints "
                    + c.value().text() + (c.scale() == Scale.PERCENT ? "%" : "") + "; a reproduction on " + f.n() + " of "
                    + (f.population() == null ? "an unknown number of" : String.valueOf(f.population()))
                    + " test items gives " + Display.value(c, f.estimate()) + " (" + Display.percent(f.interval().confidence())
                    + " interval " + Display.range(c, f.interval().lower(), f.interval().upper()) + ", "
                    + f.interval().method() + "), " + Display.difference(c, f.difference()) + " " + f.direction()
                    + " the printed value's rounding interval (" + adjustedLabel(method) + "-adjusted p = "
                    + Display.p(f.adjustedP()) + ").";
            deviations.add(Map.of("text", text, "number", String.valueOf(deviations.size() + 1)));
        }
        m.put("deviations", deviations);
        m.put("has_deviations", !deviations.isEmpty());
        m.put("provenance", provenance(p, r.inputs(), r.settings().confidence(), r.margin(), r.settings().resamples(),
                r.settings().seed(), r.settings().interval().id()));
        return m;
    }

    /** The model of a claim-only check report. */
    public static Map<String, Object> check(CheckResult r, Provenance p, List<InputFile> inputs) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("title", r.claims().title() != null ? r.claims().title() : String.valueOf(r.claims().file().getFileName()));
        m.put("claims_file", String.valueOf(r.claims().file()));
        m.put("checks", checks(r));
        m.put("provenance", provenance(p, inputs, null, null, null, null, null));
        return m;
    }

    private static Map<String, Object> table(AuditResult r, ClaimTable t, List<Finding> fs) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", t.id());
        m.put("caption", t.caption() == null ? "" : t.caption());
        m.put("has_caption", t.caption() != null);
        m.put("test_size", t.testSize() == null ? "size unknown" : t.testSize() + " items");
        Finding first = fs.stream().filter(f -> f.verdict() != Verdict.NOT_COMPUTABLE).findFirst().orElse(null);
        m.put("reproduced_n", first == null ? "" : String.valueOf(first.n()));
        m.put("has_reproduced_n", first != null);
        m.put("runs", String.valueOf(t.runs()));
        m.put("several_runs", t.runs() > 1);
        String note = r.notes().forTable(t.id());
        m.put("user_note", note == null ? "" : note);
        m.put("has_user_note", note != null);
        List<String> sampling = r.sampling().getOrDefault(t.id(), List.of());
        m.put("sampling", sampling);
        m.put("has_sampling", !sampling.isEmpty());

        // notes every computed finding of the table shares are method notes, listed once;
        // the others belong to their claim and are shown with it
        List<Finding> computed = fs.stream().filter(f -> f.verdict() != Verdict.NOT_COMPUTABLE).toList();
        List<String> shared = computed.isEmpty() ? List.of() : computed.get(0).notes().stream()
                .filter(n -> computed.stream().allMatch(f -> f.notes().contains(n))).toList();
        m.put("method_notes", shared);
        m.put("has_method_notes", !shared.isEmpty());
        List<Map<String, Object>> claims = new ArrayList<>();
        for (Finding f : fs) claims.add(finding(r, f, shared));
        m.put("claims", claims);
        List<Map<String, Object>> comparisons = new ArrayList<>();
        for (Comparison c : r.comparisons()) if (c.tableId().equals(t.id())) comparisons.add(comparison(c, r.multiplicity()));
        m.put("comparisons", comparisons);
        m.put("has_comparisons", !comparisons.isEmpty());
        return m;
    }

    /** "Holm" or "BH", as in "Holm p" and "BH-adjusted p". */
    static String adjustedLabel(MultiplicityMethod method) {
        return method == MultiplicityMethod.HOLM ? "Holm" : "BH";
    }

    /** One compared pair of rows on one column, every number on the first claim's printed scale. */
    private static Map<String, Object> comparison(Comparison c, MultiplicityMethod method) {
        Claim a = c.claimA();
        Claim b = c.claimB();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("rows", a.row() + " − " + b.row());
        m.put("row_a", a.row());
        m.put("row_b", b.row());
        m.put("column", String.join(" / ", a.column()));
        m.put("metric", metricLabel(a));
        m.put("printed_a", a.value().text() + (a.scale() == Scale.PERCENT ? "%" : ""));
        m.put("printed_b", b.value().text() + (b.scale() == Scale.PERCENT ? "%" : ""));
        m.put("claimed_gap", signed(a, c.printedGap()));
        m.put("claimed_gap_interval", "[" + signed(a, c.claimedLower()) + ", " + signed(a, c.claimedUpper()) + "]");
        ComparisonVerdict v = c.verdict();
        m.put("verdict", v.word());
        m.put("computed", v != ComparisonVerdict.NOT_COMPUTABLE);
        if (v == ComparisonVerdict.NOT_COMPUTABLE) {
            m.put("reason", c.reason());
            m.put("summary", "could not be computed: " + c.reason());
            m.put("notes", List.of());
            return m;
        }
        m.put("reason", "");
        m.put("gap", signed(a, c.gap()));
        m.put("gap_interval", "[" + signed(a, c.interval().lower()) + ", " + signed(a, c.interval().upper()) + "]");
        m.put("interval_method", c.interval().method());
        m.put("test", c.test());
        m.put("p", Display.p(c.pValue()));
        m.put("adjusted_p", Display.p(c.adjustedP()));
        m.put("n", String.valueOf(c.n()));
        m.put("summary", comparisonSummary(c, method));
        m.put("notes", c.notes());
        return m;
    }

    /** What a comparison found, in sentences (no markup). */
    static String comparisonSummary(Comparison c, MultiplicityMethod method) {
        Claim a = c.claimA();
        StringBuilder sb = new StringBuilder("The table prints ").append(a.value().text()).append(" against ")
                .append(c.claimB().value().text()).append(", a gap of ").append(signed(a, c.printedGap()))
                .append(" (rounding interval [").append(signed(a, c.claimedLower())).append(", ")
                .append(signed(a, c.claimedUpper())).append("]); on the same ").append(c.n())
                .append(" items the reproduced gap is ").append(signed(a, c.gap())).append(" (")
                .append(Display.percent(c.interval().confidence())).append(" interval [").append(signed(a, c.interval().lower()))
                .append(", ").append(signed(a, c.interval().upper())).append("], ").append(c.interval().method()).append("), ")
                .append(c.claimedGapInInterval() ? "which the claimed gap meets" : "which the claimed gap lies outside of")
                .append(". Test: ").append(c.test()).append(", p = ").append(Display.p(c.pValue())).append("; ")
                .append(adjustedLabel(method)).append("-adjusted p = ").append(Display.p(c.adjustedP())).append(": ");
        sb.append(switch (c.verdict()) {
            case ORDERING_REPLICATED -> "the printed ordering is replicated.";
            case ORDERING_REVERSED -> "the reproduction shows the opposite ordering.";
            case ORDERING_NOT_SHOWN -> "these items do not show which row is ahead.";
            case NO_ORDERING_CLAIMED -> "the printed values are equal, so no ordering is claimed.";
            case NOT_COMPUTABLE -> "";
        });
        return sb.toString();
    }

    /** A gap on the claim's printed scale with its sign: "+5.80 points", "-0.250". */
    static String signed(Claim c, double fraction) {
        String v = Display.value(c, fraction);
        if (!v.startsWith("-")) v = "+" + v;
        return c.scale() == Scale.PERCENT ? v + " points" : v;
    }

    private static Map<String, Object> claim(Claim c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("table", c.tableId());
        m.put("label", c.label());
        m.put("row", c.row());
        m.put("column", String.join(" / ", c.column()));
        m.put("metric", metricLabel(c));
        m.put("printed", c.value().text() + (c.scale() == Scale.PERCENT ? "%" : ""));
        m.put("printed_plain", c.value().text());
        m.put("scale", c.scale().id());
        return m;
    }

    private static Map<String, Object> finding(AuditResult r, Finding f, List<String> shared) {
        Claim c = f.claim();
        Map<String, Object> m = claim(c);
        Verdict v = f.verdict();
        m.put("verdict", v.word());
        m.put("verdict_symbol", symbol(v));
        m.put("is_consistent", v == Verdict.CONSISTENT);
        m.put("is_inconclusive", v == Verdict.INCONCLUSIVE);
        m.put("is_discrepant", v == Verdict.DISCREPANT);
        m.put("is_not_computable", v == Verdict.NOT_COMPUTABLE);
        m.put("computed", v != Verdict.NOT_COMPUTABLE);
        m.put("claim_interval", Display.range(c, f.claimLower(), f.claimUpper()));
        String userNote = r.notes().forClaim(c);
        m.put("user_note", userNote == null ? "" : userNote);
        m.put("has_user_note", userNote != null);
        if (v == Verdict.NOT_COMPUTABLE) {
            m.put("reason", f.reason());
            m.put("summary", "could not be computed: " + f.reason());
            m.put("own_notes", List.of());
            return m;
        }
        m.put("reason", "");
        m.put("estimate", Display.value(c, f.estimate()));
        m.put("interval", Display.range(c, f.interval().lower(), f.interval().upper()));
        m.put("interval_lower", Display.value(c, f.interval().lower()));
        m.put("interval_upper", Display.value(c, f.interval().upper()));
        m.put("interval_method", f.interval().method());
        m.put("range_if_true", Display.range(c, f.rangeIfTrue()[0], f.rangeIfTrue()[1]));
        m.put("p", Display.p(f.pValue()));
        m.put("holm_p", Display.p(f.adjustedP()));   // the adjusted p-value, whatever the method (the key predates bh)
        m.put("n", String.valueOf(f.n()));
        m.put("test_size", f.population() == null ? "?" : String.valueOf(f.population()));
        m.put("n_of_test_size", f.n() + " of " + (f.population() == null ? "?" : f.population()));
        m.put("difference", f.direction().equals("within") ? "inside the rounding interval"
                : Display.difference(c, f.difference()) + " " + f.direction());
        m.put("direction", f.direction());
        m.put("summary", summary(f, r.multiplicity()));
        m.put("own_notes", f.notes().stream().filter(n -> !shared.contains(n)).toList());
        return m;
    }

    /** A verdict as one plain character, for tables where a word does not fit (the legend says which). */
    static String symbol(Verdict v) {
        return switch (v) {
            case CONSISTENT -> "=";
            case INCONCLUSIVE -> "?";
            case DISCREPANT -> "≠";
            case NOT_COMPUTABLE -> "–";
        };
    }

    /** What the audit found for one claim, in sentences (no markup). */
    static String summary(Finding f, MultiplicityMethod method) {
        Claim c = f.claim();
        StringBuilder sb = new StringBuilder("reproduced ").append(Display.value(c, f.estimate()));
        if (f.direction().equals("within")) {
            sb.append(", inside the claim's rounding interval");
        } else {
            sb.append(", ").append(Display.difference(c, f.difference())).append(' ').append(f.direction())
                    .append(" the claim's rounding interval");
        }
        sb.append(". ");
        switch (f.verdict()) {
            case DISCREPANT -> sb.append("The claim lies outside what this reproduction allows (")
                    .append(adjustedLabel(method)).append("-adjusted p = ")
                    .append(Display.p(f.adjustedP())).append("): the reproduced value is ").append(f.direction())
                    .append(" the claim.");
            case CONSISTENT -> sb.append("Agreement within ").append(Display.difference(c, f.margin()))
                    .append(" is shown by two one-sided tests (")
                    .append(Display.percent(f.equivalence().confidence())).append(" interval ")
                    .append(Display.range(c, f.equivalence().lower(), f.equivalence().upper())).append(").");
            case INCONCLUSIVE -> {
                sb.append("Not contradicted, but the ").append(Display.percent(f.equivalence().confidence()))
                        .append(" interval ").append(Display.range(c, f.equivalence().lower(), f.equivalence().upper()))
                        .append(" is too wide to show agreement within ").append(Display.difference(c, f.margin())).append('.');
                if (f.itemsToSettle() != null) {
                    sb.append(" About ").append(f.itemsToSettle()).append(" items would settle it if the reproduced value held"
                            + " (normal approximation).");
                } else if (Math.abs(f.difference()) >= f.margin()) {
                    sb.append(" The reproduced value lies outside the margin, so no larger subsample would show agreement;"
                            + " more items would show whether the difference is real.");
                }
            }
            default -> { }
        }
        return sb.toString();
    }

    static String metricLabel(Claim c) {
        StringBuilder sb = new StringBuilder(c.metric());
        c.params().entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> sb.append(' ').append(e.getKey()).append('=').append(e.getValue()));
        return sb.toString();
    }

    private static Map<String, Object> checks(CheckResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        List<Map<String, Object>> counts = new ArrayList<>();
        for (CheckKind k : CheckKind.values()) counts.add(Map.of("kind", k.word(), "count", String.valueOf(r.count(k))));
        m.put("counts", counts);
        List<String> run = new ArrayList<>();
        r.checksRun().entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> run.add(e.getKey() + " " + e.getValue()));
        m.put("checks_run", run.isEmpty() ? "none" : String.join(", ", run));
        List<Map<String, Object>> tables = new ArrayList<>();
        for (ClaimTable t : r.claims().tables()) {
            List<CheckFinding> fs = r.findings().stream().filter(f -> f.tableId().equals(t.id())).toList();
            Map<String, Object> tm = new LinkedHashMap<>();
            tm.put("id", t.id());
            tm.put("caption", t.caption() == null ? "" : t.caption());
            tm.put("has_caption", t.caption() != null);
            List<Map<String, Object>> items = new ArrayList<>();
            for (CheckKind k : CheckKind.values()) {
                for (CheckFinding f : fs) {
                    if (f.kind() != k) continue;
                    Map<String, Object> fm = new LinkedHashMap<>();
                    fm.put("id", f.id());
                    fm.put("rule", f.rule());
                    fm.put("kind", k.word());
                    fm.put("is_problem", k.isProblem());
                    fm.put("message", f.message());
                    boolean notChecked = k == CheckKind.NOT_CHECKED;
                    fm.put("has_suggestion", f.suggestion() != null && !notChecked);
                    fm.put("suggestion", f.suggestion() == null ? "" : f.suggestion());
                    fm.put("has_to_check", f.suggestion() != null && notChecked);
                    items.add(fm);
                }
            }
            tm.put("findings", items);
            tm.put("has_findings", !items.isEmpty());
            tables.add(tm);
        }
        m.put("tables", tables);
        m.put("comments", reviewerComments(r));
        m.put("has_comments", !((List<?>) m.get("comments")).isEmpty());
        return m;
    }

    /** Short, specific, polite comments a reviewer can paste: problems first, then missing facts. */
    private static List<Map<String, Object>> reviewerComments(CheckResult r) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (CheckFinding f : r.problems()) {
            String text = f.message() + (f.suggestion() == null ? "" : " Could the authors " + lowerFirst(f.suggestion()) + "?");
            out.add(Map.of("number", String.valueOf(out.size() + 1), "text", text, "id", f.id()));
        }
        for (ClaimTable t : r.claims().tables()) {
            boolean sizeMissing = r.findings().stream().anyMatch(f -> f.tableId().equals(t.id())
                    && f.kind() == CheckKind.NOT_CHECKED && f.message().contains("test_size unknown"));
            if (sizeMissing) {
                out.add(Map.of("number", String.valueOf(out.size() + 1), "id", "",
                        "text", "Table " + t.id() + " does not state how many test items its values were computed on. "
                                + "Could the authors add the test-set size, so that readers can judge the precision of "
                                + "the values and the size of the differences?"));
            }
        }
        return out;
    }

    private static String lowerFirst(String s) {
        return s.isEmpty() ? s : Character.toLowerCase(s.charAt(0)) + s.substring(1);
    }

    private static Map<String, Object> provenance(Provenance p, List<InputFile> inputs, Double confidence, Double margin,
                                                  Integer resamples, Long seed, String interval) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("version", p.version());
        m.put("commit", p.commit());
        m.put("java", p.java());
        m.put("os", p.os());
        m.put("command", p.command());
        m.put("working_directory", p.workingDirectory());
        m.put("has_settings", confidence != null);
        if (confidence != null) {
            m.put("confidence", Display.percent(confidence));
            m.put("margin", String.format(java.util.Locale.ROOT, "%.2f points", margin * 100));
            m.put("resamples", String.valueOf(resamples));
            m.put("seed", String.valueOf(seed));
            m.put("interval", interval);
        }
        List<Map<String, Object>> files = new ArrayList<>();
        for (InputFile f : inputs) {
            files.add(Map.of("role", f.role(), "path", f.path().toString(), "bytes", String.valueOf(f.bytes()),
                    "sha256", f.sha256(), "rows", rowsText(f.rows())));
        }
        m.put("inputs", files);
        return m;
    }

    /** "4000 read, 400 used, 3600 set aside: ids the predictions do not list (not evaluated)"; "" when not counted. */
    static String rowsText(org.assay.audit.RowCount rows) {
        if (rows == null) return "";
        String text = rows.read() + " read, " + rows.used() + " used";
        return rows.setAside() == 0 ? text : text + ", " + rows.setAside() + " set aside: " + rows.setAsideReason();
    }
}
