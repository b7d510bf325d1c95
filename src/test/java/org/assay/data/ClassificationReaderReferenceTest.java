package org.assay.data;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.io.IOException;
import java.nio.file.Path;

import static org.assay.data.Fixtures.resource;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Compares the reader with an independent reading of the same fixtures: Python 3.11 csv/json
 * modules, scikit-learn 1.2.1 LabelEncoder for the class codes and numpy 1.24.2 argmax for the
 * predicted class (src/test/reference/data_classification_reference.py, output committed as
 * src/test/resources/data/reference-sklearn.json).
 */
class ClassificationReaderReferenceTest {
    private static final JsonNode CASES = load();

    private static JsonNode load() {
        try {
            return new ObjectMapper().readTree(resource("reference-sklearn.json").toFile()).get("cases");
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"binary.csv", "binary.tsv", "binary.jsonl",
            "multiclass.csv", "multiclass.tsv", "multiclass.jsonl",
            "predictions-without-labels.csv+truth.csv"})
    void matchesPythonCsvAndScikitLearnLabelEncoder(String name) {
        String[] parts = name.split("\\+");
        ReadOptions options = parts.length > 1
                ? ReadOptions.defaults().withTruth(resource(parts[1])) : ReadOptions.defaults();
        ClassificationData data = ClassificationReader.read(resource(parts[0]), options);
        JsonNode expected = CASES.get(name);

        assertThat(data.ids()).containsExactly(strings(expected.get("ids")));
        assertThat(data.classes()).containsExactly(strings(expected.get("classes")));
        assertThat(data.truth()).containsExactly(ints(expected.get("truth")));
        if (expected.has("predicted")) {
            assertThat(data.predicted()).containsExactly(ints(expected.get("predicted")));
        }
        if (expected.has("argmax")) {   // no prediction column in these fixtures: arg-max of probabilities
            assertThat(data.predicted()).containsExactly(ints(expected.get("argmax")));
            assertThat(data.probabilities().toArray()).containsExactly(doubles(expected.get("probabilities")));
        }
        if (expected.has("scores")) {
            assertThat(data.scores()).containsExactly(doubles(expected.get("scores")));
        } else {
            assertThat(data.scores()).isNull();
        }
    }

    private static String[] strings(JsonNode array) {
        String[] out = new String[array.size()];
        for (int i = 0; i < out.length; i++) out[i] = array.get(i).asText();
        return out;
    }

    private static int[] ints(JsonNode array) {
        int[] out = new int[array.size()];
        for (int i = 0; i < out.length; i++) out[i] = array.get(i).asInt();
        return out;
    }

    private static double[] doubles(JsonNode array) {
        double[] out = new double[array.size()];
        for (int i = 0; i < out.length; i++) out[i] = array.get(i).asDouble();
        return out;
    }
}
