package org.assay.metrics.generation;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.data.generation.GenerationData;
import org.assay.testing.ReferenceData;

/** The values src/test/reference/generation_reference.py wrote (NLTK 3.8, Python 3.11), and its corpora. */
final class GenerationReference {
    private GenerationReference() {}

    static final JsonNode DOC = ReferenceData.load("generation.json");

    static GenerationData corpus(String name) {
        List<String> ids = new ArrayList<>(), hyps = new ArrayList<>();
        List<List<String>> refs = new ArrayList<>();
        for (JsonNode item : DOC.get("corpora").get(name)) {
            ids.add(item.get("id").asText());
            hyps.add(item.get("hypothesis").asText());
            refs.add(strings(item.get("references")));
        }
        return new GenerationData(Path.of(name + ".jsonl"), ids, hyps, refs, List.of());
    }

    static GenerationData items(JsonNode array) {
        List<String> ids = new ArrayList<>(), hyps = new ArrayList<>();
        List<List<String>> refs = new ArrayList<>();
        for (JsonNode item : array) {
            ids.add(item.get("id").asText());
            hyps.add(item.get("hypothesis").asText());
            refs.add(strings(item.get("references")));
        }
        return new GenerationData(Path.of("answers.jsonl"), ids, hyps, refs, List.of());
    }

    static List<String> strings(JsonNode array) {
        List<String> out = new ArrayList<>();
        array.forEach(n -> out.add(n.asText()));
        return out;
    }

    static Map<String, String> params(JsonNode object) {
        Map<String, String> out = new LinkedHashMap<>();
        object.properties().forEach(e -> out.put(e.getKey(), e.getValue().asText()));
        return out;
    }

    static double value(String metric, Map<String, String> params, GenerationData data) {
        return GenerationMetrics.prepare(metric, params, data).statistic().estimate();
    }
}
