package org.assay.pdf;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.text.similarity.JaroWinklerSimilarity;
import org.apache.commons.text.similarity.LevenshteinDistance;

/**
 * Guesses the metric of a table column from its header path (top level first) and the table caption.
 *
 * <p>Order of evidence: the lowest header level that names a metric by one of the explicit patterns below;
 * then the levels above it and the caption add qualifiers (macro/micro/weighted averaging, "error" over a
 * bare "Top-1", a ROUGE or retrieval context for "R-1"/"R1"); if no level matches, a near spelling of a long
 * metric name (Jaro–Winkler and Levenshtein, Apache Commons Text); then a metric named in the caption alone.
 * The abbreviations are common practice in machine-learning results tables.
 */
public final class MetricGuesser {
    /** Header-level confidence factors: a metric named above the bottom level, or only in the caption. */
    private static final double UPPER_LEVEL = 0.9, CAPTION_ONLY = 0.6, CAPTION_QUALIFIER = 0.9;
    private static final double SIMILARITY_THRESHOLD = 0.9, SIMILARITY_WEIGHT = 0.7;

    /** One explicit header pattern (matched against the whole normalised key). */
    private record Rule(Pattern pattern, String metric, double confidence, boolean inCaption) {
        Rule(String regex, String metric, double confidence, boolean inCaption) {
            this(Pattern.compile(regex), metric, confidence, inCaption);
        }
    }

    /** A metric found in one place, before qualifiers from elsewhere refine it. */
    private record Hit(String metric, Map<String, String> params, double confidence, String averaging, String key) {}

    private static final String TOP_K_ERROR = "top_k_error"; // internal: top-k error has no id of its own
    private static final String R_NUMBER = "r_number";       // internal: "R1", "R-2", "RL": ROUGE or Recall@K
    private static final List<Rule> RULES = new ArrayList<>();
    private static final Map<String, String> LONG_NAMES = new LinkedHashMap<>();
    private static final Pattern AVERAGING =
            Pattern.compile("\\(?\\b(macro|micro|weighted)(?:[- ]?(?:averaged|average|avg))?\\b\\)?");
    private static final Pattern ERROR_WORD = Pattern.compile("\\berr(?:or|ors)?\\b");
    private static final Pattern CAPTION_ERROR = Pattern.compile("\\berror rates?\\b|\\btop-?\\d+ err(?:or|ors)?\\b");
    private static final Pattern RETRIEVAL =
            Pattern.compile("retriev|→|\\b[tvi]2[tvi]\\b|text-to-|-to-text|\\br@\\d|recall@|\\brsum\\b");

