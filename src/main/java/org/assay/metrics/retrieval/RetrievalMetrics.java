package org.assay.metrics.retrieval;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.retrieval.RetrievalData;
import org.assay.metrics.CellStatistic;
import org.assay.metrics.OneHotUnitTable;
import org.assay.metrics.SumStatistic;
import org.assay.metrics.UnitMean;
import org.assay.metrics.UnitTable;

/**
 * Retrieval metrics over per-query statistics; the query is the resampling unit. Every metric
 * reads only the sorted ranks of each query's relevant candidates ({@link RetrievalData}), so its
 * per-query value is computed once and a resample is a weighted mean (or median) of those values.
 *
 * <p>Notation: for query q, R = its number of relevant candidates, r_1 <= r_2 <= ... <= r_R their
 * ranks (1-based; fractional under the AVERAGE tie policy; infinite when not ranked within the
 * scored depth). Definitions:
 * <ul>
 *   <li>{@code recall_at_k} (k): 1 when r_1 <= k, else 0; mean over queries (hit rate, a COUNT
 *       metric; the per-query outcome is exposed).</li>
 *   <li>{@code relevant_recall_at_k} (k): #{i : r_i <= k} / R, averaged.</li>
 *   <li>{@code r_precision}: #{i : r_i <= R} / R, averaged.</li>
 *   <li>{@code mrr} (optional k): 1 / r_1, averaged; with k, 0 for a query with r_1 > k (MRR@k).</li>
 *   <li>{@code mean_rank}, {@code median_rank}: mean and median of r_1 over queries; the median of
 *       an even count is the mean of the two middle values (numpy.median).</li>
 *   <li>{@code ndcg_at_k} (k): binary gains, log2 discount: DCG = sum over r_i <= k of
 *       1 / log2(r_i + 1); ideal DCG = sum over j = 1..min(R, k) of 1 / log2(j + 1); their ratio,
 *       averaged. Without ties this is scikit-learn's ndcg_score on 0/1 relevance; with ties
 *       scikit-learn averages the gain over each tie group (the expected DCG under random
 *       tie-breaking), which lies between our OPTIMISTIC and PESSIMISTIC values.</li>
 *   <li>{@code map_at_k} (k): AP@k = (1 / min(R, k)) * sum over r_i <= k of i / r_i, averaged.
 *       The denominator min(R, k) makes a perfect top-k score 1 (common practice); at k = the
 *       number of candidates it is R and AP equals scikit-learn's average_precision_score on a
 *       ranking without ties.</li>
 * </ul>
 *
 * <p>Computability: a metric at K beyond the data's depth (the smallest scored depth of any
 * query) is not computable, never scored; so is r_precision when some query has more relevant
 * candidates than scored ones, and mrr without k, mean_rank and median_rank when some query has no
 * relevant candidate within its scored depth (its first relevant rank is unknown).
 */
public final class RetrievalMetrics {
    private RetrievalMetrics() {}

    private static final Map<String, String> DEFINITIONS = new LinkedHashMap<>();
    static {
        DEFINITIONS.put("recall_at_k", "fraction of queries with at least one relevant candidate in the top k (hit rate)");
        DEFINITIONS.put("relevant_recall_at_k", "fraction of a query's relevant candidates in the top k, averaged over queries");
        DEFINITIONS.put("r_precision", "precision at R, the query's number of relevant candidates, averaged over queries");
        DEFINITIONS.put("mrr", "mean reciprocal rank of the first relevant candidate (with k: 0 beyond rank k)");
        DEFINITIONS.put("mean_rank", "mean rank of the first relevant candidate");
        DEFINITIONS.put("median_rank", "median rank of the first relevant candidate (even count: mean of the two middle ranks)");
        DEFINITIONS.put("ndcg_at_k", "normalised DCG at k with binary gains and log2 discount, averaged over queries");
        DEFINITIONS.put("map_at_k", "mean average precision at k, each query's AP divided by min(R, k)");
        DEFINITIONS.put("rsum", "R@1 + R@5 + R@10 in both directions (0 to 6 as fractions; tables print it in percent points, 0 to 600)");
    }

    private static final Map<String, String[]> TITLES_AND_REFERENCES = Map.of(
            "recall_at_k", new String[] {"Recall@K (hit rate)", "hit rate at K, the usual meaning of R@K in cross-modal retrieval tables (common practice)"},
            "relevant_recall_at_k", new String[] {"recall@K (relevant items retrieved)", "Manning, Raghavan & Schütze (2008) Introduction to Information Retrieval, ch. 8"},
            "r_precision", new String[] {"R-precision", "Manning, Raghavan & Schütze (2008) Introduction to Information Retrieval, §8.4"},
            "mrr", new String[] {"Mean reciprocal rank", "Voorhees (1999) TREC-8 Question Answering Track Report"},
            "mean_rank", new String[] {"Mean rank of the first relevant item", "common practice in cross-modal retrieval"},
            "median_rank", new String[] {"Median rank of the first relevant item", "common practice in cross-modal retrieval (MedR)"},
            "ndcg_at_k", new String[] {"nDCG@K", "Järvelin & Kekäläinen (2002) ACM TOIS 20:422-446; binary gains as scikit-learn ndcg_score"},
            "map_at_k", new String[] {"mAP@K", "Manning, Raghavan & Schütze (2008) Introduction to Information Retrieval, §8.4; min(R, k) normaliser (common practice)"},
            "rsum", new String[] {"RSUM", "sum of R@1, R@5, R@10 in both directions (common practice in image-text retrieval)"});

