package org.assay.cli;

import java.nio.file.Path;
import java.util.Set;
import org.assay.report.Provenance;
import org.assay.report.ReportFormat;
import org.assay.report.TemplateSource;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/** Which report files to write and from which templates (audit, check and demo). */
final class ReportOptions {
    @Option(names = "--format", paramLabel = "FORMATS", defaultValue = "md,json",
            description = "Report formats, any of md, html, json, tex, comma-separated (default ${DEFAULT-VALUE}).")
    String format;

    @Option(names = "--template", paramLabel = "DIR",
            description = "Folder of report templates to use instead of the shipped ones ('assay init' copies them); "
                    + "files it lacks come from the shipped set.")
    Path template;

    Set<ReportFormat> formats() { return ReportFormat.parse(format); }

    /** The --template folder, else {@code fromAuditFile}, else the shipped templates. */
    TemplateSource templates(Path fromAuditFile) {
        if (template != null) return TemplateSource.folder(template);
        if (fromAuditFile != null) return TemplateSource.folder(fromAuditFile);
        return TemplateSource.bundled();
    }

    /** This run's provenance: the build, the runtime and the arguments as given. */
    static Provenance provenance(CommandSpec spec) {
        var root = spec.commandLine();
        while (root.getParent() != null) root = root.getParent();
        var parsed = root.getParseResult();
        return Provenance.of(parsed == null ? java.util.List.of() : parsed.originalArgs());
    }
}
