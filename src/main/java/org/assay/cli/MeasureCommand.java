package org.assay.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.audit.Measurement;
import org.assay.audit.Measurer;
import org.assay.common.UserInputException;
import org.assay.audit.Reproduction;
import org.assay.metrics.Task;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code assay measure}: metrics with intervals for a predictions file, no claims involved. */
@Command(name = "measure", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Computes metrics with intervals for a predictions file.", ""},
        footer = {"", "Examples:",
            "  assay measure preds.csv --task classification --metric accuracy,macro_f1 --test-size 4000",
            "  assay measure preds.csv --task classification --metric roc_auc --interval delong --positive 1 --format json",
            "  assay measure preds.csv --task classification --metric top_k_accuracy:k=3 --interval wilson",
            "  assay measure --task retrieval --scores sim.npy --group-size 5 --metric recall_at_k --k 1,5,10 --direction both",
            "  assay measure --task retrieval --ranked runs.jsonl --relevance qrels.csv --metric mrr,ndcg_at_k:k=10",
            "  assay measure outputs.jsonl --task generation --metric bleu,chrf,rouge_l",
            "  assay measure hyp.txt --references ref1.txt,ref2.txt --task generation --metric \"bleu:tokenize=13a;lowercase=false\"",
            "",
            "Metric parameters follow a colon: NAME:key=value;key=value."})
