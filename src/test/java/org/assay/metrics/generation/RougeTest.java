package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.generation.GenerationData;
import org.junit.jupiter.api.Test;

/** ROUGE on worked examples: Lin (2004)'s own, and small ones hand-derived from its definitions. */
class RougeTest {
    // Lin (2004) §3.1's example sentences (from memory): S1 is the reference
    private static final String S1 = "police killed the gunman";
    private static final String S2 = "police kill the gunman";
    private static final String S3 = "the gunman kill police";

    @Test
    void linsRougeLExample() {
        // Lin (2004) §3.1 (from memory): against S1, S2 has ROUGE-L 3/4 (LCS "police the gunman")
        // and S3 has 2/4 (LCS "the gunman"); P = R there, so the F-measure is the same number
        assertThat(item("rouge_l", Map.of(), S2, S1)).isCloseTo(3.0 / 4, within(1e-15));
        assertThat(item("rouge_l", Map.of(), S3, S1)).isCloseTo(2.0 / 4, within(1e-15));
    }

    @Test
    void linsExampleUnderRougeNHandDerived() {
        // hand-derived from Lin 2004's definition: S1's bigrams {police killed, killed the, the
        // gunman}; S2 and S3 each share only "the gunman": 1/3 each, the point of Lin's example
        assertThat(item("rouge_2", Map.of(), S2, S1)).isCloseTo(1.0 / 3, within(1e-15));
        assertThat(item("rouge_2", Map.of(), S3, S1)).isCloseTo(1.0 / 3, within(1e-15));
        // unigrams: S2 shares police, the, gunman (3 of 4); S3 the same three words
        assertThat(item("rouge_1", Map.of(), S2, S1)).isCloseTo(3.0 / 4, within(1e-15));
        assertThat(item("rouge_1", Map.of(), S3, S1)).isCloseTo(3.0 / 4, within(1e-15));
    }

    @Test
    void stemmingMakesKillAndKilledOneToken() {
        // hand-derived: Porter (1980) step 1b turns "killed" into "kill", so S2 equals S1
        Map<String, String> stem = Map.of("stem", "true");
        assertThat(item("rouge_l", stem, S2, S1)).isEqualTo(1.0);
        assertThat(item("rouge_2", stem, S2, S1)).isEqualTo(1.0);
        // S3 gains "kill" as a unigram; its LCS stays 2 ("the gunman": "kill" comes after "police" in S1)
        assertThat(item("rouge_1", stem, S3, S1)).isEqualTo(1.0);
        assertThat(item("rouge_l", stem, S3, S1)).isCloseTo(2.0 / 4, within(1e-15));
    }

    @Test
    void countsAreClippedAndPrecisionRecallDiffer() {
        // hand-derived from Lin 2004's definition: hypothesis "the the the the boat" (5 unigrams),
        // reference "the boat and the crane" (5): "the" counts min(4, 2) = 2, "boat" 1, overlap 3
        String hyp = "the the the the boat", ref = "the boat and the crane";
        assertThat(item("rouge_1", Map.of("measure", "precision"), hyp, ref)).isCloseTo(3.0 / 5, within(1e-15));
        assertThat(item("rouge_1", Map.of("measure", "recall"), hyp, ref)).isCloseTo(3.0 / 5, within(1e-15));
        // bigrams: hyp {the the x3, the boat}, ref {the boat, boat and, and the, the crane}: overlap 1
        // P = 1/4, R = 1/4; LCS "the boat" or "the ... the": 2 -> P = 2/5, R = 2/5
        assertThat(item("rouge_2", Map.of(), hyp, ref)).isCloseTo(1.0 / 4, within(1e-15));
        assertThat(item("rouge_l", Map.of(), hyp, ref)).isCloseTo(2.0 / 5, within(1e-15));
        // unequal lengths: "boat" against "the boat sails": P = 1, R = 1/3, F = 2 * 1/3 / (4/3) = 1/2
        assertThat(item("rouge_1", Map.of("measure", "precision"), "boat", "the boat sails")).isEqualTo(1.0);
        assertThat(item("rouge_1", Map.of("measure", "recall"), "boat", "the boat sails")).isCloseTo(1.0 / 3, within(1e-15));
        assertThat(item("rouge_1", Map.of(), "boat", "the boat sails")).isCloseTo(0.5, within(1e-15));
    }

