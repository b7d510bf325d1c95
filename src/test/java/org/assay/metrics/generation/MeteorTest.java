package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.generation.GenerationData;
import org.junit.jupiter.api.Test;

/** METEOR on examples hand-derived from NLTK 3.8's meteor_score algorithm, its documented example, and its settings. */
class MeteorTest {

    @Test
    void nltksDocumentedExample() {
        // the doctest of nltk.translate.meteor_score.single_meteor_score (NLTK 3.8): 0.6944 to 4 places
        String hyp = "It is a guide to action which ensures that the military always obeys the commands of the party";
        String ref = "It is a guide to action that ensures that the military will forever heed Party commands";
        assertThat(item(Map.of(), hyp, ref)).isCloseTo(0.6944, within(0.00005));
    }

    @Test
    void oneGapMakesTwoChunks() {
        // hand-derived: "the cat sat on the mat" against "the cat was on the mat": exact matches
        // the, cat, on, the, mat (m = 5 of 6 on each side), "sat"/"was" share no stem or synonym;
        // chunks "the cat" and "on the mat": 2. P = R = 5/6, F_mean = 5/6,
        // penalty = 0.5 (2/5)^3 = 0.032, score = 5/6 * 0.968
        assertThat(item(Map.of(), "the cat sat on the mat", "the cat was on the mat"))
                .isCloseTo(5.0 / 6 * 0.968, within(1e-12));
    }

    @Test
    void greedyAlignmentCanScatterWords() {
        // hand-derived from NLTK's greedy order (last hypothesis word first, each to the last
        // free equal reference word): "on the mat sat the cat" against "the cat sat on the mat"
        // aligns (0,3) (1,0) (2,5) (3,2) (4,4) (5,1): six chunks of one word, P = R = 1,
        // penalty = 0.5 (6/6)^3, score 0.5 (a minimum-crossing alignment would do no better here)
        assertThat(item(Map.of(), "on the mat sat the cat", "the cat sat on the mat")).isCloseTo(0.5, within(1e-12));
    }

    @Test
    void stemAndSynonymStagesMatchWhatExactMatchingMisses() {
        // hand-derived: "boats" and "boat" share the Porter stem "boat"; identical order, one chunk:
        // P = R = 1, penalty 0.5 (1/2)^3 = 1/16
        assertThat(item(Map.of(), "two boats", "two boat")).isCloseTo(1 - 1.0 / 16, within(1e-12));
        // "car" and "auto" are lemma names of one WordNet 3.0 synset (car.n.01): the same score
        assertThat(item(Map.of(), "the car", "the auto")).isCloseTo(1 - 1.0 / 16, within(1e-12));
        // nothing shared: 0
        assertThat(item(Map.of(), "two gulls", "a crane")).isZero();
    }

    @Test
    void lowerCasesAndSplitsOnWhitespaceOnly() {
        // hand-derived: "Boat" matches "boat"; "boat." stays one token and does not match "boat"
        assertThat(item(Map.of(), "The Boat", "the boat")).isCloseTo(1 - 1.0 / 16, within(1e-12));
        assertThat(item(Map.of(), "the boat.", "the boat")).isLessThan(0.6);
        assertThat(item(Map.of(), "", "the boat")).isZero();
    }

    @Test
    void parametersChangeTheFormula() {
        // hand-derived: one match of two words each side (P = R = 1/2), one chunk:
        // alpha only weights P against R, which are equal: F_mean = 1/2; penalty gamma (1/1)^beta
        String hyp = "boat crane", ref = "boat gull";
        assertThat(item(Map.of(), hyp, ref)).isCloseTo(0.5 * (1 - 0.5), within(1e-12));
        assertThat(item(Map.of("gamma", "0.2", "beta", "1", "alpha", "0.5"), hyp, ref)).isCloseTo(0.5 * 0.8, within(1e-12));
        // unequal lengths: P = 1/3, R = 1; alpha = 0.9: F = (1/3) / (0.3 + 0.1) = 5/6
        assertThat(item(Map.of("gamma", "0"), "boat crane gull", "boat")).isCloseTo((1.0 / 3) / (0.9 / 3 + 0.1), within(1e-12));
    }

    @Test
    void anItemScoresItsBestReference() {
        GenerationData data = RougeTest.data(List.of("the cat sat on the mat"),
                List.of(List.of("a dog", "the cat was on the mat", "the cat sat on the mat")));
        assertThat(GenerationMetrics.prepare("meteor", Map.of(), data).statistic().estimate())
                .isCloseTo(1 - 0.5 / 216, within(1e-12));   // identical: one chunk of 6, penalty 0.5 (1/6)^3
    }

    @Test
    void theSettingsLineStatesEverySetting() {
        GenerationData data = RougeTest.data(List.of("a b"), List.of(List.of("a b")));
        assertThat(GenerationMetrics.prepare("meteor", Map.of(), data).configuration())
                .isEqualTo("tokenize=none alpha=0.9 beta=3 gamma=0.5 wordnet=3.0 refs=1");
        assertThat(GenerationMetrics.prepare("meteor", Map.of("alpha", "0.85", "beta", "2.5"), data).configuration())
                .isEqualTo("tokenize=none alpha=0.85 beta=2.5 gamma=0.5 wordnet=3.0 refs=1");
    }

    @Test
    void badParametersAreUserErrors() {
        GenerationData data = RougeTest.data(List.of("a"), List.of(List.of("a")));
        assertThatThrownBy(() -> GenerationMetrics.prepare("meteor", Map.of("alpha", "1.5"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("alpha");
        assertThatThrownBy(() -> GenerationMetrics.prepare("meteor", Map.of("tokenize", "words"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("tokenizer");
        assertThatThrownBy(() -> GenerationMetrics.prepare("meteor", Map.of("wordnet", "3.1"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("wordnet");
        assertThatThrownBy(() -> GenerationMetrics.prepare("meteor", Map.of("stem", "true"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("stem");
    }

    private static double item(Map<String, String> params, String hyp, String ref) {
        return GenerationMetrics.prepare("meteor", params, RougeTest.data(List.of(hyp), List.of(List.of(ref))))
                .statistic().estimate();
    }
}
