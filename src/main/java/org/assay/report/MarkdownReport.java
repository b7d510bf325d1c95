package org.assay.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.audit.AuditResult;
import org.assay.audit.Finding;
import org.assay.audit.InputFile;
import org.assay.audit.UnauditedClaim;
import org.assay.audit.Verdict;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;

/** report.md: the audit for people, rendered through audit-templates/report.md. */
public final class MarkdownReport {
    private MarkdownReport() {}

    public static String render(AuditResult r, String toolVersion) {
        Map<String, String> v = new LinkedHashMap<>();
        String title = r.claims().title() != null ? r.claims().title() : r.claims().file().getFileName().toString();
        v.put("title", cell(title));
        v.put("confidence", Display.percent(r.settings().confidence()));
        v.put("settings", settings(r, toolVersion));
        v.put("summary", summary(r));
        v.put("tables", tables(r));
        v.put("unaudited", unaudited(r));
        v.put("warnings", warnings(r));
        v.put("checks", CheckReport.section(r.checks()));
        return Templates.fill(Templates.load("report.md"), v);
    }

    private static String settings(AuditResult r, String version) {
        StringBuilder sb = new StringBuilder();
        var s = r.settings();
        sb.append("Confidence ").append(Display.percent(s.confidence()))
                .append(" · equivalence margin ").append(String.format(java.util.Locale.ROOT, "%.2f", r.margin() * 100))
                .append(" points (fraction ").append(r.margin()).append(")")
                .append(" · interval method ").append(s.interval().id())
                .append(" · bootstrap ").append(s.resamples()).append(" resamples, seed ").append(s.seed())
                .append(" · multiplicity: Holm across ").append(r.findings().stream()
                        .filter(f -> f.verdict() != Verdict.NOT_COMPUTABLE).count()).append(" claims")
                .append(" · assay ").append(version).append("\n\n");
        sb.append("| Input | File | Bytes | SHA-256 |\n|---|---|---:|---|\n");
        for (InputFile f : r.inputs()) {
            sb.append("| ").append(cell(f.role())).append(" | `").append(cell(f.path().toString())).append("` | ")
                    .append(f.bytes()).append(" | `").append(f.sha256()).append("` |\n");
        }
        return sb.toString();
    }

    private static String summary(AuditResult r) {
        StringBuilder sb = new StringBuilder("| Verdict | Claims |\n|---|---:|\n");
        for (Verdict v : Verdict.values()) {
            long n = r.count(v);
            if (n > 0 || v != Verdict.NOT_COMPUTABLE) sb.append("| ").append(v.word()).append(" | ").append(n).append(" |\n");
        }
        if (!r.unaudited().isEmpty()) sb.append("| not audited | ").append(r.unaudited().size()).append(" |\n");
        return sb.toString();
    }

