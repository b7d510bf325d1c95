package org.assay.report;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.assay.audit.AuditResult;
import org.assay.audit.InputFile;
import org.assay.audit.checks.CheckResult;
import org.assay.report.TemplateRenderer.Escaping;

/**
 * Every report file of an audit or a check, by format: file name to content. Markdown, HTML and
 * LaTeX come from templates ({@link TemplateSource}); JSON is written by code, as its schema is a
 * contract with other programs.
 */
public final class AuditReports {
    private AuditReports() {}

    /** The names of the files {@link #audit} writes for {@code formats}: checked before any work starts. */
    public static java.util.List<String> auditFileNames(Set<ReportFormat> formats) {
        java.util.List<String> names = new java.util.ArrayList<>();
        if (formats.contains(ReportFormat.MD)) {
            names.addAll(java.util.List.of("report.md", "replication-notes.md", "reviewer-comments.md", "claims-table.md"));
        }
        if (formats.contains(ReportFormat.HTML)) names.add("report.html");
        if (formats.contains(ReportFormat.TEX)) names.add("claims-table.tex");
        if (formats.contains(ReportFormat.JSON)) names.add("report.json");
        return names;
    }

    /** The names of the files {@link #check} writes for {@code formats}. */
    public static java.util.List<String> checkFileNames(Set<ReportFormat> formats) {
        java.util.List<String> names = new java.util.ArrayList<>();
        if (formats.contains(ReportFormat.MD)) names.addAll(java.util.List.of("check.md", "reviewer-comments.md"));
        if (formats.contains(ReportFormat.HTML)) names.add("check.html");
        if (formats.contains(ReportFormat.TEX)) names.add("check-findings.tex");
        if (formats.contains(ReportFormat.JSON)) names.add("check.json");
        return names;
    }

    /** The files of an audit report in the chosen formats. */
    public static Map<String, String> audit(AuditResult r, Provenance p, Set<ReportFormat> formats, TemplateSource templates) {
        TemplateRenderer renderer = new TemplateRenderer(templates);
        Map<String, Object> model = ReportModel.audit(r, p);
        Map<String, String> files = new LinkedHashMap<>();
        if (formats.contains(ReportFormat.MD)) {
            files.put("report.md", renderer.render("report.md.mustache", model, Escaping.MARKDOWN));
            files.put("replication-notes.md", renderer.render("replication-notes.md.mustache", model, Escaping.MARKDOWN));
            files.put("reviewer-comments.md", renderer.render("reviewer-comments.md.mustache", model, Escaping.MARKDOWN));
            files.put("claims-table.md", renderer.render("claims-table.md.mustache", model, Escaping.MARKDOWN));
        }
        if (formats.contains(ReportFormat.HTML)) {
            files.put("report.html", renderer.render("report.html.mustache", HtmlPlots.withPlots(model, r), Escaping.HTML));
        }
        if (formats.contains(ReportFormat.TEX)) {
            files.put("claims-table.tex", renderer.render("claims-table.tex.mustache", model, Escaping.LATEX));
        }
        if (formats.contains(ReportFormat.JSON)) files.put("report.json", JsonReport.render(r, p));
        return files;
    }

    /** The files of a claim-only check in the chosen formats. */
    public static Map<String, String> check(CheckResult r, Provenance p, java.util.List<InputFile> inputs,
                                            Set<ReportFormat> formats, TemplateSource templates) {
        TemplateRenderer renderer = new TemplateRenderer(templates);
        Map<String, Object> model = ReportModel.check(r, p, inputs);
        Map<String, String> files = new LinkedHashMap<>();
        if (formats.contains(ReportFormat.MD)) {
            files.put("check.md", renderer.render("check.md.mustache", model, Escaping.MARKDOWN));
            files.put("reviewer-comments.md", renderer.render("reviewer-comments.md.mustache", model, Escaping.MARKDOWN));
        }
        if (formats.contains(ReportFormat.HTML)) {
            files.put("check.html", renderer.render("check.html.mustache", model, Escaping.HTML));
        }
        if (formats.contains(ReportFormat.TEX)) {
            files.put("check-findings.tex", renderer.render("check-findings.tex.mustache", model, Escaping.LATEX));
        }
        if (formats.contains(ReportFormat.JSON)) files.put("check.json", CheckReport.json(r, p));
        return files;
    }
}
