package org.assay.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.common.UserInputException;
import org.assay.report.OutputDirectory;
import org.assay.report.TemplateSource;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code assay init}: a folder to start an audit in: a starter audit file for the chosen task
 * and copies of the shipped report templates, which the audit file names, so edits to them show
 * in the next report without rebuilding anything.
 */
@Command(name = "init", mixinStandardHelpOptions = true,
        description = {"Writes a starter audit file and editable copies of the report templates.", ""},
        footer = {"", "Examples:",
            "  assay init --task retrieval --out my-audit",
            "  assay init --out my-audit && $EDITOR my-audit/audit-templates/report.md.mustache",
            "",
            "The templates are Mustache: {{name}} places a value (escaped for the format), {{#list}}...{{/list}}",
            "repeats a section, {{> file}} includes another template of the folder. Nothing in them runs code."})
final class InitCommand implements Callable<Integer> {
    private static final List<String> TASKS = List.of("classification", "retrieval", "generation", "regression");

    @Spec CommandSpec spec;

    @Option(names = "--task", paramLabel = "TASK", defaultValue = "classification",
            description = "classification (default), retrieval, generation or regression.")
    String task;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "assay-audit", description = "Folder to write to (default ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--force", description = "Overwrite files an earlier init wrote.")
    boolean force;

    @Override
    public Integer call() {
        String t = task.strip().toLowerCase(Locale.ROOT);
        if (!TASKS.contains(t)) {
            throw UserInputException.usage("unknown --task '" + task + "'", "use " + String.join(", ", TASKS));
        }
        Map<String, byte[]> templates = new LinkedHashMap<>();
        TemplateSource shipped = TemplateSource.bundled();
        for (String name : TemplateSource.SHIPPED) {
            templates.put(name, shipped.load(name).getBytes(java.nio.charset.StandardCharsets.UTF_8));
        }
        // check both folders before writing either, so a refusal leaves nothing half-written
        OutputDirectory templateDir = new OutputDirectory(out.resolve("audit-templates"), force);
        OutputDirectory top = new OutputDirectory(out, force);
        Map<String, byte[]> starter = Map.of("audit.yaml", resource("/starters/audit-" + t + ".yaml"));
        templateDir.checkWritable(templates.keySet());
        top.checkWritable(starter.keySet());
        var written = new java.util.ArrayList<>(top.writeBytes(starter));
        written.addAll(templateDir.writeBytes(templates));
        var stdout = spec.commandLine().getOut();
        written.forEach(p -> stdout.println("wrote " + p));
        stdout.println("next: fill in " + out.resolve("audit.yaml") + ", then run: assay audit " + out.resolve("audit.yaml")
                + " --format md,html,json,tex");
        stdout.flush();
        return Main.DONE;
    }

    private static byte[] resource(String name) {
        try (InputStream in = InitCommand.class.getResourceAsStream(name)) {
            if (in == null) throw new IllegalStateException(name + " is missing from the jar");
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