    private static final Map<String, Set<String>> PARAMS = Map.of(
            "recall_at_k", Set.of("k"), "relevant_recall_at_k", Set.of("k"), "ndcg_at_k", Set.of("k"),
            "map_at_k", Set.of("k"), "mrr", Set.of("k"), "r_precision", Set.of(), "mean_rank", Set.of(),
            "median_rank", Set.of(), "rsum", Set.of());

    /** The metric ids, rsum included (rsum takes two directions: use {@link #rsum}). */
    public static List<String> ids() { return List.copyOf(DEFINITIONS.keySet()); }

    /** A one-line definition of the metric, for reports. */
    public static String definition(String id) {
        requireKnown(id);
        return DEFINITIONS.get(id);
    }

    /** The metric's name as tables print it. */
    public static String title(String id) {
        requireKnown(id);
        return TITLES_AND_REFERENCES.get(id)[0];
    }

    /** Where the metric's definition comes from. */
    public static String reference(String id) {
        requireKnown(id);
        return TITLES_AND_REFERENCES.get(id)[1];
    }

    /** Parameter names the metric takes. */
    public static Set<String> params(String id) {
        requireKnown(id);
        return PARAMS.get(id);
    }

    /** Whether the metric with these parameters can be computed on the data. */
    public static boolean computable(String id, Map<String, String> params, RetrievalData data) {
        return whyNotComputable(id, params, data) == null;
    }

    /** Why the metric cannot be computed on the data, or null when it can. Bad parameters throw. */
    public static String whyNotComputable(String id, Map<String, String> params, RetrievalData data) {
        requireKnown(id);
        if (id.equals("rsum")) return rsumDepth(data);
        checkParams(id, params);
        Integer k = k(id, params);
        if (k != null) return beyondDepth(id, k, data);
        switch (id) {
            case "r_precision" -> {
                for (int q = 0; q < data.queries(); q++) {
                    if (data.relevantCount(q) > data.scoredDepth()[q]) {
                        return "r_precision needs the top R ranks of every query, but query '" + data.queryIds().get(q)
                                + "' has R = " + data.relevantCount(q) + " relevant candidates and only "
                                + data.scoredDepth()[q] + " scored ranks";
                    }
                }
            }
            case "mrr", "mean_rank", "median_rank" -> {
                int unranked = 0;
                String first = null;
                for (int q = 0; q < data.queries(); q++) {
                    if (Double.isInfinite(data.firstRank(q))) {
                        unranked++;
                        if (first == null) first = data.queryIds().get(q);
                    }
                }
                if (unranked > 0) {
                    return id + " needs the rank of every query's first relevant candidate, but " + unranked
                            + " queries (first: '" + first + "') have none within their scored depth (data depth "
                            + data.depth() + ")" + (id.equals("mrr") ? "; mrr with k <= " + data.depth() + " is computable" : "");
                }
            }
            default -> { }
        }
        return null;
    }

    /** Binds the metric to the data; see the class comment for definitions. */
    public static RetrievalMeasure prepare(String id, Map<String, String> params, RetrievalData data) {
        if (id.equals("rsum")) {
            throw new IllegalArgumentException("rsum sums both directions: call RetrievalMetrics.rsum(a, b)");
        }
        String why = whyNotComputable(id, params, data);
        if (why != null) return RetrievalMeasure.notComputable(why);
        Integer k = k(id, params);
        int n = data.queries();
        if (id.equals("recall_at_k")) {
            boolean[] hit = new boolean[n];
            int[] cell = new int[n];
            for (int q = 0; q < n; q++) {
                hit[q] = data.firstRank(q) <= k;
                cell[q] = hit[q] ? 1 : 0;
            }
            CellStatistic s = new CellStatistic(new OneHotUnitTable(cell, 2), sums -> {
                double total = sums[0] + sums[1];
                return total == 0 ? Double.NaN : sums[1] / total;
            });
            return new RetrievalMeasure(s, hit, null);
        }
        double[] perQuery = new double[n];
        for (int q = 0; q < n; q++) perQuery[q] = perQuery(id, k, data.relevantRanks()[q]);
        if (id.equals("median_rank")) return new RetrievalMeasure(new WeightedMedian(perQuery), null, null);
        return new RetrievalMeasure(UnitMean.statistic(perQuery), null, null);
    }

