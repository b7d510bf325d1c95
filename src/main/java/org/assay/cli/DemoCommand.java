package org.assay.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.audit.AuditFileReader;
import org.assay.audit.AuditRequest;
import org.assay.audit.AuditResult;
import org.assay.audit.Auditor;
import org.assay.report.JsonReport;
import org.assay.report.MarkdownReport;
import org.assay.report.OutputDirectory;
import org.assay.report.SummaryTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code assay demo}: copies the bundled invented scenario (examples/birdcalls) into a folder
 * and audits it, so a new user sees a whole report in one command.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = {"Audits a bundled, invented example and writes its report.",
            "A bird-call classifier's paper claims accuracy, macro F1, top-3 accuracy and ROC AUC on 4,000 "
                + "clips; a replicator re-ran it on a random 400-clip subsample. Writes the inputs and "
                + "report.md / report.json to --out.", ""},
        footer = {"", "Example:", "  assay demo --out assay-demo && less assay-demo/report.md"})
final class DemoCommand implements Callable<Integer> {
    static final List<String> FILES = List.of("claims.yaml", "audit.yaml", "predictions.csv", "subsample.txt", "README.md");

    @Spec CommandSpec spec;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "assay-demo", description = "Folder to write to (default ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--force", description = "Overwrite files of an earlier demo run.")
    boolean force;

    @Mixin EstimationOptions estimation;

    @Override
    public Integer call() {
        Map<String, String> inputs = new LinkedHashMap<>();
        for (String f : FILES) inputs.put(f, resource("/examples/birdcalls/" + f));
        Path inputDir = out.resolve("inputs");
        new OutputDirectory(inputDir, force).write(inputs);
        AuditFileReader.AuditFile f = AuditFileReader.read(inputDir.resolve("audit.yaml"));
        double margin = f.marginPoints() == null ? 1.0 : f.marginPoints();
        AuditResult result = new Auditor().run(new AuditRequest(f.claims(), f.reproductions(), estimation.settings(), margin / 100));
        Map<String, String> files = new LinkedHashMap<>();
        files.put("report.md", MarkdownReport.render(result, Main.version()));
        files.put("report.json", JsonReport.render(result, Main.version()));
        var written = new OutputDirectory(out, force).write(files);
        var stdout = spec.commandLine().getOut();
        stdout.print(SummaryTable.render(result));
        stdout.println("inputs copied to " + inputDir);
        for (Path p : written) stdout.println("wrote " + p);
        stdout.flush();
        return Main.DONE;
    }

    private static String resource(String name) {
        try (InputStream in = DemoCommand.class.getResourceAsStream(name)) {
            if (in == null) throw new IllegalStateException("demo file " + name + " is missing from the jar");
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
