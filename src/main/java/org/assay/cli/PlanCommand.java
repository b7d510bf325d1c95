package org.assay.cli;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.audit.ClaimPlanner;
import org.assay.audit.ClassificationReproduction;
import org.assay.audit.EstimationSettings;
import org.assay.audit.GenerationReproduction;
import org.assay.audit.Measurer;
import org.assay.audit.PlanDirection;
import org.assay.audit.PlanPilot;
import org.assay.audit.PlanResult;
import org.assay.audit.PlanSettings;
import org.assay.audit.RegressionReproduction;
import org.assay.audit.Reproduction;
import org.assay.claims.Claim;
import org.assay.claims.ClaimsReader;
import org.assay.claims.PrintedValue;
import org.assay.claims.Scale;
import org.assay.common.UserInputException;
import org.assay.data.EvaluationData;
import org.assay.data.regression.RegressionColumns;
import org.assay.metrics.Task;
import org.assay.report.PlanReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code assay plan}: how many items of the test set a reproduction should evaluate. */
@Command(name = "plan", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Says how many items of the test set to evaluate before you run anything.",
            "For a printed claim it gives the subsample size n at which (a) the audit's interval is no wider than "
                + "± the margin, (b) a true value one margin away is found discrepant with the given power, and (c) the "
                + "claim, if right, is found consistent with that power; and a table of all three against n. Exact for "
                + "count metrics (accuracy, error rate, top-k accuracy, Recall@K, exact match); a normal approximation "
                + "for ROC AUC (Hanley–McNeil from --class-counts) and, with a --pilot, for any other metric.", ""},
        footer = {"", "Examples:",
            "  assay plan --metric accuracy --claim 87.4 --test-size 4000 --margin 1",
            "  assay plan --metric top_k_accuracy:k=5 --claim 96.1 --test-size 10000 --direction lower --power 0.9",
            "  assay plan --metric roc_auc --claim 0.912 --scale fraction --class-counts bird=1200,noise=800",
            "  assay plan --metric macro_f1 --claim 71.3 --test-size 4000 --pilot pilot-preds.csv",
            "  assay plan --claims claims.yaml --table T2 --row \"ChirpNet (ours)\" --pilot pilot-preds.csv",
            "",
            "Then draw the subsample with 'assay sample --n N' and audit it with 'assay audit'.",
            "Exit codes: 0 done; 2 bad usage or input; 3 internal error."})