    static {
        String acc = "acc(?:uracy)?";
        rule("accuracy", 1.0, true, acc, "overall " + acc, "top-?1 " + acc, acc + "@1", acc + " \\(top-?1\\)");
        rule("accuracy", 1.0, false, "top-?1");
        rule("accuracy", 0.8, false, "oa");
        rule("top_k_accuracy", 1.0, false, "top-?(?<k>\\d+)"); // alone in a caption it may rank anything
        rule("top_k_accuracy", 1.0, true, "top-?(?<k>\\d+) " + acc, acc + "@(?<k>\\d+)",
                acc + " \\(top-?(?<k>\\d+)\\)");
        rule("error_rate", 1.0, false, "err(?:or)?"); // a caption's "error" is often a standard error
        rule("error_rate", 1.0, true, "err(?:or)? rate", "classification error(?: rate)?");
        rule(TOP_K_ERROR, 1.0, true, "top-?(?<k>\\d+) err(?:or)?(?: rate)?");
        rule("balanced_accuracy", 1.0, true, "balanced " + acc, "bal " + acc, "b-?acc");
        rule("balanced_accuracy", 0.6, false, "macc", "mean (?:per-)?class " + acc, "per-class " + acc, "mean " + acc);
        rule("precision", 1.0, true, "precision");
        rule("precision", 1.0, false, "prec");
        rule("precision", 0.9, false, "pre");
        rule("precision", 0.7, false, "p");
        rule("recall", 1.0, true, "recall");
        rule("recall", 1.0, false, "rec");
        rule("recall", 0.7, false, "r");
        rule("f1", 1.0, true, "f1", "f-1", "f_1", "f1[- ]measure");
        rule("f1", 0.85, false, "f", "f-measure", "f measure", "fscore");
        rule("macro_f1", 0.9, false, "maf1?", "ma-f1?");
        rule("micro_f1", 0.9, false, "mif1?", "mi-f1?");
        rule("roc_auc", 1.0, true, "auroc", "au-?roc", "roc[- ]?auc", "auc[- ]roc", "auc \\(roc\\)");
        rule("roc_auc", 0.9, true, "auc");
        rule("roc_auc", 0.8, false, "roc");
        rule("average_precision", 1.0, true, "average precision", "avg precision");
        rule("average_precision", 0.9, false, "ap");
        rule("average_precision", 0.8, false, "map", "mean ap"); // "map" in a caption is usually a feature map
        rule("average_precision", 0.8, true, "mean average precision");
        rule("average_precision", 0.7, true, "auprc", "aupr", "pr[- ]?auc", "auc[- ]pr", "auc \\(pr\\)");
        rule("map_at_k", 0.9, true, "m?ap@(?<k>\\d+)");
        rule("recall_at_k", 0.95, true, "r@(?<k>\\d+)", "(?:hit|hits|h|hr|hit rate)@(?<k>\\d+)");
        rule("recall_at_k", 0.9, true, "recall@(?<k>\\d+)");
        rule(R_NUMBER, 0.7, false, "r-?(?<k>\\d+)", "r-?l");
        rule("r_precision", 1.0, true, "r-?prec(?:ision)?", "rprec");
        rule("r_precision", 0.7, false, "rp");
        rule("mrr", 1.0, true, "mrr", "mean reciprocal rank", "mrr@(?<k>\\d+)");
        rule("ndcg_at_k", 1.0, true, "n?dcg@(?<k>\\d+)");
        rule("ndcg_at_k", 0.8, true, "n-?dcg");
        rule("ndcg_at_k", 0.7, false, "n@(?<k>\\d+)");
        rule("mean_rank", 1.0, true, "mnr", "mean-?r", "mean rank");
        rule("mean_rank", 0.7, false, "mr");
        rule("median_rank", 1.0, true, "med-?r", "med r", "median-?r", "median rank", "mdr");
        rule("rsum", 1.0, true, "rsum", "r-sum", "r sum", "sum of recalls?", "recall sum");
        rule("bleu", 1.0, true, "bleu", "bleu-?4", "b@4", "b-4", "sacre-?bleu");
        rule("bleu", 0.9, true, "bleu-?(?<n>[1-3])", "b@(?<n>[1-3])", "b-(?<n>[1-3])");
        rule("chrf", 1.0, true, "chrf2?");
        rule("chrf", 0.7, true, "chrf\\+\\+");
        rule("rouge_1", 1.0, true, "rouge-?1", "rouge 1");
        rule("rouge_2", 1.0, true, "rouge-?2", "rouge 2");
        rule("rouge_l", 1.0, true, "rouge-?l", "rouge l");
        rule("rouge_l", 0.8, true, "rouge-?l-?sum", "rlsum");
        rule("meteor", 1.0, true, "meteor");
        rule("meteor", 0.9, false, "mtr");
        rule("mcc", 1.0, true, "mcc", "matthews(?: corr(?:elation)?)?(?: coef(?:ficient)?)?", "matthews cc");
        rule("cohen_kappa", 1.0, true, "(?:cohen'?s? )?(?:kappa|κ)");
        rule("mae", 1.0, true, "mae", "mean absolute error");
        rule("rmse", 1.0, true, "rmse", "root[- ]mean[- ]squared?[- ]error", "rms error");
        rule("r2", 1.0, true, "r\\^2", "r\\^\\{2\\}", "r-squared", "r squared", "coefficient of determination");

        for (String[] n : new String[][] {{"accuracy", "accuracy"}, {"precision", "precision"}, {"recall", "recall"},
                {"balanced accuracy", "balanced_accuracy"}, {"average precision", "average_precision"},
                {"error rate", "error_rate"}, {"meteor", "meteor"}, {"matthews", "mcc"}, {"kappa", "cohen_kappa"},
                {"auroc", "roc_auc"}, {"r-precision", "r_precision"}, {"mean rank", "mean_rank"},
                {"median rank", "median_rank"}, {"mean reciprocal rank", "mrr"}, {"rouge-l", "rouge_l"}}) {
            LONG_NAMES.put(n[0], n[1]);
        }
    }

