package org.assay.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.audit.AuditFileReader;
import org.assay.audit.AuditRequest;
import org.assay.audit.AuditResult;
import org.assay.audit.Auditor;
import org.assay.report.AuditReports;
import org.assay.report.OutputDirectory;
import org.assay.report.SummaryTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code assay demo}: copies a bundled invented scenario (examples/birdcalls or examples/harbour)
 * into a folder and audits it, so a new user sees a whole report in one command.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = {"Audits a bundled, invented example and writes its report.",
            "birdcalls (default): a bird-call classifier's paper claims accuracy, macro F1, top-3 accuracy and "
                + "ROC AUC on 4,000 clips; a replicator re-ran it on a random 400-clip subsample.",
            "harbour: a photo-caption retrieval paper claims Recall@K both ways on 2,000 photos x 3 captions; "
                + "a replicator re-ran 150 photos, with scores kept only for each query's top 24.",
            "Writes the inputs and the report (--format: md, html, json, tex) to --out.", ""},
        footer = {"", "Examples:", "  assay demo --out assay-demo && less assay-demo/report.md",
            "  assay demo --format md,html,json,tex --out assay-demo",
            "  assay demo --scenario harbour --out harbour-demo"})
final class DemoCommand implements Callable<Integer> {
    /** The files of each bundled scenario, copied as they are (binary safe). */
    static final Map<String, List<String>> SCENARIOS = Map.of(
            "birdcalls", List.of("claims.yaml", "audit.yaml", "predictions.csv", "subsample.txt", "test-ids.txt", "README.md"),
            "harbour", List.of("claims.yaml", "audit.yaml", "scores-photo-to-caption.npy", "scores-caption-to-photo.npy",
                    "relevance-photo-to-caption.json", "relevance-caption-to-photo.json", "subsample.txt", "README.md"));

    @Option(names = "--scenario", paramLabel = "NAME", defaultValue = "birdcalls",
            description = "birdcalls (classification, the default) or harbour (retrieval).")
    String scenario;

    @Spec CommandSpec spec;

    @picocli.CommandLine.ParentCommand Main main;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "assay-demo", description = "Folder to write to (default ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--force", description = "Overwrite files of an earlier demo run.")
    boolean force;

    @Mixin EstimationOptions estimation;

    @Mixin ReportOptions report;

    @Override
    public Integer call() {
        var formats = report.formats();
        List<String> names = SCENARIOS.get(scenario);
        if (names == null) {
            throw org.assay.common.UserInputException.usage("unknown --scenario '" + scenario + "'", "use birdcalls or harbour");
        }
        Map<String, byte[]> inputs = new LinkedHashMap<>();
        for (String f : names) inputs.put(f, resource("/examples/" + scenario + "/" + f));
        Path inputDir = out.resolve("inputs");
        OutputDirectory inputFolder = new OutputDirectory(inputDir, force);
        OutputDirectory reportFolder = new OutputDirectory(out, force);
        // check both folders before writing either, so a refusal leaves nothing half-written
        inputFolder.checkWritable(inputs.keySet());
        reportFolder.checkWritable(AuditReports.auditFileNames(formats));
        inputFolder.writeBytes(inputs);
        AuditFileReader.AuditFile f = AuditFileReader.read(inputDir.resolve("audit.yaml"));
        double margin = f.marginPoints() == null ? 1.0 : f.marginPoints();
        AuditResult result = new Auditor(main.progress()).run(new AuditRequest(f.claims(), f.reproductions(),
                estimation.settings(), margin / 100, f.notes(), f.multiplicity(), f.pairedMethod()));
        Map<String, String> files = AuditReports.audit(result, ReportOptions.provenance(spec), formats,
                report.templates(f.templates()));
        var written = reportFolder.write(files);
        var stdout = spec.commandLine().getOut();
        stdout.print(SummaryTable.render(result));
        stdout.println("inputs copied to " + inputDir);
        for (Path p : written) stdout.println("wrote " + p);
        stdout.flush();
        return Main.DONE;
    }

    private static byte[] resource(String name) {
        try (InputStream in = DemoCommand.class.getResourceAsStream(name)) {
            if (in == null) throw new IllegalStateException("demo file " + name + " is missing from the jar");
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