final class PlanCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Option(names = "--metric", paramLabel = "NAME",
            description = "Metric of the claim, with parameters after a colon (top_k_accuracy:k=5, roc_auc:positive=bird).")
    String metric;

    @Option(names = "--claim", paramLabel = "VALUE", description = "The value as printed (87.4): its decimals give its rounding interval.")
    String claim;

    @Option(names = "--scale", paramLabel = "SCALE",
            description = "percent or fraction (default: percent for proportions, the number itself for other metrics).")
    String scale;

    @Option(names = "--test-size", paramLabel = "N", description = "Items of the full test set the claim was computed on.")
    Long testSize;

    @Option(names = "--margin", paramLabel = "POINTS", defaultValue = "1",
            description = "Margin in percentage points, as in 'assay audit' (default ${DEFAULT-VALUE}): the interval "
                    + "half-width to reach, the error to detect and the agreement to show.")
    double margin;

    @Option(names = "--power", paramLabel = "P", defaultValue = "0.8", description = "Target power (default ${DEFAULT-VALUE}).")
    double power;

    @Option(names = "--alpha", paramLabel = "A", description = "Level of the audit's tests (default 0.05); or --confidence.")
    Double alpha;

    @Option(names = "--confidence", paramLabel = "C", description = "Confidence of the audit's intervals, 1 - alpha (default 0.95).")
    Double confidence;

    @Option(names = "--direction", paramLabel = "WHICH", defaultValue = "either",
            description = "Wrong values to catch: lower, higher or either (default ${DEFAULT-VALUE}).")
    String direction;

    @Option(names = "--class-counts", paramLabel = "COUNTS",
            description = "ROC AUC: items per class in the test set, for example bird=1200,noise=800.")
    String classCounts;

    @Option(names = "--sizes", paramLabel = "N", split = ",",
            description = "Subsample sizes to add to the table, for example 300,600 (at most the test-set size).")
    List<Long> sizes;

    @Option(names = "--claims", paramLabel = "FILE", description = "Plan every claim of a table of this claims file.")
    Path claimsFile;

    @Option(names = "--table", paramLabel = "ID", description = "With --claims: the table (needed when the file has several).")
    String table;

    @Option(names = "--row", paramLabel = "LABEL", description = "With --claims: only the claims of this row.")
    String row;

    @Option(names = "--pilot", paramLabel = "FILE",
            description = "Outputs for a random pilot subsample (a predictions file, read with the usual column options), "
                    + "for metrics without a variance formula: their standard error is extrapolated from it.")
    Path pilot;

    @Option(names = "--task", paramLabel = "TASK", defaultValue = "classification",
            description = "Task of the pilot: classification (default), regression or generation.")
    String task;

    @Option(names = "--references", paramLabel = "FILE", split = ",",
            description = "Generation pilot: reference files aligned with a plain-text hypotheses file.")
    List<Path> references;

    @Option(names = "--target-column", paramLabel = "NAME", defaultValue = "target",
            description = "Regression pilot: true-value column (default ${DEFAULT-VALUE}).")
    String target;

    @Mixin ColumnOptions columns;

    @Option(names = "--resamples", paramLabel = "B", defaultValue = "10000",
            description = "Bootstrap resamples on the pilot (default ${DEFAULT-VALUE}).")
    int resamples;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "" + EstimationSettings.DEFAULT_SEED,
            description = "Seed of the pilot's bootstrap (default ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text", description = "text (default) or json.")
    String format;

    @Override
    public Integer call() {
        if (!format.equals("text") && !format.equals("json")) {
            throw UserInputException.usage("unknown --format '" + format + "'", "use text or json");
        }
        if (alpha != null && confidence != null) {
            throw UserInputException.usage("--alpha and --confidence both given", "give one of them (alpha = 1 - confidence)");
        }
        double conf = confidence != null ? confidence : alpha != null ? 1 - alpha : EstimationSettings.DEFAULT_CONFIDENCE;
        PlanSettings settings = new PlanSettings(margin / 100, power, conf, PlanDirection.parse(direction), sizes,
                resamples, seed, Runtime.getRuntime().availableProcessors());
        Map<String, Long> counts = parseClassCounts(classCounts);
        ClaimPlanner planner = new ClaimPlanner(settings, pilot == null ? null : new PlanPilot(readPilot()));
        PlanResult result;
        if (claimsFile != null) {
            if (metric != null || claim != null || scale != null) {
                throw UserInputException.usage("--claims takes the metrics and values from the file",
                        "leave out --metric, --claim and --scale");
            }
            result = planner.planTable(ClaimsReader.read(claimsFile), table, row, testSize, counts);
        } else {
            if (table != null || row != null) {
                throw UserInputException.usage("--table and --row select claims of a --claims file", "add --claims FILE");
            }
            if (metric == null || claim == null) {
                throw UserInputException.usage("name the claim to plan for", "give --metric and --claim, or --claims FILE");
            }
            result = planner.plan(commandLineClaim(), testSize, counts);
        }
        var out = spec.commandLine().getOut();
        out.print(format.equals("json") ? PlanReport.json(result) : PlanReport.text(result));
        out.flush();
        return Main.DONE;
    }

    /** The claim given by --metric, --claim and --scale. */
    private Claim commandLineClaim() {
        Measurer.MetricRequest request = MeasureCommand.parseMetric(metric);
        PrintedValue value;
        try {
            value = PrintedValue.parse(claim);
        } catch (NumberFormatException e) {
            throw UserInputException.usage("--claim '" + claim + "' is not a plain decimal number",
                    "give the value as printed, for example 87.4");
        }
        Scale s;
        if (scale == null) {
            s = ClaimPlanner.defaultScale(request.id(), value);
        } else {
            s = switch (scale.strip().toLowerCase(java.util.Locale.ROOT)) {
                case "percent" -> Scale.PERCENT;
                case "fraction" -> Scale.FRACTION;
                default -> throw UserInputException.usage("unknown --scale '" + scale + "'", "use percent or fraction");
            };
        }
        return new Claim(null, null, List.of(), request.id(), request.params(), value, s, null, null, null, null, null);
    }

    /** The pilot's outputs, read as {@code assay measure} reads them. */
    private EvaluationData readPilot() {
        Task t = Task.parse(task);
        Reproduction r = switch (t) {
            case CLASSIFICATION -> new ClassificationReproduction(null, null, pilot, columns.readOptions());
            case REGRESSION -> new RegressionReproduction(null, null, pilot,
                    new RegressionColumns(columns.id, target, columns.prediction));
            case GENERATION -> new GenerationReproduction(null, null, pilot, references == null ? List.of() : references,
                    columns.manifest);
            case RETRIEVAL -> throw UserInputException.usage("plan reads no retrieval pilot yet",
                    "plan recall_at_k, a count metric, without one; for other retrieval metrics there is no pilot route yet");
        };
        EvaluationData data = r.read().parts().get(0).data();
        data.warnings().forEach(w -> spec.commandLine().getErr().println("assay: " + w));
        return data;
    }

    /** "bird=1200,noise=800" in the order given; empty when not given. */
    static Map<String, Long> parseClassCounts(String text) {
        Map<String, Long> counts = new LinkedHashMap<>();
        if (text == null) return counts;
        for (String part : text.split(",")) {
            int eq = part.lastIndexOf('=');
            String name = eq <= 0 ? "" : part.substring(0, eq).strip();
            long count;
            try {
                count = eq <= 0 ? -1 : Long.parseLong(part.substring(eq + 1).strip());
            } catch (NumberFormatException e) {
                count = -1;
            }
            if (name.isEmpty() || count < 0) {
                throw UserInputException.usage("--class-counts entry '" + part + "' is not CLASS=COUNT",
                        "write for example --class-counts bird=1200,noise=800");
            }
            if (counts.put(name, count) != null) {
                throw UserInputException.usage("--class-counts names class '" + name + "' twice", "give each class once");
            }
        }
        return counts;
    }
}