    private static void rule(String metric, double confidence, boolean inCaption, String... regexes) {
        for (String r : regexes) RULES.add(new Rule(r, metric, confidence, inCaption));
    }

    private MetricGuesser() {}

    /** Every metric id {@link #guess} can return, {@link MetricGuess#UNKNOWN} apart. */
    public static Set<String> metricIds() {
        Set<String> ids = new LinkedHashSet<>();
        for (Rule r : RULES) ids.add(r.metric());
        ids.addAll(LONG_NAMES.values());
        ids.removeAll(Set.of(TOP_K_ERROR, R_NUMBER));
        ids.addAll(List.of("rouge_1", "rouge_2", "rouge_l", "recall_at_k", "r2"));
        for (String base : List.of("precision", "recall", "f1")) {
            for (String avg : List.of("macro", "micro", "weighted")) ids.add(avg + "_" + base);
        }
        return ids;
    }

    private static final Pattern SPEECH_ERROR = Pattern.compile("\\b(?:word|character|char) error rates?\\b|\\b(?:wer|cer)\\b");

    /** A change against a baseline ("∆Acc", "Gain", "+/-"): not a value of the metric itself. */
    private static final Pattern DIFFERENCE = Pattern.compile(
            "^(?:[∆Δ]|delta\\b|gain\\b|improvement\\b|diff\\.?\\b|difference\\b|\\+/-)", Pattern.CASE_INSENSITIVE);
    /**
     * Quantities printed next to metrics in results tables that no check here covers: model cost,
     * calibration and likelihood scores, error rates of speech and verification, counts (common practice).
     */
    private static final Pattern OTHER_QUANTITY = Pattern.compile("^(?:#|params?\\b|parameters\\b|flops\\b|gflops\\b|"
            + "macs\\b|latency\\b|time\\b|train(?:ing)? time\\b|speed\\b|throughput\\b|fps\\b|memory\\b|size\\b|"
            + "epochs?\\b|steps\\b|brier\\b|ece\\b|nll\\b|loss\\b|perplexity\\b|ppl\\b|wer\\b|cer\\b|eer\\b|"
            + "energy\\b|cost\\b|rtf\\b|count\\b|removed\\b|width\\b|depth\\b|resolution\\b|year\\b|members\\b|templates\\b|"
            + "sentences\\b|samples\\b|tokens\\b)", Pattern.CASE_INSENSITIVE);

