package org.assay.cli;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.audit.checks.CheckFinding;
import org.assay.audit.checks.CheckKind;
import org.assay.audit.checks.CheckResult;
import org.assay.audit.checks.ClaimChecker;
import org.assay.claims.ClaimTable;
import org.assay.claims.ClaimsReader;
import org.assay.audit.InputFile;
import org.assay.report.AuditReports;
import org.assay.report.OutputDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code assay check}: what can be said of a results table from the paper alone. */
@Command(name = "check", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Checks printed results without predictions: values that cannot arise on the stated test set.",
            "Finds values no count on the test set can print as, ratios and averages that do not fit their parts, "
                + "ranges broken, more digits than the test set supports, and leads smaller than the test set can "
                + "resolve. Writes check.md, reviewer-comments.md and check.json (--format adds html and tex).", ""},
        footer = {"", "Examples:",
            "  assay check claims.yaml",
            "  assay check examples/birdcalls/claims.yaml --fail-on infeasible",
            "",
            "Checks that need a test-set size or class counts are listed as 'not checked'",
            "until the claims file gives them (test_size: and class_counts: on the table).",
            "",
            "Exit codes: 0 done; 1 done and the --fail-on condition met; 2 bad usage or input; 3 internal error."})
final class CheckCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Parameters(paramLabel = "CLAIMS", description = "Claims file (YAML, JSON or CSV).")
    Path claims;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "check-report", description = "Report folder (default ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--force", description = "Overwrite existing report files.")
    boolean force;

    @Option(names = "--fail-on", paramLabel = "WHAT", defaultValue = "never",
            description = "Exit 1 when a finding is: infeasible, any (any problem), or never (default).")
    String failOn;

    @Mixin ReportOptions report;

    @Override
    public Integer call() {
        String condition = failOn.trim().toLowerCase(java.util.Locale.ROOT);
        if (!List.of("never", "infeasible", "any").contains(condition)) {
            throw org.assay.common.UserInputException.usage("unknown --fail-on value '" + failOn + "'",
                    "use infeasible, any or never");
        }
        var formats = report.formats();
        new OutputDirectory(out, force).checkWritable(AuditReports.checkFileNames(formats));   // refuse before the work
        CheckResult result = new ClaimChecker().check(ClaimsReader.read(claims));
        Map<String, String> files = AuditReports.check(result, ReportOptions.provenance(spec),
                List.of(InputFile.of("claims", claims)), formats, report.templates(null));
        List<Path> written = new OutputDirectory(out, force).write(files);
        var stdout = spec.commandLine().getOut();
        for (ClaimTable t : result.claims().tables()) {
            List<CheckFinding> fs = result.findings().stream().filter(f -> f.tableId().equals(t.id())).toList();
            stdout.println("Table " + t.id() + (fs.isEmpty() ? ": no findings" : ":"));
            for (CheckFinding f : fs) stdout.println("  " + f.kind().word() + " [" + f.id() + "] " + f.message());
        }
        stdout.println();
        stdout.println(result.count(CheckKind.INFEASIBLE) + " infeasible, " + result.count(CheckKind.OVERSTATED_PRECISION)
                + " overstated precision, " + result.count(CheckKind.UNRESOLVED_GAP) + " gap not resolvable, "
                + result.count(CheckKind.QUESTIONABLE) + " questionable, " + result.count(CheckKind.NOT_CHECKED) + " not checked");
        for (Path p : written) stdout.println("wrote " + p);
        stdout.flush();
        boolean met = switch (condition) {
            case "infeasible" -> result.count(CheckKind.INFEASIBLE) > 0;
            case "any" -> !result.problems().isEmpty();
            default -> false;
        };
        return met ? Main.FAIL_ON_MET : Main.DONE;
    }
}
