package org.assay.cli;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.audit.AuditFileReader;
import org.assay.audit.AuditRequest;
import org.assay.audit.AuditResult;
import org.assay.audit.Auditor;
import org.assay.audit.PairedMethod;
import org.assay.stats.MultiplicityMethod;
import org.assay.audit.Reproduction;
import org.assay.metrics.Task;
import org.assay.common.UserInputException;
import org.assay.report.AuditReports;
import org.assay.report.OutputDirectory;
import org.assay.report.SummaryTable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code assay audit}: claims versus a reproduction, claim by claim. */
@Command(name = "audit", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Tests each claim of a results table against your reproduced predictions.",
            "Writes a report (report.md, replication-notes.md, reviewer-comments.md, claims-table.md and report.json; "
                + "--format adds report.html and claims-table.tex): the reproduced value with its interval, the claim's rounding "
                + "interval, a p-value (Holm-adjusted across the audit; --multiplicity bh for Benjamini-Hochberg) and a "
                + "verdict: consistent, inconclusive or discrepant. Pairs of rows named under compare: in the claims file, "
                + "both reproduced on the same items, are compared: the reproduced gap beside the claimed one, and a "
                + "paired test of the printed ordering.", ""},
        footer = {"", "Examples:",
            "  assay audit --claims claims.yaml --predictions preds.csv --manifest subsample.txt \\",
            "      --table T2 --row \"ChirpNet (ours)\" --positive 1 --out audit-report",
            "  assay audit examples/birdcalls/audit.yaml --out audit-report --fail-on discrepant",
            "  assay audit --claims claims.yaml --task generation --predictions outputs.jsonl --table T3 --row Ours",
            "  assay audit --rerun audit-report/report.json     # repeat it; exit 1 unless identical",
            "",
            "An audit file names the claims file and, per reproduced table row, the predictions:",
            "  claims: claims.yaml",
            "  reproductions:",
            "    - {table: T2, row: \"ChirpNet (ours)\", predictions: preds.csv, manifest: subsample.txt}",
            "    - {table: T2, row: \"Baseline CNN\", predictions: baseline.csv, manifest: subsample.txt}",
            "  multiplicity: holm             # or bh",
            "  paired_test: bootstrap         # or randomization",
            "",
            "Exit codes: 0 done; 1 done and the --fail-on condition met; 2 bad usage or input; 3 internal error."})
