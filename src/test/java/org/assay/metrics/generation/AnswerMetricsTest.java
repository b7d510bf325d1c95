package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;
import org.junit.jupiter.api.Test;

/**
 * Exact match and token F1 with the SQuAD v1.1 answer normalisation (Rajpurkar et al. 2016, EMNLP;
 * the convention as recalled from memory). generation_reference.py applies the same convention
 * with Python's str and re, so these tests check that the Java code treats Unicode text as Python does.
 */
class AnswerMetricsTest {
    private static final JsonNode ANSWERS = GenerationReference.DOC.get("answers");

    @Test
    void normalisationMatchesPythonOnTheReferenceTexts() {
        for (JsonNode c : ANSWERS.get("normalized")) {
            assertThat(AnswerNormalizer.normalize(c.get("text").asText())).as(c.get("text").asText())
                    .isEqualTo(c.get("normalized").asText());
        }
    }

    @Test
    void normalisationOnHandExamples() {
        // SQuAD v1.1 convention (from memory): lower-case, drop ASCII punctuation, drop a/an/the, collapse spaces
        assertThat(AnswerNormalizer.normalize("  The Blue-Train!  ")).isEqualTo("bluetrain");
        assertThat(AnswerNormalizer.normalize("An apple, a pear and THE plum")).isEqualTo("apple pear and plum");
        assertThat(AnswerNormalizer.normalize("theory anthem another")).isEqualTo("theory anthem another");
        assertThat(AnswerNormalizer.normalize("the’s")).isEqualTo("’s");   // U+2019 is not ASCII punctuation
    }

    @Test
    void wordCharactersAreThoseOfPythonRegexW() {
        // Python 3.11 re.match(r"\w", chr(cp)) for every code point (generation_reference.py, "word_characters"),
        // compared where Java 17 assigns the code point (Python's Unicode is newer)
        JsonNode ranges = GenerationReference.DOC.get("word_characters");
        boolean[] python = new boolean[Character.MAX_CODE_POINT + 1];
        for (JsonNode r : ranges) for (int cp = r.get(0).asInt(); cp <= r.get(1).asInt(); cp++) python[cp] = true;
        int compared = 0;
        for (int cp = 0; cp <= Character.MAX_CODE_POINT; cp++) {
            if (Character.getType(cp) == Character.UNASSIGNED) continue;
            assertThat(AnswerNormalizer.isWordCharacter(cp)).as("U+%04X", cp).isEqualTo(python[cp]);
            compared++;
        }
        assertThat(compared).isGreaterThan(100_000);
    }

    @Test
    void exactMatchIsACountMetricWithTheReferenceSuccesses() {
        GenerationData data = GenerationReference.items(ANSWERS.get("items"));
        JsonNode em = ANSWERS.get("exact_match");
        GenerationMeasure normalized = GenerationMetrics.prepare("exact_match", Map.of(), data);
        assertThat(normalized.successes()).isEqualTo(em.get("normalize").asLong());
        assertThat(normalized.statistic().estimate()).isCloseTo(em.get("normalize").asDouble() / em.get("items").asDouble(), within(1e-15));
        assertThat(normalized.configuration()).isEqualTo("normalize=true refs=1-3");
        GenerationMeasure raw = GenerationMetrics.prepare("exact_match", Map.of("normalize", "false"), data);
        assertThat(raw.successes()).isEqualTo(em.get("raw").asLong()).isLessThan(normalized.successes());
        assertThat(GenerationMetrics.all().stream().filter(i -> i.id().equals("exact_match")).findFirst().orElseThrow().kind())
                .isEqualTo(MetricKind.COUNT);
    }

    @Test
    void tokenF1IsTheMeanOfTheBestF1PerItem() {
        GenerationData data = GenerationReference.items(ANSWERS.get("items"));
        JsonNode f1 = ANSWERS.get("token_f1");
        assertThat(GenerationReference.value("token_f1", Map.of(), data)).isCloseTo(f1.get("normalize").asDouble(), within(1e-12));
        assertThat(GenerationReference.value("token_f1", Map.of("normalize", "false"), data)).isCloseTo(f1.get("raw").asDouble(), within(1e-12));
    }

    @Test
    void tokenF1OnHandExamples() {
        // SQuAD v1.1 f1_score (from memory): P = common/|prediction|, R = common/|answer|, F1 = 2PR/(P+R), 0 without overlap
        GenerationData d = new GenerationData(Path.of("a.jsonl"), List.of("1", "2", "3"),
                List.of("the blue train", "", "old old mill"),
                List.of(List.of("blue trains", "a red train"), List.of("anything"), List.of("the old mill")), List.of());
        // item 1: best of {blue}/{blue trains} = 0.5 and {train}/{red train} = 0.5; item 2: 0; item 3: common 2, P 2/3, R 1 -> 0.8
        assertThat(GenerationReference.value("token_f1", Map.of(), d)).isCloseTo((0.5 + 0 + 0.8) / 3, within(1e-15));
    }
}