    /** The metric of a column with this header path (top level first) in a table with this caption. */
    public static MetricGuess guess(List<String> headerPath, String caption) {
        List<String> levels = headerPath == null ? List.of() : headerPath;
        List<String> keys = new ArrayList<>();
        for (String level : levels) keys.add(key(level));
        String captionKey = caption == null ? "" : key(caption);

        for (int i = keys.size() - 1; i >= 0; i--) {
            Hit hit = exact(keys.get(i));
            if (hit == null) continue;
            boolean below = false; // a level below names something that is not a metric (a dataset, a split)
            for (int j = i + 1; j < keys.size(); j++) below |= !stripAveraging(keys.get(j)).isEmpty();
            double level = below ? UPPER_LEVEL : 1.0;
            String where = "header \"" + levels.get(i).strip() + "\"" + (below ? " (above the bottom level)" : "");
            return refine(hit, level, where, others(keys, i), captionKey);
        }
        if (!levels.isEmpty()) {
            String bottom = levels.get(levels.size() - 1).strip();
            if (DIFFERENCE.matcher(bottom).find()) {
                return MetricGuess.unknown("header \"" + bottom + "\" is a difference between values, not a metric value");
            }
            if (OTHER_QUANTITY.matcher(bottom).find()) { // the caption's metric must not be pinned on a cost column
                return MetricGuess.unknown("header \"" + bottom + "\" names a quantity assay does not check");
            }
        }
        for (int i = keys.size() - 1; i >= 0; i--) {
            MetricGuess near = similar(levels.get(i), keys.get(i));
            if (near != null) return near;
        }
        return fromCaption(caption, captionKey, levels, keys);
    }

    /** A metric named by one header key, or null. */
    private static Hit exact(String key) {
        String averaging = null;
        Matcher a = AVERAGING.matcher(key);
        if (a.find()) averaging = a.group(1);
        String base = stripAveraging(key);
        for (Rule r : RULES) {
            Matcher m = r.pattern().matcher(base);
            if (m.matches()) return hit(r, m, averaging, base);
        }
        return null;
    }

    private static Hit hit(Rule r, Matcher m, String averaging, String key) {
        Map<String, String> params = new LinkedHashMap<>();
        String k = group(m, "k"), n = group(m, "n");
        if (k != null) params.put("k", String.valueOf(Integer.parseInt(k)));
        if (n != null) params.put("order", n);                 // BLEU-2: bleu with order 2
        String metric = r.metric();
        if (metric.equals("chrf") && key.contains("++")) params.put("word_order", "2");   // chrF++ adds word bigrams
        if (metric.equals("top_k_accuracy") && "1".equals(params.get("k"))) { // top-1 accuracy is accuracy
            metric = "accuracy";
            params.clear();
        }
        return new Hit(metric, params, r.confidence(), averaging, key);
    }

    private static String group(Matcher m, String name) {
        return m.pattern().pattern().contains("(?<" + name + ">") ? m.group(name) : null;
    }

