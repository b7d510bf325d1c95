package org.assay.metrics.retrieval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.data.retrieval.RetrievalData;
import org.assay.data.retrieval.RetrievalFixtures;
import org.assay.data.retrieval.TiePolicy;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * Every retrieval metric, on ranks this project computes from the .npy fixtures, against the values
 * retrieval_reference.py computes with NumPy from its own orderings (numpy.lexsort, scipy.stats.rankdata),
 * per tie policy, unweighted and with integer query weights (numpy.repeat); nDCG@K and mAP against
 * scikit-learn's ndcg_score and average_precision_score on the tie-free case. A null expected value
 * means "not computable" (K beyond the scored depth, or an unranked first relevant candidate).
 */
class RetrievalMetricsReferenceTest {

    @TestFactory
    List<DynamicTest> everyMetricEqualsTheNumpyReference() {
        List<DynamicTest> tests = new ArrayList<>();
        for (JsonNode c : RetrievalFixtures.cases()) {
            for (String side : List.of("rows", "columns")) {
                JsonNode dir = c.get("directions").get(side);
                int[] weights = ints(dir.get("weights"));
                for (TiePolicy ties : TiePolicy.values()) {
                    JsonNode ref = dir.get("policies").get(ties.name());
                    tests.add(DynamicTest.dynamicTest(c.get("name").asText() + " " + side + " " + ties, () -> {
                        RetrievalData data = RetrievalFixtures.rank(c, side, ties);
                        int checked = 0;
                        for (Iterator<Map.Entry<String, JsonNode>> it = ref.get("expected").fields(); it.hasNext(); ) {
                            Map.Entry<String, JsonNode> e = it.next();
                            String key = e.getKey();
                            String id = key.contains(":") ? key.substring(0, key.indexOf(':')) : key;
                            RetrievalMeasure m = RetrievalMetrics.prepare(id, params(key), data);
                            JsonNode weighted = ref.get("expected_weighted").get(key);
                            if (e.getValue().isNull()) {
                                assertThat(m.computable()).as(key + " is not computable").isFalse();
                                assertThat(weighted.isNull()).isTrue();
                            } else {
                                assertThat(m.value()).as(key).isCloseTo(e.getValue().asDouble(), within(1e-12));
                                assertThat(m.statistic().value(weights)).as(key + " weighted")
                                        .isCloseTo(weighted.asDouble(), within(1e-12));
                            }
                            checked++;
                        }
                        assertThat(checked).isEqualTo(34);   // every metric at every K the script lists
                    }));
                }
            }
        }
        return tests;
    }

    @Test
    void rsumEqualsTheReferenceInPercentPointsOverOneHundred() {
        // the reference states rsum in percent points (0-600); assay keeps every value on the fraction scale
        for (JsonNode c : RetrievalFixtures.cases()) {
            for (TiePolicy ties : TiePolicy.values()) {
                JsonNode expected = c.get("rsum").get(ties.name());
                RetrievalMeasure m = RetrievalMetrics.rsum(RetrievalFixtures.rank(c, "rows", ties),
                        RetrievalFixtures.rank(c, "columns", ties));
                if (expected.isNull()) {
                    assertThat(m.computable()).isFalse();
                    assertThat(m.notComputable()).contains("recall at 10");
                } else {
                    assertThat(m.value() * 100).isCloseTo(expected.asDouble(), within(1e-9));
                }
            }
        }
    }

    @Test
    void ndcgAndAveragePrecisionEqualScikitLearnOnTieFreeScores() {
        // sklearn 1.2.1 ndcg_score(y_true, y_score, k) and mean average_precision_score per query
        JsonNode c = RetrievalFixtures.cases().get(2);
        JsonNode sk = c.get("sklearn_rows").get("expected");
        for (TiePolicy ties : TiePolicy.values()) {
            RetrievalData data = RetrievalFixtures.rank(c, "rows", ties);
            for (Iterator<Map.Entry<String, JsonNode>> it = sk.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                if (e.getKey().equals("map_full")) {
                    double v = RetrievalMetrics.prepare("map_at_k", Map.of("k", Integer.toString(data.candidates())), data).value();
                    assertThat(v).isCloseTo(e.getValue().asDouble(), within(1e-12));
                } else {
                    double v = RetrievalMetrics.prepare("ndcg_at_k", params(e.getKey()), data).value();
                    assertThat(v).as(e.getKey()).isCloseTo(e.getValue().asDouble(), within(1e-12));
                }
            }
        }
    }

    @Test
    void withTiesScikitLearnsNdcgLiesBetweenThePessimisticAndOptimisticValues() {
        // sklearn's ndcg_score averages the gain over each tie group (expected DCG under random tie-breaking)
        JsonNode c = RetrievalFixtures.cases().get(1);
        JsonNode sk = c.get("sklearn_rows").get("expected");
        RetrievalData low = RetrievalFixtures.rank(c, "rows", TiePolicy.PESSIMISTIC);
        RetrievalData high = RetrievalFixtures.rank(c, "rows", TiePolicy.OPTIMISTIC);
        int strictly = 0;
        for (int k : new int[] {1, 3, 5, 10}) {
            double ref = sk.get("ndcg_at_k:k=" + k).asDouble();
            double lo = RetrievalMetrics.prepare("ndcg_at_k", Map.of("k", "" + k), low).value();
            double hi = RetrievalMetrics.prepare("ndcg_at_k", Map.of("k", "" + k), high).value();
            assertThat(ref).isBetween(lo - 1e-12, hi + 1e-12);
            if (lo < ref - 1e-9 && ref < hi - 1e-9) strictly++;
        }
        assertThat(strictly).as("the ties matter in this case").isPositive();
    }

    @Test
    void aKBeyondTheScoredDepthIsNeverScored() {
        // groups case: the columns direction is real only to depth 7 (the sentinel fills the rest)
        RetrievalData cols = RetrievalFixtures.rank(RetrievalFixtures.cases().get(0), "columns", TiePolicy.DEFAULT);
        assertThat(cols.depth()).isEqualTo(7);
        assertThat(RetrievalMetrics.prepare("recall_at_k", Map.of("k", "7"), cols).computable()).isTrue();
        RetrievalMeasure beyond = RetrievalMetrics.prepare("recall_at_k", Map.of("k", "8"), cols);
        assertThat(beyond.computable()).isFalse();
        assertThat(beyond.notComputable()).contains("k = 8", "depth 7", "sentinel -100");
        assertThat(beyond.statistic()).isNull();
    }

    private static Map<String, String> params(String key) {
        Map<String, String> p = new LinkedHashMap<>();
        int colon = key.indexOf(':');
        if (colon >= 0) {
            for (String kv : key.substring(colon + 1).split(";")) p.put(kv.substring(0, kv.indexOf('=')), kv.substring(kv.indexOf('=') + 1));
        }
        return p;
    }

    private static int[] ints(JsonNode a) {
        int[] out = new int[a.size()];
        for (int i = 0; i < out.length; i++) out[i] = a.get(i).asInt();
        return out;
    }
}