    @Test
    void anItemScoresItsBestReference() {
        // hand-derived: against "the crane" ROUGE-1 F is 0; against "the boat sails" it is 1
        GenerationData data = data(List.of("the boat sails"), List.of(List.of("a crane", "the boat sails", "boat")));
        assertThat(GenerationMetrics.prepare("rouge_1", Map.of(), data).statistic().estimate()).isEqualTo(1.0);
        // the maximum is taken of the reported measure: recall is best against "boat" (1/1)
        GenerationData data2 = data(List.of("the boat sails"), List.of(List.of("boat", "the boat sails at dusk")));
        assertThat(GenerationMetrics.prepare("rouge_1", Map.of("measure", "recall"), data2).statistic().estimate()).isEqualTo(1.0);
        assertThat(GenerationMetrics.prepare("rouge_1", Map.of("measure", "precision"), data2).statistic().estimate()).isEqualTo(1.0);
        assertThat(GenerationMetrics.prepare("rouge_1", Map.of(), data2).statistic().estimate())
                .isCloseTo(Math.max(2 * (1.0 / 3) / (1 + 1.0 / 3), 2 * 0.6 / 1.6), within(1e-15));
    }

    @Test
    void tokensAreLowerCasedRunsOfLettersAndDigits() {
        // punctuation, apostrophes and hyphens separate; digits and accented letters stay in words
        RougeSettings plain = new RougeSettings(RougeMeasure.F, false, true);
        assertThat(plain.tokens("The Ferry's 2nd run -- at 18:40, to Zürich!", new PorterStemming()))
                .containsExactly("the", "ferry", "s", "2nd", "run", "at", "18", "40", "to", "zürich");
        RougeSettings cased = new RougeSettings(RougeMeasure.F, false, false);
        assertThat(cased.tokens("The BOAT", new PorterStemming())).containsExactly("The", "BOAT");
        assertThat(item("rouge_1", Map.of("lowercase", "false"), "The BOAT", "the boat")).isEqualTo(0.0);
        assertThat(item("rouge_1", Map.of(), "The BOAT", "the boat")).isEqualTo(1.0);
    }

    @Test
    void emptyTextsScoreZero() {
        // common practice: a hypothesis with no tokens matches nothing
        assertThat(item("rouge_1", Map.of(), "", "the boat")).isEqualTo(0.0);
        assertThat(item("rouge_l", Map.of(), "... !", "the boat")).isEqualTo(0.0);
        assertThat(item("rouge_2", Map.of(), "boat", "boat")).isEqualTo(0.0);   // no bigrams on either side
    }

    @Test
    void theSettingsLineStatesEverySetting() {
        GenerationData data = data(List.of("a", "b"), List.of(List.of("a"), List.of("b", "c")));
        assertThat(GenerationMetrics.prepare("rouge_l", Map.of(), data).configuration())
                .isEqualTo("measure=f stem=false lowercase=true refs=1-2");
        assertThat(GenerationMetrics.prepare("rouge_2", Map.of("stem", "yes", "measure", "Recall"), data).configuration())
                .isEqualTo("measure=recall stem=true lowercase=true refs=1-2");
    }

    @Test
    void badParametersAreUserErrorsNamingTheParameter() {
        GenerationData data = data(List.of("a"), List.of(List.of("a")));
        assertThatThrownBy(() -> GenerationMetrics.prepare("rouge_1", Map.of("measure", "f2"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("measure").hasMessageContaining("precision");
        assertThatThrownBy(() -> GenerationMetrics.prepare("rouge_l", Map.of("stem", "porter"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("stem");
        assertThatThrownBy(() -> GenerationMetrics.prepare("rouge_2", Map.of("beta", "2"), data))
                .isInstanceOf(UserInputException.class).hasMessageContaining("beta");
    }

    @Test
    void lcsByTwoRowsMatchesTheDefinitionOnSmallCases() {
        // LCS(ABCBDAB, BDCABA) = 4 (e.g. BCBA): Cormen et al., Introduction to Algorithms, §15.4 (from memory)
        List<String> a = List.of("a", "b", "c", "b", "d", "a", "b"), b = List.of("b", "d", "c", "a", "b", "a");
        assertThat(RougeL.lcs(a, b)).isEqualTo(4);
        assertThat(RougeL.lcs(b, a)).isEqualTo(4);
        assertThat(RougeL.lcs(a, List.of())).isZero();
    }

    private static double item(String metric, Map<String, String> params, String hyp, String ref) {
        return GenerationMetrics.prepare(metric, params, data(List.of(hyp), List.of(List.of(ref)))).statistic().estimate();
    }

    static GenerationData data(List<String> hyps, List<List<String>> refs) {
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < hyps.size(); i++) ids.add("s" + i);
        return new GenerationData(Path.of("outputs.jsonl"), ids, hyps, refs, List.of());
    }
}
