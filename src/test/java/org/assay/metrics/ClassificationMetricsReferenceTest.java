package org.assay.metrics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.assay.data.ClassificationData;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Every classification metric against scikit-learn on generated data it was not tuned to.
 * Expected values: scikit-learn (Debian python3-sklearn, version recorded in the JSON's
 * generated_by field), written by src/test/reference/sklearn_metrics_reference.py.
 */
class ClassificationMetricsReferenceTest {

    @TestFactory
    List<DynamicTest> metricsEqualScikitLearn() {
        JsonNode doc = ReferenceData.load("sklearn_metrics.json");
        List<DynamicTest> tests = new ArrayList<>();
        for (JsonNode c : doc.get("cases")) {
            ClassificationData data = TestData.fromReference(c);
            for (Iterator<Map.Entry<String, JsonNode>> it = c.get("expected").fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                String[] idAndParams = e.getKey().split(":");
                Map<String, String> params = new HashMap<>();
                if (idAndParams.length > 1) {
                    String[] kv = idAndParams[1].split("=");
                    params.put(kv[0], kv[1]);
                }
                double expected = e.getValue().asDouble();
                tests.add(DynamicTest.dynamicTest(c.get("name").asText() + " " + e.getKey(), () -> {
                    double actual = MetricRegistry.get(idAndParams[0]).prepare(data, params).value();
                    // scikit-learn 1.2 (see generated_by), to 1e-12
                    assertThat(actual).isCloseTo(expected, within(1e-12));
                }));
            }
        }
        assertThat(tests).hasSizeGreaterThan(60);
        return tests;
    }
}