final class AuditCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @picocli.CommandLine.ParentCommand Main main;

    @Parameters(arity = "0..1", paramLabel = "AUDIT_FILE", description = "An audit file (YAML) instead of --claims/--predictions.")
    Path auditFile;

    @Option(names = "--claims", paramLabel = "FILE", description = "Claims file (YAML, JSON or CSV).")
    Path claims;

    @Option(names = "--predictions", paramLabel = "FILE",
            description = "Predictions file (CSV, TSV or JSONL); generation: outputs .jsonl or a hypotheses file "
                    + "with --references; retrieval: none, give --scores or --ranked.")
    Path predictions;

    @Option(names = "--task", paramLabel = "TASK", defaultValue = "classification",
            description = "Task of the outputs: classification (default), retrieval, generation or regression.")
    String task;

    @Option(names = "--table", paramLabel = "ID", description = "Claims table the predictions reproduce (needed when there are several).")
    String table;

    @Option(names = "--row", paramLabel = "LABEL", description = "Row of the reproduced method (needed when the table has several).")
    String row;

    @Mixin TaskInputs inputs;

    @Option(names = "--margin", paramLabel = "POINTS", description = "Equivalence margin in percentage points (default 1).")
    Double margin;

    @Mixin EstimationOptions estimation;

    @Option(names = "--multiplicity", paramLabel = "METHOD",
            description = "Adjustment of p-values across the audit's claims (and across its compared rows): holm "
                    + "(family-wise error rate, the default) or bh (Benjamini-Hochberg false discovery rate).")
    String multiplicity;

    @Option(names = "--paired-test", paramLabel = "METHOD",
            description = "Test of compared rows (compare: in the claims file) for metrics without an exact or DeLong "
                    + "paired test: bootstrap (paired bootstrap, the default) or randomization (approximate randomization).")
    String pairedTest;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "audit-report", description = "Report folder (default ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--force", description = "Overwrite existing report files.")
    boolean force;

    @Mixin ReportOptions report;

    @Option(names = "--rerun", paramLabel = "REPORT_JSON",
            description = "Repeat the audit recorded in a report.json (its provenance block) and say whether the "
                    + "result is identical; input files are checked against their recorded SHA-256.")
    Path rerun;

    @Option(names = "--fail-on", paramLabel = "WHAT", defaultValue = "never",
            description = "Exit 1 when a claim is: discrepant, inconclusive (or worse), not-computable; or never (default).")
    String failOn;

    @Override
    public Integer call() throws java.io.IOException {
        if (rerun != null) {
            if (auditFile != null || claims != null) {
                throw UserInputException.usage("--rerun repeats a recorded audit; give no audit file or --claims with it",
                        "run 'assay audit --rerun report.json' on its own");
            }
            int code = Rerun.run(rerun, spec.commandLine().getOut());
            spec.commandLine().getOut().flush();
            return code;
        }
        FailOn condition = FailOn.parse(failOn);
        var formats = report.formats();
        AuditRequest request = request();
        OutputDirectory target = new OutputDirectory(out, force);
        target.checkWritable(AuditReports.auditFileNames(formats));   // refuse before the work, not after
        AuditResult result = new Auditor(main.progress()).run(request);
        Map<String, String> files = AuditReports.audit(result, ReportOptions.provenance(spec), formats,
                report.templates(templatesFromFile));
        List<Path> written = target.write(files);
        var stdout = spec.commandLine().getOut();
        result.warnings().forEach(w -> spec.commandLine().getErr().println("assay: " + w));
        stdout.print(SummaryTable.render(result));
        for (Path p : written) stdout.println("wrote " + p);
        stdout.flush();
        return condition.met(result) ? Main.FAIL_ON_MET : Main.DONE;
    }

    /** The audit file's templates: folder, if it names one. */
    private Path templatesFromFile;

    private AuditRequest request() {
        if (auditFile != null) {
            if (claims != null || predictions != null) {
                throw UserInputException.usage("give either an audit file or --claims and --predictions, not both",
                        "drop one of them");
            }
            AuditFileReader.AuditFile f = AuditFileReader.read(auditFile);
            double m = margin != null ? margin : f.marginPoints() != null ? f.marginPoints() : 1.0;
            templatesFromFile = f.templates();
            return new AuditRequest(f.claims(), f.reproductions(), estimation.settings(), m / 100, f.notes(),
                    multiplicity != null ? MultiplicityMethod.parse(multiplicity) : f.multiplicity(),
                    pairedTest != null ? PairedMethod.parse(pairedTest) : f.pairedMethod());
        }
        Task t = Task.parse(task);
        if (claims == null || (predictions == null && t != Task.RETRIEVAL)) {
            throw UserInputException.usage("audit needs --claims FILE and --predictions FILE (or an audit file)",
                    "see 'assay audit --help'");
        }
        if (inputs.needsColumnPrefixes(t)) {
            throw UserInputException.usage("with --direction both, assay cannot tell which claims each direction serves",
                    "audit one direction at a time, or write an audit file with a 'column:' per direction");
        }
        Reproduction r = inputs.reproduction(t, predictions, table, row);
        return new AuditRequest(claims, List.of(r), estimation.settings(), (margin == null ? 1.0 : margin) / 100,
                org.assay.audit.UserNotes.none(),
                multiplicity == null ? MultiplicityMethod.HOLM : MultiplicityMethod.parse(multiplicity),
                pairedTest == null ? PairedMethod.BOOTSTRAP : PairedMethod.parse(pairedTest));
    }
}