    /** One query's contribution (its statistic) to a mean-over-queries metric. */
    static double perQuery(String id, Integer k, double[] ranks) {
        int r = ranks.length;
        double first = ranks[0];
        return switch (id) {
            case "relevant_recall_at_k" -> countAtMost(ranks, k) / (double) r;
            case "r_precision" -> countAtMost(ranks, r) / (double) r;
            case "mrr" -> (k != null && first > k) || Double.isInfinite(first) ? 0 : 1 / first;
            case "mean_rank", "median_rank" -> first;
            case "ndcg_at_k" -> {
                double dcg = 0;
                for (double x : ranks) if (x <= k) dcg += 1 / log2(x + 1);
                double ideal = 0;
                for (int j = 1; j <= Math.min(r, k); j++) ideal += 1 / log2(j + 1);
                yield dcg / ideal;
            }
            case "map_at_k" -> {
                double sum = 0;
                for (int i = 0; i < r && ranks[i] <= k; i++) sum += (i + 1) / ranks[i];
                yield sum / Math.min(r, k);
            }
            default -> throw new IllegalArgumentException(id);
        };
    }

    /**
     * R@1 + R@5 + R@10 of direction {@code a} plus the same of direction {@code b},
     * on the fraction scale (0 to 6; a table's "425.7" is 4.257 with scale percent), like every value assay computes.
     *
     * <p>Resampling: the units are a's queries followed by b's queries (weights in that order),
     * resampled together. Each direction's recalls are weighted means over its own queries, so a
     * resample's value is a ratio per direction; to first order this matches resampling each
     * direction on its own. The two query sets are treated as independent samples: when they are
     * linked (captions of the same images), the interval ignores that dependence.
     */
    public static RetrievalMeasure rsum(RetrievalData a, RetrievalData b) {
        for (RetrievalData d : List.of(a, b)) {
            String why = rsumDepth(d);
            if (why != null) return RetrievalMeasure.notComputable(why);
        }
        int na = a.queries();
        UnitTable table = new UnitTable() {
            @Override public int units() { return na + b.queries(); }
            @Override public int width() { return 8; }
            @Override
            public void addUnit(int i, double weight, double[] sums) {
                boolean inA = i < na;
                double first = inA ? a.firstRank(i) : b.firstRank(i - na);
                int base = inA ? 0 : 4;
                if (first <= 1) sums[base] += weight;
                if (first <= 5) sums[base + 1] += weight;
                if (first <= 10) sums[base + 2] += weight;
                sums[base + 3] += weight;
            }
        };
        SumStatistic s = new SumStatistic(table, sums -> {
            if (sums[3] == 0 || sums[7] == 0) return Double.NaN;
            return ((sums[0] + sums[1] + sums[2]) / sums[3] + (sums[4] + sums[5] + sums[6]) / sums[7]);
        });
        return new RetrievalMeasure(s, null, null);
    }

    private static String rsumDepth(RetrievalData d) {
        return d.depth() < 10 ? "rsum needs recall at 10, but the " + d.direction() + " direction is scored only to depth "
                + d.depth() : null;
    }

    private static String beyondDepth(String id, int k, RetrievalData data) {
        if (k <= data.depth()) return null;
        int q = 0;
        while (data.scoredDepth()[q] != data.depth()) q++;
        String where = data.depth() == data.candidates()
                ? "there are only " + data.candidates() + " candidates"
                : "the ranking is real only to depth " + data.depth() + " (query '" + data.queryIds().get(q)
                        + "' has " + data.depth() + " scored candidates" + (data.sentinel() != null
                        ? ", the rest hold the sentinel " + org.assay.data.retrieval.SentinelRule.plain(data.sentinel()) : "") + ")";
        return id + " at k = " + k + " is not computable: " + where;
    }

    private static void requireKnown(String id) {
        if (!DEFINITIONS.containsKey(id)) {
            throw UserInputException.usage("unknown retrieval metric '" + id + "'", "use one of " + String.join(", ", ids()));
        }
    }

    private static void checkParams(String id, Map<String, String> params) {
        for (String p : params.keySet()) {
            if (!PARAMS.get(id).contains(p)) {
                throw UserInputException.usage("metric " + id + " takes no parameter '" + p + "'",
                        PARAMS.get(id).isEmpty() ? "remove it" : "allowed: " + String.join(", ", PARAMS.get(id)));
            }
        }
    }

    /** The k parameter: required for the *_at_k metrics, optional for mrr, absent otherwise. */
    private static Integer k(String id, Map<String, String> params) {
        String text = params.get("k");
        if (text == null) {
            if (id.endsWith("_at_k")) {
                throw UserInputException.usage("metric " + id + " needs parameter k", "for example params: {k: 10}");
            }
            return null;
        }
        int k;
        try {
            k = Integer.parseInt(text.trim());
        } catch (NumberFormatException e) {
            throw UserInputException.usage(id + " parameter k is not an integer: '" + text + "'", "use k: 10");
        }
        if (k < 1) throw UserInputException.usage(id + " parameter k must be at least 1, not " + k, "use k: 10");
        return k;
    }

    private static int countAtMost(double[] sortedRanks, double limit) {
        int c = 0;
        while (c < sortedRanks.length && sortedRanks[c] <= limit) c++;
        return c;
    }


    private static double log2(double x) { return Math.log(x) / Math.log(2); }
}
