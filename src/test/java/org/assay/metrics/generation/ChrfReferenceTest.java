package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.generation.GenerationData;
import org.junit.jupiter.api.Test;

/**
 * chrF and chrF++ against generation_reference.py: per-order counts and single-order scores from
 * NLTK 3.8 (nltk.translate.chrf_score), the corpus value computed there from NLTK's building
 * blocks with Popović's averaging, and the difference from NLTK's corpus_chrf.
 */
class ChrfReferenceTest {
    private static final JsonNode CHRF = GenerationReference.DOC.get("chrf");

    @Test
    void corpusChrfMatchesPopovicAveragingOverSummedCounts() {
        int compared = 0;
        for (JsonNode c : CHRF.get("cases")) {
            GenerationData data = GenerationReference.corpus(c.get("corpus").asText());
            double ours = GenerationReference.value("chrf", GenerationReference.params(c.get("params")), data);
            assertThat(ours).as(c.toString()).isCloseTo(c.get("expected").asDouble(), within(1e-9));
            compared++;
        }
        assertThat(compared).isEqualTo(14);
    }

    @Test
    void perItemCountsAreNltkMatchesAndNgramCounts() {
        // NLTK 3.8 chrf_precision_recall_fscore_support(...)[3] (matches) and nltk.util.ngrams counts,
        // characters 1..6 without whitespace, then words 1..2
        GenerationData data = GenerationReference.corpus("chrf_single");
        JsonNode items = CHRF.get("single_order");
        for (int i = 0; i < data.size(); i++) {
            int[] row = ChrfCounts.of(ChrfCounts.Prepared.of(data.hypotheses().get(i), false),
                    ChrfCounts.Prepared.of(data.references().get(i).get(0), false), 6, 2);
            JsonNode counts = items.get(i).get("counts");
            for (int j = 0; j < 8; j++) {
                for (int k = 0; k < 3; k++) {
                    assertThat(row[3 * j + k]).as("item %d order %d column %d", i, j, k).isEqualTo(counts.get(j).get(k).asInt());
                }
            }
        }
    }

    @Test
    void oneOrderOfOneSentenceEqualsNltkSentenceChrf() {
        // NLTK 3.8 sentence_chrf(ref, hyp, min_len=n, max_len=n, beta=2): where the definitions coincide.
        // (NLTK returns 1e-16 when the F-score is 0/0, we return 0: inside the tolerance.)
        GenerationData data = GenerationReference.corpus("chrf_single");
        JsonNode items = CHRF.get("single_order");
        ChrfScore oneOrder = new ChrfScore(1, 2);
        for (int i = 0; i < data.size(); i++) {
            JsonNode counts = items.get(i).get("counts");
            for (int n = 1; n <= 6; n++) {
                JsonNode c = counts.get(n - 1);
                double ours = oneOrder.value(new double[] {c.get(0).asDouble(), c.get(1).asDouble(), c.get(2).asDouble()});
                assertThat(ours).as("item %d order %d", i, n)
                        .isCloseTo(items.get(i).get("sentence_chrf").get(n - 1).asDouble(), within(1e-9));
            }
        }
        JsonNode one = CHRF.get("one_sentence_one_order");
        GenerationData single = new GenerationData(Path.of("one.jsonl"), List.of("1"),
                List.of(one.get("hypothesis").asText()), List.of(List.of(one.get("reference").asText())),
                List.of());
        assertThat(GenerationReference.value("chrf", Map.of("char_order", "1"), single))
                .isCloseTo(one.get("nltk_sentence_chrf_order1").asDouble(), within(1e-9));
    }

    @Test
    void nltkCorpusChrfAveragesPerSentenceFScoresAndSoDiffers() {
        // NLTK 3.8 corpus_chrf(min_len=1, max_len=6, beta=2): mean over sentences and orders of F-scores;
        // ours: one F-score of precision and recall averaged over orders of the summed counts
        JsonNode nltk = CHRF.get("nltk_corpus_chrf");
        double ours = GenerationReference.value("chrf", GenerationReference.params(nltk.get("params")),
                GenerationReference.corpus(nltk.get("corpus").asText()));
        assertThat(Math.abs(ours - nltk.get("nltk").asDouble())).isGreaterThan(1e-3);
    }

    @Test
    void withSeveralReferencesAnItemUsesTheOneWithTheBestSentenceChrf() {
        // follows from the definition: adding a worse reference changes nothing, a perfect one gives 1
        GenerationData one = new GenerationData(Path.of("x.jsonl"), List.of("a"),
                List.of("the blue train"), List.of(List.of("the blue trains")), List.of());
        GenerationData worse = new GenerationData(one.source(), one.ids(), one.hypotheses(),
                List.of(List.of("zzz qqq", "the blue trains")), List.of());
        GenerationData perfect = new GenerationData(one.source(), one.ids(), one.hypotheses(),
                List.of(List.of("the blue trains", "the  blue train")), List.of());
        double base = GenerationReference.value("chrf", Map.of(), one);
        assertThat(base).isBetween(0.5, 1.0);
        assertThat(GenerationReference.value("chrf", Map.of(), worse)).isEqualTo(base);
        assertThat(GenerationReference.value("chrf", Map.of("word_order", "2"), perfect)).isEqualTo(1.0);
    }

    @Test
    void ordersWithoutNgramsLeaveTheAverages() {
        // hypothesis "ab" has no 3..6-grams: its precision averages orders 1 and 2 only (ChrfScore javadoc);
        // here both match exactly, so chrP = 1, while recall averages the orders 1..3 the reference "abc" has
        ChrfScore score = new ChrfScore(6, 2);
        double[] sums = {2, 2, 3, 1, 1, 2, 0, 0, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0};
        double p = 1, r = (2.0 / 3 + 1.0 / 2 + 0) / 3;
        assertThat(score.value(sums)).isCloseTo(5 * p * r / (4 * p + r), within(1e-15));
        assertThat(score.value(new double[18])).isZero();
    }

    @Test
    void settingsLineAndParameterErrors() {
        GenerationData data = GenerationReference.corpus("chrf_multi");
        assertThat(GenerationMetrics.prepare("chrf", Map.of("word_order", "2"), data).configuration())
                .isEqualTo("char_order=6 word_order=2 beta=2 lowercase=false refs=1-3");
        assertThat(GenerationMetrics.prepare("chrf", Map.of("beta", "0.5"), data).configuration())
                .startsWith("char_order=6 word_order=0 beta=0.5 ");
        assertThatThrownBy(() -> GenerationMetrics.prepare("chrf", Map.of("char_order", "0"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("both 0");
        assertThatThrownBy(() -> GenerationMetrics.prepare("chrf", Map.of("beta", "two"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("beta");
    }
}
