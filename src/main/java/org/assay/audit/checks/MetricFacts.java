package org.assay.audit.checks;

import java.util.HashMap;
import java.util.Map;

/**
 * What the claim-only checks need to know about a metric id: its range on the fraction scale,
 * whether a larger value is better, and whether it is a count metric (a proportion of items,
 * so its values on N items lie on the grid k/N). Ids follow the trade's names; an id not listed
 * here is simply not checked by the rules that need these facts.
 */
public record MetricFacts(String id, double lowest, double highest, boolean higherIsBetter, boolean count) {
    private static final double INF = Double.POSITIVE_INFINITY;
    private static final Map<String, MetricFacts> KNOWN = new HashMap<>();

    static {
        for (String id : new String[] {"accuracy", "top_k_accuracy", "recall_at_k", "micro_precision", "micro_recall",
                "micro_f1"}) {
            put(id, 0, 1, true, true);
        }
        put("error_rate", 0, 1, false, true);
        for (String id : new String[] {"balanced_accuracy", "precision", "recall", "f1", "macro_precision",
                "macro_recall", "macro_f1", "weighted_precision", "weighted_recall", "weighted_f1", "roc_auc",
                "average_precision", "relevant_recall_at_k", "r_precision", "mrr", "ndcg_at_k", "map_at_k", "bleu",
                "chrf", "rouge_1", "rouge_2", "rouge_l", "meteor"}) {
            put(id, 0, 1, true, false);
        }
        put("mcc", -1, 1, true, false);
        put("cohen_kappa", -1, 1, true, false);
        put("mean_rank", 1, INF, false, false);
        put("median_rank", 1, INF, false, false);
        put("rsum", 0, 6, true, false);
        put("mae", 0, INF, false, false);
        put("rmse", 0, INF, false, false);
        put("r2", -INF, 1, true, false);
        put("pearson", -1, 1, true, false);
        put("spearman", -1, 1, true, false);
    }

    private static void put(String id, double lo, double hi, boolean higher, boolean count) {
        KNOWN.put(id, new MetricFacts(id, lo, hi, higher, count));
    }

    /** The facts for an id, or null when the checks know nothing about it. */
    public static MetricFacts of(String id) { return KNOWN.get(id); }
}
