package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.assay.data.generation.GenerationData;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;

/**
 * ROUGE and METEOR against src/test/reference/meteor_rouge_reference.py: ROUGE computed in that
 * script from Lin (2004)'s definitions (nltk.util.ngrams, its own LCS table, NLTK 3.8's
 * PorterStemmer ORIGINAL_ALGORITHM), METEOR by NLTK 3.8's nltk.translate.meteor_score with the
 * same stemmer and WordNet 3.0, on seeded invented sentences.
 */
class MeteorRougeReferenceTest {
    private static final JsonNode REF = ReferenceData.load("meteor_rouge.json");

    @Test
    void rougeMatchesTheScriptItemByItemAndOverTheCorpus() {
        for (JsonNode c : REF.get("rouge")) {
            GenerationData data = data(c);
            Map<String, String> params = params(c.get("params"));
            for (String metric : List.of("rouge_1", "rouge_2", "rouge_l")) {
                String what = c.get("name").asText() + " " + metric;
                JsonNode expected = c.get("per_item").get(metric);
                for (int i = 0; i < data.size(); i++) {
                    double item = GenerationMetrics.prepare(metric, params, data.select(new int[] {i})).statistic().estimate();
                    assertThat(item).as("%s item %d", what, i).isCloseTo(expected.get(i).asDouble(), within(1e-12));
                }
                GenerationMeasure corpus = GenerationMetrics.prepare(metric, params, data);
                assertThat(corpus.statistic().estimate()).as(what)
                        .isCloseTo(c.get("corpus").get(metric).asDouble(), within(1e-12));
                assertThat(corpus.configuration()).isEqualTo("measure=" + params.get("measure") + " stem="
                        + params.get("stem") + " lowercase=" + params.get("lowercase") + " refs=1-3");
            }
        }
    }

    @Test
    void meteorMatchesNltkItemByItemAndOverTheCorpus() {
        for (JsonNode c : REF.get("meteor")) {
            GenerationData data = data(c);
            Map<String, String> params = params(c.get("params"));
            JsonNode expected = c.get("per_item");
            for (int i = 0; i < data.size(); i++) {
                double item = GenerationMetrics.prepare("meteor", params, data.select(new int[] {i})).statistic().estimate();
                assertThat(item).as("%s item %d: %s", c.get("name").asText(), i, data.hypotheses().get(i))
                        .isCloseTo(expected.get(i).asDouble(), within(1e-9));
            }
            assertThat(GenerationMetrics.prepare("meteor", params, data).statistic().estimate())
                    .isCloseTo(c.get("corpus").asDouble(), within(1e-9));
        }
    }

    @Test
    void meteorUsesTheOriginalPorterAlgorithmNotNltksDefaultExtensions() {
        // NLTK's default PorterStemmer() maps "dying" to "die" and "lying" to "lie"; the original
        // algorithm (ours, and NLTK's ORIGINAL_ALGORITHM mode) gives "dy" and "ly", so those pairs
        // do not match in the stem stage and the scores differ
        JsonNode c = REF.get("meteor_default_stemmer");
        GenerationData data = data(c);
        for (int i = 0; i < data.size(); i++) {
            double ours = GenerationMetrics.prepare("meteor", Map.of(), data.select(new int[] {i})).statistic().estimate();
            assertThat(ours).isCloseTo(c.get("per_item").get(i).asDouble(), within(1e-9));
        }
        assertThat(c.get("per_item").get(0).asDouble()).isLessThan(c.get("per_item_nltk_default_stemmer").get(0).asDouble() - 0.05);
        assertThat(c.get("per_item").get(1).asDouble()).isLessThan(c.get("per_item_nltk_default_stemmer").get(1).asDouble() - 0.05);
    }

    @Test
    void theReferenceRecordsWhatProducedIt() {
        assertThat(REF.get("generated_by").asText()).contains("nltk 3.8").contains("WordNet 3.0");
        assertThat(REF.get("script").asText()).isEqualTo("src/test/reference/meteor_rouge_reference.py");
    }

    static GenerationData data(JsonNode c) {
        List<String> ids = new ArrayList<>(), hyps = new ArrayList<>();
        List<List<String>> refs = new ArrayList<>();
        for (int i = 0; i < c.get("hypotheses").size(); i++) {
            ids.add("s" + i);
            hyps.add(c.get("hypotheses").get(i).asText());
            List<String> r = new ArrayList<>();
            c.get("references").get(i).forEach(x -> r.add(x.asText()));
            refs.add(r);
        }
        return new GenerationData(Path.of("outputs.jsonl"), ids, hyps, refs, List.of());
    }

    private static Map<String, String> params(JsonNode p) {
        Map<String, String> out = new HashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = p.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            out.put(e.getKey(), e.getValue().asText());
        }
        return out;
    }
}