final class MeasureCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @picocli.CommandLine.ParentCommand Main main;

    @Parameters(paramLabel = "FILE", arity = "0..1",
            description = "Predictions file (CSV, TSV or JSONL); for generation a .jsonl of items with references, or a "
                    + "hypotheses file with --references; retrieval reads --scores or --ranked instead.")
    Path file;

    @Option(names = "--task", paramLabel = "TASK", defaultValue = "classification",
            description = "Task of the outputs: classification (default), retrieval, generation or regression.")
    String task;

    @Option(names = "--metric", paramLabel = "NAME", split = ",", required = true,
            description = "Metrics to compute, comma-separated (accuracy, error_rate, balanced_accuracy, precision, "
                    + "recall, f1, macro_f1, micro_f1, weighted_f1, mcc, cohen_kappa, roc_auc, top_k_accuracy:k=5, ...).")
    List<String> metrics;

    @Option(names = "--k", paramLabel = "K", split = ",",
            description = "Cut-offs for the metrics that take k (recall_at_k, ndcg_at_k, top_k_accuracy ...): "
                    + "one result per K, for example --k 1,5,10.")
    List<Integer> ks;

    @Option(names = "--test-size", paramLabel = "N",
            description = "Size of the full test set the file is a random subsample of (enables finite-population methods).")
    Long testSize;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text", description = "text (default) or json.")
    String format;

    @Mixin TaskInputs inputs;

    @Mixin EstimationOptions estimation;

    @Override
    public Integer call() throws Exception {
        Task t = Task.parse(task);
        if (!format.equals("text") && !format.equals("json")) {
            throw UserInputException.usage("unknown --format '" + format + "'", "use text or json");
        }
        if (testSize != null && testSize < 1) {
            throw UserInputException.usage("--test-size must be positive", "give the size of the full test set");
        }
        List<Measurer.MetricRequest> requests = withCutoffs(metrics.stream().map(MeasureCommand::parseMetric).toList(), ks);
        Reproduction.Outputs outputs = inputs.reproduction(t, file).read(main.progress());
        List<PartResult> results = new ArrayList<>();
        Measurer measurer = new Measurer(estimation.settings(), main.progress());
        for (Reproduction.Part part : outputs.parts()) {
            List<Measurer.MetricRequest> mine = requests.stream().filter(r -> serves(outputs, part, r.id())).toList();
            if (!mine.isEmpty()) results.add(new PartResult(part, measurer.measure(part.data(), mine, testSize)));
        }
        if (results.isEmpty()) {
            throw UserInputException.usage("none of the metrics can be computed from one direction",
                    "rsum needs --direction both");
        }
        var out = spec.commandLine().getOut();
        var err = spec.commandLine().getErr();
        outputs.parts().stream().flatMap(p -> p.data().warnings().stream()).distinct()
                .forEach(w -> err.println("assay: " + w));
        out.print(format.equals("json") ? json(t, results) : text(results));
        out.flush();
        return Main.DONE;
    }

    /** The measurements of one part of the outputs (one retrieval direction, say). */
    record PartResult(Reproduction.Part part, List<Measurement> measurements) {}

    /** A part serves the metrics it was made for (rsum over both directions), others serve the rest. */
    private static boolean serves(Reproduction.Outputs outputs, Reproduction.Part part, String metric) {
        if (part.metrics() != null) return part.metrics().contains(metric);
        return outputs.parts().stream().noneMatch(p -> p.metrics() != null && p.metrics().contains(metric));
    }

    /** Each metric that takes k and was not given one, once per cut-off in {@code ks}. */
    static List<Measurer.MetricRequest> withCutoffs(List<Measurer.MetricRequest> requests, List<Integer> ks) {
        if (ks == null || ks.isEmpty()) return requests;
        List<Measurer.MetricRequest> out = new ArrayList<>();
        boolean used = false;
        for (Measurer.MetricRequest r : requests) {
            boolean takesK = org.assay.metrics.MetricRegistry.get(r.id()).params().contains("k");
            if (!takesK || r.params().containsKey("k")) {
                out.add(r);
                continue;
            }
            used = true;
            for (int k : ks) {
                Map<String, String> p = new LinkedHashMap<>(r.params());
                p.put("k", Integer.toString(k));
                out.add(new Measurer.MetricRequest(r.id(), p));
            }
        }
        if (!used) {
            throw UserInputException.usage("--k was given but no requested metric takes a cut-off k",
                    "use it with recall_at_k, ndcg_at_k, map_at_k, mrr, top_k_accuracy ...");
        }
        return out;
    }

    static Measurer.MetricRequest parseMetric(String text) {
        String t = text.trim();
        int colon = t.indexOf(':');
        if (colon < 0) return new Measurer.MetricRequest(t, Map.of());
        Map<String, String> params = new LinkedHashMap<>();
        for (String kv : t.substring(colon + 1).split(";")) {
            int eq = kv.indexOf('=');
            if (eq <= 0) throw UserInputException.usage("metric parameter '" + kv + "' is not key=value", "write for example top_k_accuracy:k=5");
            params.put(kv.substring(0, eq).trim(), kv.substring(eq + 1).trim());
        }
        return new Measurer.MetricRequest(t.substring(0, colon), params);
    }

    private String text(List<PartResult> parts) {
        StringBuilder sb = new StringBuilder();
        String fmt = "%-24s %8s %10s  %-22s %s%n";
        for (PartResult part : parts) {
            if (parts.size() > 1 || part.part().columnPrefix() != null) {
                sb.append(part.part().description()).append(":\n");
            }
            sb.append(String.format(Locale.ROOT, fmt, "metric", "n", "value", "interval", "method"));
            for (Measurement m : part.measurements()) {
                if (!m.computed()) {
                    sb.append(String.format(Locale.ROOT, fmt, label(m), m.n(), "n/a", "n/a", "not computable"));
                    continue;
                }
                sb.append(String.format(Locale.ROOT, fmt, label(m), m.n(), String.format(Locale.ROOT, "%.4f", m.value()),
                        String.format(Locale.ROOT, "[%.4f, %.4f]", m.interval().lower(), m.interval().upper()),
                        m.interval().method()));
            }
            // notes every metric shares (the method) once; a metric's own (its settings) under its name
            List<Measurement> ms = part.measurements();
            List<String> shared = ms.get(0).notes().stream().filter(n -> ms.stream().allMatch(m -> m.notes().contains(n))).toList();
            shared.forEach(n -> sb.append("note: ").append(n).append('\n'));
            for (Measurement m : ms) {
                m.notes().stream().filter(n -> !shared.contains(n))
                        .forEach(n -> sb.append("note (").append(label(m)).append("): ").append(n).append('\n'));
            }
            part.measurements().stream().filter(m -> !m.computed())
                    .forEach(m -> sb.append("not computable: ").append(m.notComputable()).append('\n'));
        }
        return sb.toString();
    }

    private static String label(Measurement m) {
        if (m.params().isEmpty()) return m.metric();
        StringBuilder sb = new StringBuilder(m.metric()).append(':');
        m.params().forEach((k, v) -> sb.append(k).append('=').append(v).append(';'));
        return sb.substring(0, sb.length() - 1);
    }

    private String json(Task t, List<PartResult> parts) throws Exception {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = mapper.createObjectNode();
        root.put("schema_version", 1);
        if (file == null) root.putNull("file"); else root.put("file", file.toString());
        root.put("task", t.id());
        root.put("n", parts.get(0).part().data().size());
        if (testSize == null) root.putNull("test_size"); else root.put("test_size", testSize);
        var s = estimation.settings();
        root.put("confidence", s.confidence());
        root.put("seed", s.seed());
        root.put("resamples", s.resamples());
        ArrayNode arr = root.putArray("metrics");
        ArrayNode w = mapper.createArrayNode();
        parts.stream().flatMap(p -> p.part().data().warnings().stream()).distinct().forEach(w::add);
        for (PartResult part : parts) {
            for (Measurement m : part.measurements()) {
                ObjectNode o = arr.addObject();
                o.put("metric", m.metric());
                if (part.part().columnPrefix() != null) o.put("direction", part.part().columnPrefix());
                ObjectNode p = o.putObject("params");
                m.params().forEach(p::put);
                o.put("n", m.n());
                if (!m.computed()) {
                    o.putNull("value");
                    o.putNull("interval");
                    o.put("not_computable", m.notComputable());
                    continue;
                }
                o.put("value", m.value());
                ObjectNode i = o.putObject("interval");
                i.put("lower", m.interval().lower());
                i.put("upper", m.interval().upper());
                i.put("confidence", m.interval().confidence());
                i.put("method", m.interval().method());
                o.put("standard_error", m.standardError());
                ArrayNode notes = o.putArray("notes");
                m.notes().forEach(notes::add);
            }
        }
        root.set("warnings", w);
        return mapper.writeValueAsString(root) + "\n";
    }
}