    /** Applies what other header levels and the caption say to a hit. */
    private static MetricGuess refine(Hit hit, double levelFactor, String where, String otherLevels, String caption) {
        String metric = hit.metric();
        Map<String, String> params = new LinkedHashMap<>(hit.params());
        double confidence = hit.confidence() * levelFactor;
        List<String> notes = new ArrayList<>();

        if (metric.equals(R_NUMBER)) { // "R1", "R-2", "RL": ROUGE in summarisation, Recall@K in retrieval
            boolean rouge = otherLevels.contains("rouge") || caption.contains("rouge");
            boolean retrieval = RETRIEVAL.matcher(otherLevels).find() || RETRIEVAL.matcher(caption).find();
            String k = params.remove("k");
            boolean hyphen = hit.key().contains("-") || k == null;
            String rougeId = k == null ? "rouge_l" : k.equals("1") ? "rouge_1" : k.equals("2") ? "rouge_2" : null;
            if (rouge || (!retrieval && hyphen && rougeId != null)) {
                if (rougeId == null) return MetricGuess.unknown(where + " reads as ROUGE-" + k + ", which has no id");
                metric = rougeId;
                confidence = (rouge ? 0.9 : hit.key().equals("rl") ? 0.7 : 0.8) * levelFactor;
                notes.add(rouge ? "ROUGE is named nearby" : "read as ROUGE");
            } else if (k == null) {
                return MetricGuess.unknown(where + " could be ROUGE-L, but the table reads as a retrieval table");
            } else if (!retrieval && k.equals("2")) {
                metric = "r2";
                confidence = 0.6 * levelFactor;
                notes.add("read as R² (no ROUGE or retrieval context)");
            } else {
                metric = "recall_at_k";
                params.put("k", k);
                confidence = (retrieval ? 0.9 : 0.7) * levelFactor;
                notes.add(retrieval ? "a retrieval table" : "read as Recall@" + k);
            }
        }

        boolean bareTopK = (metric.equals("accuracy") || metric.equals("top_k_accuracy"))
                && hit.key().matches("top-?\\d+");
        if (bareTopK && (ERROR_WORD.matcher(otherLevels).find() || CAPTION_ERROR.matcher(caption).find())) {
            metric = metric.equals("accuracy") ? "error_rate" : TOP_K_ERROR;
            notes.add("\"error\" is named nearby");
        }
        if (metric.equals(TOP_K_ERROR)) {
            String k = params.getOrDefault("k", "?");
            if (k.equals("1")) {
                metric = "error_rate";
                params.clear();
            } else {
                return MetricGuess.unknown(where + ": top-" + k + " error has no metric id (it is 1 − top_k_accuracy, k="
                        + k + ")");
            }
        }

        String averaging = hit.averaging();
        double averagingFactor = 1.0;
        String averagingFrom = "the header";
        if (averaging == null) averaging = averaging(otherLevels);
        if (averaging == null) {
            Set<String> inCaption = averagings(caption);
            if (inCaption.size() == 1) {
                averaging = inCaption.iterator().next();
                averagingFactor = CAPTION_QUALIFIER;
                averagingFrom = "the caption";
            } else if (inCaption.size() > 1 && List.of("precision", "recall", "f1").contains(metric)) {
                confidence *= 0.8;
                notes.add("the caption names several averagings " + inCaption);
            }
        }
        if (averaging != null) {
            if (List.of("precision", "recall", "f1").contains(metric)) {
                metric = averaging + "_" + metric;
                confidence *= averagingFactor;
                notes.add(averaging + " averaging from " + averagingFrom);
            } else if (List.of("roc_auc", "average_precision").contains(metric)) {
                confidence *= 0.8;
                notes.add(averaging + " averaging is not part of the id; check it");
            }
        }
        String reason = where + " names " + metric + (params.isEmpty() ? "" : " " + params)
                + (notes.isEmpty() ? "" : "; " + String.join("; ", notes));
        return new MetricGuess(metric, params, confidence, reason);
    }

    /** A near spelling of a long metric name, or null. */
    private static MetricGuess similar(String level, String key) {
        String base = stripAveraging(key);
        if (base.length() < 5 || base.chars().anyMatch(Character::isDigit)) return null;
        JaroWinklerSimilarity jw = new JaroWinklerSimilarity();
        LevenshteinDistance lev = LevenshteinDistance.getDefaultInstance();
        String best = null;
        double bestScore = 0;
        for (String name : LONG_NAMES.keySet()) {
            double s = jw.apply(base, name);
            // Jaro–Winkler rewards a shared prefix ("prediction" and "precision"); the edit distance keeps it honest
            if (s > bestScore && s >= SIMILARITY_THRESHOLD && lev.apply(base, name) <= Math.max(1, name.length() / 4)) {
                best = name;
                bestScore = s;
            }
        }
        if (best == null) return null;
        Hit hit = new Hit(LONG_NAMES.get(best), Map.of(), SIMILARITY_WEIGHT * bestScore, null, best);
        MetricGuess g = refine(hit, 1.0, "header \"" + level.strip() + "\"", "", "");
        return new MetricGuess(g.metric(), g.params(), g.confidence(), "header \"" + level.strip()
                + "\" is a near spelling of \"" + best + "\" (Jaro–Winkler " + String.format(Locale.ROOT, "%.2f", bestScore)
                + ")");
    }

