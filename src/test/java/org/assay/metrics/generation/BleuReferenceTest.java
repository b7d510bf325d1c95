package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import java.util.stream.StreamSupport;
import org.assay.common.UserInputException;
import org.assay.data.generation.GenerationData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Corpus and sentence BLEU against NLTK 3.8's nltk.translate.bleu_score (generation_reference.py),
 * on raw texts, so each value also exercises the tokenizer; plus the published worked examples.
 */
class BleuReferenceTest {
    private static final JsonNode DOC = GenerationReference.DOC;

    static Stream<Arguments> bleuCases() { return cases("bleu"); }

    static Stream<Arguments> sentenceCases() { return cases("sentence_bleu"); }

    private static Stream<Arguments> cases(String section) {
        return StreamSupport.stream(DOC.get(section).spliterator(), false)
                .map(c -> Arguments.of(c.get("corpus").asText() + " " + c.get("params"), c));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("bleuCases")
    void corpusBleuMatchesTheReference(String name, JsonNode c) {
        // generation_reference.py: NLTK corpus_bleu where every hypothesis has >= order tokens
        // (checked equal there), else summed_counts_bleu() from NLTK's building blocks
        double ours = GenerationReference.value("bleu", GenerationReference.params(c.get("params")),
                GenerationReference.corpus(c.get("corpus").asText()));
        assertThat(ours).isCloseTo(c.get("expected").asDouble(), within(1e-9));
    }

    @Test
    void nltkCorpusBleuCoincidesWhenNoHypothesisIsShorterThanTheOrder() {
        int compared = 0;
        for (JsonNode c : DOC.get("bleu")) {
            if (!c.get("nltk_coincides").asBoolean() || c.get("expected").asDouble() == 0) continue;
            double ours = GenerationReference.value("bleu", GenerationReference.params(c.get("params")),
                    GenerationReference.corpus(c.get("corpus").asText()));
            assertThat(ours).as(c.toString()).isCloseTo(c.get("nltk_corpus_bleu").asDouble(), within(1e-9));
            compared++;
        }
        assertThat(compared).isGreaterThan(20);
    }

    @Test
    void shortHypothesesMakeNltkCorpusBleuDifferBecauseItCountsOneNgramPerShortHypothesis() {
        // NLTK 3.8 modified_precision: denominator max(1, count) per hypothesis; we sum the true counts
        int compared = 0;
        for (JsonNode c : DOC.get("bleu")) {
            if (!c.get("corpus").asText().equals("short") || c.get("expected").asDouble() == 0) continue;
            double ours = GenerationReference.value("bleu", GenerationReference.params(c.get("params")),
                    GenerationReference.corpus("short"));
            assertThat(c.get("nltk_coincides").asBoolean()).isFalse();
            assertThat(Math.abs(ours - c.get("nltk_corpus_bleu").asDouble())).as(c.toString()).isGreaterThan(1e-4);
            compared++;
        }
        assertThat(compared).isGreaterThan(5);
    }

    @Test
    void aZeroMatchCountWithoutSmoothingGivesExactlyZero() {
        // the "zero_order" corpus has unigram and bigram matches but no 4-gram match
        GenerationData data = GenerationReference.corpus("zero_order");
        Map<String, String> none = Map.of("tokenize", "13a", "smoothing", "none");
        assertThat(GenerationReference.value("bleu", none, data)).isZero();
        assertThat(GenerationReference.value("bleu", Map.of("smoothing", "none", "order", "2"), data)).isPositive();
        // NLTK 3.8 replaces the zero count by sys.float_info.min, giving a tiny positive value instead
        JsonNode nltk = find("bleu", "zero_order", none);
        assertThat(nltk.get("nltk_corpus_bleu").asDouble()).isPositive().isLessThan(1e-70);
        // each smoothing gives a positive value there, as in NLTK 3.8 (methods 1, 2, 3)
        for (String s : List.of("floor", "add_one", "exp")) {
            double ours = GenerationReference.value("bleu", Map.of("tokenize", "13a", "smoothing", s), data);
            assertThat(ours).as(s).isPositive()
                    .isCloseTo(find("bleu", "zero_order", Map.of("tokenize", "13a", "smoothing", s)).get("nltk_corpus_bleu").asDouble(), within(1e-9));
        }
    }

    private static JsonNode find(String section, String corpus, Map<String, String> params) {
        for (JsonNode c : DOC.get(section)) {
            Map<String, String> p = GenerationReference.params(c.get("params"));
            if (c.get("corpus").asText().equals(corpus) && p.get("order").equals(params.getOrDefault("order", "4"))
                    && p.get("lowercase").equals("false") && p.get("tokenize").equals(params.getOrDefault("tokenize", "13a"))
                    && p.get("smoothing").equals(params.get("smoothing"))) {
                return c;
            }
        }
        throw new AssertionError("no reference case " + corpus + " " + params);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("sentenceCases")
    void sentenceBleuIsTheMeanOfNltkSentenceBleu(String name, JsonNode c) {
        // NLTK 3.8 sentence_bleu per item, averaged; per sentence both count max(1, n-grams), so they coincide
        Map<String, String> params = GenerationReference.params(c.get("params"));
        GenerationData data = GenerationReference.corpus(c.get("corpus").asText());
        assertThat(GenerationReference.value("sentence_bleu", params, data)).isCloseTo(c.get("expected").asDouble(), within(1e-9));
        JsonNode perItem = c.get("per_item");
        for (int i = 0; i < data.size(); i++) {
            double one = GenerationReference.value("sentence_bleu", params, data.select(new int[] {i}));
            assertThat(one).as("item %d", i).isCloseTo(perItem.get(i).asDouble(), within(1e-9));
        }
    }

    @Test
    void clippingExampleOfPapineniEtAl2002() {
        // Papineni et al. (2002), ACL, section 2.1 (from memory): candidate "the the the the the the the",
        // references "The cat is on the mat" / "There is a cat on the mat": modified unigram precision 2/7
        // (the paper counts case-insensitively: "the" twice in reference 1).
        List<String> candidate = Tokenizer.NONE.tokens("the the the the the the the", true);
        List<List<String>> refs = List.of(Tokenizer.NONE.tokens("The cat is on the mat", true),
                Tokenizer.NONE.tokens("There is a cat on the mat", true));
        int[] row = BleuCounts.of(candidate, refs, 2);
        assertThat(row[0]).isEqualTo(2);   // matches_1
        assertThat(row[2]).isEqualTo(7);   // totals_1
        assertThat(row[1]).isZero();       // no bigram "the the" in either reference
        // case-sensitive, "The" no longer matches: 1/7 (follows from the definition)
        int[] cased = BleuCounts.of(candidate, List.of(Tokenizer.NONE.tokens("The cat is on the mat", false),
                Tokenizer.NONE.tokens("There is a cat on the mat", false)), 1);
        assertThat(cased[0]).isEqualTo(1);
    }

    @Test
    void candidateOneAndTwoOfPapineniEtAl2002() {
        // Papineni et al. (2002), ACL, section 2.1, Example 1 (sentences and values from memory):
        // unigram precision 17/18 and 8/14, bigram precision 10/17 and 1/13
        List<List<String>> refs = List.of(
                words("It is a guide to action that ensures that the military will forever heed Party commands"),
                words("It is the guiding principle which guarantees the military forces always being under the command of the Party"),
                words("It is the practical guide for the army always to heed the directions of the party"));
        int[] c1 = BleuCounts.of(words("It is a guide to action which ensures that the military always obeys the commands of the party"), refs, 2);
        int[] c2 = BleuCounts.of(words("It is to insure the troops forever hearing the activity guidebook that party direct"), refs, 2);
        assertThat(new int[] {c1[0], c1[2], c1[1], c1[3]}).containsExactly(17, 18, 10, 17);
        assertThat(new int[] {c2[0], c2[2], c2[1], c2[3]}).containsExactly(8, 14, 1, 13);
    }

    private static List<String> words(String text) { return Tokenizer.NONE.tokens(text, false); }

    @Test
    void brevityPenaltyUsesTheClosestReferenceLengthAndTheShorterOnTies() {
        // Papineni et al. (2002) section 2.2.2 (best match length); ties to the shorter as NLTK 3.8 closest_ref_length
        List<List<String>> refs = List.of(words("a b c d e f"), words("a b"), words("a b c d"));
        assertThat(BleuCounts.closestLength(3, refs)).isEqualTo(2);
        assertThat(BleuCounts.closestLength(5, refs)).isEqualTo(4);
        assertThat(BleuCounts.closestLength(9, refs)).isEqualTo(6);
    }

    @Test
    void settingsLineStatesEveryEffectiveSetting() {
        GenerationData data = GenerationReference.corpus("long");
        assertThat(GenerationMetrics.prepare("bleu", Map.of(), data).configuration())
                .isEqualTo("tokenize=13a lowercase=false smoothing=none order=4 refs=1-3");
        assertThat(GenerationMetrics.prepare("sentence_bleu", Map.of("lowercase", "yes", "tokenize", "CHAR"), data).configuration())
                .isEqualTo("tokenize=char lowercase=true smoothing=exp order=4 refs=1-3");
        assertThat(GenerationMetrics.prepare("bleu", Map.of(), GenerationReference.corpus("zero_order")).configuration())
                .endsWith("refs=1");
    }

    @Test
    void badParametersAreUsageErrorsNamingTheParameter() {
        GenerationData data = GenerationReference.corpus("zero_order");
        assertThatThrownBy(() -> GenerationMetrics.prepare("bleu", Map.of("smoothing", "plus_one"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("smoothing").hasMessageContaining("none, floor, add_one, exp");
        assertThatThrownBy(() -> GenerationMetrics.prepare("bleu", Map.of("order", "0"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("order");
        assertThatThrownBy(() -> GenerationMetrics.prepare("bleu", Map.of("tokenize", "intl"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("tokenize");
        assertThatThrownBy(() -> GenerationMetrics.prepare("bleu", Map.of("stem", "true"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("takes no parameter 'stem'");
    }

    @Test
    void anEmptyHypothesisScoresZeroAndIsStillCountedInTheReferenceLength() {
        GenerationData data = GenerationReference.corpus("short");
        assertThat(data.hypotheses().get(0)).isEmpty();
        double one = GenerationReference.value("sentence_bleu", Map.of(), data.select(new int[] {0}));
        assertThat(one).isZero();
        // the empty hypothesis's closest reference length still enters r, lowering the corpus brevity penalty
        CountTable t = BleuSettings.read("bleu", Map.of(), BleuSmoothing.NONE).counts(data);
        int[] row = t.row(0);
        assertThat(row[8]).isZero();
        assertThat(row[9]).isPositive();
    }
}
