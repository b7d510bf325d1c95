package org.assay.metrics.regression;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.assay.common.UserInputException;
import org.assay.data.regression.RegressionData;
import org.assay.stats.BootstrapDistribution;
import org.assay.stats.BootstrapEngine;
import org.assay.stats.Interval;
import org.assay.stats.Resampled;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Regression metrics against scikit-learn 1.2.1 (mean_absolute_error, mean_squared_error,
 * r2_score) and scipy 1.10.1 (pearsonr, spearmanr), values written by
 * src/test/reference/regression_reference.py into regression_reference.json. Cases include ties
 * (values rounded to one decimal, integer ratings) and large offsets (1e6 and 1e9 plus noise).
 */
class RegressionMetricsReferenceTest {
    private static final JsonNode DOC = ReferenceData.load("regression_reference.json");

    static RegressionData data(JsonNode c) {
        double[] t = ReferenceData.doubles(c.get("target"));
        double[] p = ReferenceData.doubles(c.get("prediction"));
        List<String> ids = IntStream.range(0, t.length).mapToObj(i -> "x" + i).toList();
        return new RegressionData(Path.of(c.path("name").asText("constant") + ".csv"), ids, t, p);
    }

    static Stream<Arguments> casesAndMetrics() {
        List<Arguments> out = new ArrayList<>();
        for (JsonNode c : DOC.get("cases")) {
            for (String id : RegressionMetrics.ids()) out.add(Arguments.of(c.get("name").asText(), id, c));
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("casesAndMetrics")
    void valueMatchesTheReferenceLibrary(String name, String id, JsonNode c) {
        double expected = c.get("expected").get(id).asDouble();
        double actual = RegressionMetrics.prepare(id, Map.of(), data(c)).estimate();
        assertThat(actual).isCloseTo(expected, within(1e-9));
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("casesAndMetrics")
    void integerWeightsEqualTheReferenceOnRepeatedData(String name, String id, JsonNode c) {
        // The script computed the metric on numpy.repeat(data, weights).
        int[] weights = ReferenceData.ints(c.get("weights"));
        double expected = c.get("expected_repeated").get(id).asDouble();
        double actual = RegressionMetrics.prepare(id, Map.of(), data(c)).value(weights);
        assertThat(actual).isCloseTo(expected, within(1e-9));
    }

    @Test
    void everyMetricIsCoveredByTheReference() {
        assertThat(DOC.get("cases").get(0).get("expected").fieldNames()).toIterable()
                .containsExactlyInAnyOrderElementsOf(RegressionMetrics.ids());
    }

    /**
     * Definition difference: on a constant target scikit-learn's r2_score returns 0.0 by default
     * (force_finite=True; 1.0 for a perfect prediction) and -inf with force_finite=False, and
     * scipy's correlations return nan. assay calls these undefined and says so.
     */
    @Test
    void constantTargetIsUndefinedWhereTheLibrariesReturnAConvention() {
        JsonNode c = DOC.get("constant_target");
        assertThat(c.get("r2_default").asDouble()).isEqualTo(0.0);
        assertThat(c.get("r2_force_finite_false").asText()).isEqualTo("-inf");
        assertThat(c.get("pearson").asText()).isEqualTo("nan");
        assertThat(c.get("spearman").asText()).isEqualTo("nan");
        RegressionData d = data(c);
        for (String id : List.of("r2", "pearson", "spearman")) {
            assertThatThrownBy(() -> RegressionMetrics.prepare(id, Map.of(), d))
                    .isInstanceOfSatisfying(UserInputException.class, e -> {
                        assertThat(e.where()).isEqualTo(d.source());
                        assertThat(e.oneLine()).contains(id, "undefined", "constant");
                        assertThat(e.fix()).isNotBlank();
                    });
        }
        // The error metrics stay defined on the same data.
        assertThat(RegressionMetrics.prepare("mae", Map.of(), d).estimate())
                .isCloseTo(c.get("mae").asDouble(), within(1e-12));
    }

    /**
     * A loose check of the bootstrap over these statistics against scipy.stats.bootstrap with the
     * same number of resamples: the random draws differ, so endpoints agree only up to Monte
     * Carlo error (about 0.001 here; the tolerance is 0.01, a tenth of the half-width).
     */
    @Test
    void bootstrapIntervalsAgreeLooselyWithScipy() {
        JsonNode b = DOC.get("bootstrap");
        JsonNode c = DOC.get("cases").get(0);
        assertThat(c.get("name").asText()).isEqualTo(b.get("case").asText());
        BootstrapEngine engine = new BootstrapEngine(b.get("resamples").asInt(), 20261207L, 2);
        double confidence = b.get("confidence").asDouble();
        for (String id : List.of("mae", "spearman")) {
            Resampled statistic = RegressionMetrics.prepare(id, Map.of(), data(c));
            BootstrapDistribution dist = engine.run(statistic);
            Interval percentile = dist.percentile(confidence);
            Interval bca = dist.bca(confidence);
            double[] scipyPercentile = ReferenceData.doubles(b.get("intervals").get(id + ":percentile"));
            double[] scipyBca = ReferenceData.doubles(b.get("intervals").get(id + ":BCa"));
            assertThat(percentile.lower()).as(id).isCloseTo(scipyPercentile[0], within(0.01));
            assertThat(percentile.upper()).as(id).isCloseTo(scipyPercentile[1], within(0.01));
            assertThat(bca.lower()).as(id).isCloseTo(scipyBca[0], within(0.01));
            assertThat(bca.upper()).as(id).isCloseTo(scipyBca[1], within(0.01));
        }
    }
}