    /** A metric named in the caption when the headers name none. */
    private static MetricGuess fromCaption(String caption, String captionKey, List<String> levels, List<String> keys) {
        // Word and character error rates count edits per word, not wrong items: not the error_rate of a test set.
        if (SPEECH_ERROR.matcher(captionKey).find()) {
            return MetricGuess.unknown("the caption names a word or character error rate, which assay does not check");
        }
        record Span(int start, int end, Hit hit) {}
        List<Span> spans = new ArrayList<>();
        for (Rule r : RULES) {
            if (!r.inCaption()) continue;
            Matcher m = Pattern.compile("(?<![\\w@+-])(?:" + r.pattern().pattern() + ")(?![\\w@+-])").matcher(captionKey);
            while (m.find()) spans.add(new Span(m.start(), m.end(), hit(r, m, null, m.group())));
        }
        // "top-5 accuracy" also contains "accuracy": a match inside a longer one is not a reading of its own
        Map<String, Hit> found = new LinkedHashMap<>();
        spans.sort(java.util.Comparator.comparingInt(Span::start));
        for (Span a : spans) {
            boolean inside = spans.stream().anyMatch(b -> b != a && b.start() <= a.start() && a.end() <= b.end()
                    && b.end() - b.start() > a.end() - a.start());
            if (!inside) found.putIfAbsent(a.hit().metric() + a.hit().params(), a.hit());
        }
        if (found.isEmpty()) {
            String header = levels.isEmpty() ? "no header" : "header \"" + String.join(" / ", levels) + "\"";
            return MetricGuess.unknown(header + " and the caption name no known metric");
        }
        if (found.size() > 1) {
            List<String> names = new ArrayList<>();
            for (Hit h : found.values()) names.add(h.metric() + (h.params().isEmpty() ? "" : h.params().toString()));
            return MetricGuess.unknown("the headers name no metric and the caption names several: " + names);
        }
        Hit h = found.values().iterator().next();
        return refine(h, CAPTION_ONLY, "the caption (not the header)", String.join(" ", keys), captionKey);
    }

    private static String others(List<String> keys, int except) {
        List<String> o = new ArrayList<>();
        for (int j = keys.size() - 1; j >= 0; j--) if (j != except) o.add(keys.get(j)); // nearest level first
        return String.join(" | ", o);
    }

    private static String averaging(String text) {
        Matcher m = AVERAGING.matcher(text);
        return m.find() ? m.group(1) : null;
    }

    private static Set<String> averagings(String text) {
        Set<String> s = new LinkedHashSet<>();
        Matcher m = AVERAGING.matcher(text);
        while (m.find()) s.add(m.group(1));
        return s;
    }

    private static String stripAveraging(String key) {
        return tidy(AVERAGING.matcher(key).replaceAll(" "));
    }

    /** A header reduced to what names the metric: lower case, no arrows, marks, "(%)" or "score". */
    static String key(String header) {
        String s = CellText.normaliseLabel(header.replace("²", "^2")).toLowerCase(Locale.ROOT);
        s = s.replace('’', '\'').replaceAll("[↑↓⇑⇓†‡*§¶‖]", " ");
        s = s.replaceAll("\\((?:in )?%\\)|\\[%\\]|\\bin %|%", " ");
        s = s.replaceAll("\\bscores?\\b", " ");
        s = s.replaceAll("\\s*@\\s*", "@").replaceAll("\\s*-\\s*", "-");
        s = s.replaceAll("\\.(?=\\s|$|\\)|@)", ""); // "Acc." and "Bal. Acc." lose their abbreviation points
        return tidy(s);
    }

    private static String tidy(String s) {
        return s.replaceAll("\\(\\s*\\)", " ").replaceAll("\\s+", " ").strip().replaceAll("^[-:,;/ ]+|[-:,;/ ]+$", "");
    }
}