    private static String tables(AuditResult r) {
        StringBuilder sb = new StringBuilder();
        String conf = Display.percent(r.settings().confidence());
        for (ClaimTable t : r.claims().tables()) {
            List<Finding> fs = r.findings().stream().filter(f -> f.claim().tableId().equals(t.id())).toList();
            if (fs.isEmpty()) continue;
            sb.append("## Table ").append(cell(t.id()));
            if (t.caption() != null) sb.append(": ").append(cell(t.caption()));
            sb.append("\n\n");
            Finding first = fs.stream().filter(f -> f.verdict() != Verdict.NOT_COMPUTABLE).findFirst().orElse(null);
            sb.append("Test set: ").append(t.testSize() == null ? "size unknown" : t.testSize() + " items");
            if (first != null) sb.append(" · reproduction: ").append(first.n()).append(" items");
            if (t.runs() > 1) sb.append(" · printed values average ").append(t.runs()).append(" runs");
            sb.append("\n\n");
            sb.append("| Claim | Metric | Printed | Rounding interval | Reproduced | ").append(conf)
                    .append(" interval | Range if claim true | p | Holm p | Verdict |\n");
            sb.append("|---|---|---:|---|---:|---|---|---:|---:|---|\n");
            List<String> notes = new ArrayList<>();
            // notes every computed finding of the table shares are method notes, listed once;
            // the others belong to their claim and are shown with it
            List<Finding> computed = fs.stream().filter(f -> f.verdict() != Verdict.NOT_COMPUTABLE).toList();
            List<String> shared = computed.isEmpty() ? List.of() : computed.get(0).notes().stream()
                    .filter(n -> computed.stream().allMatch(f -> f.notes().contains(n))).toList();
            for (Finding f : fs) {
                Claim c = f.claim();
                sb.append("| ").append(cell(c.label())).append(" | ").append(metricLabel(c)).append(" | ")
                        .append(c.value().text()).append(c.scale() == org.assay.claims.Scale.PERCENT ? "%" : "")
                        .append(" | ").append(Display.range(c, f.claimLower(), f.claimUpper())).append(" | ");
                if (f.verdict() == Verdict.NOT_COMPUTABLE) {
                    sb.append("n/a | n/a | n/a | n/a | n/a | **not computable** |\n");
                    notes.add("- **" + cell(c.label()) + "** could not be computed: " + cell(f.reason()));
                    continue;
                }
                sb.append(Display.value(c, f.estimate())).append(" | ")
                        .append(Display.range(c, f.interval().lower(), f.interval().upper()))
                        .append(" (").append(f.interval().method()).append(") | ")
                        .append(Display.range(c, f.rangeIfTrue()[0], f.rangeIfTrue()[1])).append(" | ")
                        .append(Display.p(f.pValue())).append(" | ").append(Display.p(f.adjustedP())).append(" | **")
                        .append(f.verdict().word()).append("** |\n");
                StringBuilder own = new StringBuilder(note(f));
                f.notes().stream().filter(n -> !shared.contains(n)).forEach(n -> own.append(" Note: ").append(cell(n)).append('.'));
                notes.add(own.toString());
            }
            sb.append("\n### Reproduction notes\n\n");
            notes.forEach(n -> sb.append(n).append("\n"));
            List<String> methodNotes = shared;
            if (!methodNotes.isEmpty()) {
                sb.append("\nMethod notes:\n\n");
                methodNotes.forEach(n -> sb.append("- ").append(cell(n)).append("\n"));
            }
            sb.append("\n");
        }
        return sb.toString();
    }

    private static String note(Finding f) {
        Claim c = f.claim();
        StringBuilder sb = new StringBuilder("- **").append(cell(c.label())).append("** (").append(metricLabel(c))
                .append(", printed ").append(c.value().text()).append("): reproduced ")
                .append(Display.value(c, f.estimate()));
        switch (f.direction()) {
            case "within" -> sb.append(", inside the claim's rounding interval");
            default -> sb.append(", ").append(Display.difference(c, f.difference())).append(' ').append(f.direction())
                    .append(" the claim's rounding interval");
        }
        sb.append(". ");
        switch (f.verdict()) {
            case DISCREPANT -> sb.append("The claim lies outside what this reproduction allows (Holm-adjusted p = ")
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

    private static String metricLabel(Claim c) {
        StringBuilder sb = new StringBuilder("`").append(c.metric());
        c.params().entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> sb.append(' ').append(e.getKey()).append('=').append(e.getValue()));
        return cell(sb.append('`').toString());
    }

    private static String unaudited(AuditResult r) {
        if (r.unaudited().isEmpty()) return "";
        StringBuilder sb = new StringBuilder("## Claims not audited\n\n| Table | Claim | Metric | Printed | Why |\n|---|---|---|---:|---|\n");
        for (UnauditedClaim u : r.unaudited()) {
            Claim c = u.claim();
            sb.append("| ").append(cell(c.tableId())).append(" | ").append(cell(c.label())).append(" | ")
                    .append(metricLabel(c)).append(" | ").append(c.value().text()).append(" | ").append(cell(u.reason()))
                    .append(" |\n");
        }
        return sb.append('\n').toString();
    }

    private static String warnings(AuditResult r) {
        if (r.warnings().isEmpty()) return "";
        StringBuilder sb = new StringBuilder("## Warnings\n\n");
        r.warnings().forEach(w -> sb.append("- ").append(cell(w)).append('\n'));
        return sb.append('\n').toString();
    }

    /** Escapes text for a Markdown table cell. */
    static String cell(String s) {
        if (s == null) return "";
        return s.replace("\\", "\\\\").replace("|", "\\|").replace("\n", " ").replace("\r", " ");
    }
}
