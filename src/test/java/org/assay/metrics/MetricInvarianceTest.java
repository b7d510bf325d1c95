package org.assay.metrics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.assay.common.UserInputException;
import org.assay.data.ClassificationData;
import org.assay.data.EvaluationData;
import org.assay.data.generation.GenerationData;
import org.assay.data.regression.RegressionData;
import org.assay.data.retrieval.RetrievalBothDirections;
import org.assay.data.retrieval.RetrievalDirection;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The checks every metric in the registry must pass (the invariance suite scikit-learn runs
 * over its metrics is the model; common practice): the order of rows does not matter,
 * integer weights give exactly the value of the data repeated that many times, the
 * closed-form jackknife equals the metric recomputed without that unit, and degenerate
 * inputs give a clear error or a documented value. Every task's metrics run through the first
 * three checks on their own kind of data.
 */
class MetricInvarianceTest {

    static Stream<MetricDefinition> metrics() { return MetricRegistry.all().stream(); }

    static Stream<MetricDefinition> classificationMetrics() {
        return MetricRegistry.all().stream().filter(d -> d.task() == Task.CLASSIFICATION);
    }

    private static final JsonNode CASES = ReferenceData.load("sklearn_metrics.json").get("cases");

    private static ClassificationData binary() { return TestData.fromReference(CASES.get(1)); }

    private static ClassificationData multiclass() { return TestData.fromReference(CASES.get(3)); }

    private static Map<String, String> params(MetricDefinition d) {
        return d.params().contains("k") ? Map.of("k", d.task() == Task.RETRIEVAL ? "3" : "2") : Map.of();
    }

    /** Data the metric is defined on: binary for binary-only metrics, multiclass otherwise. */
    private static ClassificationData classificationFor(MetricDefinition d) {
        boolean binaryOnly = d.params().contains("positive");
        return binaryOnly ? binary() : multiclass();
    }

    /** Seeded regression data with ties (values rounded to one decimal) and a large offset. */
    private static RegressionData regression() {
        SplittableRandom rng = new SplittableRandom(11);
        int n = 60;
        double[] y = new double[n], p = new double[n];
        java.util.List<String> ids = new java.util.ArrayList<>();
        for (int i = 0; i < n; i++) {
            y[i] = 1000 + Math.round(rng.nextGaussian() * 30) / 10.0;
            p[i] = y[i] + Math.round(rng.nextGaussian() * 15) / 10.0;
            ids.add("r" + i);
        }
        return new RegressionData(java.nio.file.Path.of("regression.csv"), ids, y, p);
    }

    /** The data of a metric's task, in a form the common checks can permute and repeat. */
    private static EvaluationData dataFor(MetricDefinition d) {
        return switch (d.task()) {
            case CLASSIFICATION -> classificationFor(d);
            case REGRESSION -> regression();
            case RETRIEVAL -> d.id().equals("rsum")
                    ? new RetrievalBothDirections(TaskTestData.retrieval(31, 40), TaskTestData.retrieval(32, 35))
                    : TaskTestData.retrieval(31, 40);
            case GENERATION -> TaskTestData.generation(41, 40);
        };
    }

    private static EvaluationData permuted(EvaluationData data, int[] perm) {
        return select(data, perm);
    }

    private static EvaluationData repeated(EvaluationData data, int[] weights) {
        return select(data, RegressionTestData.repeat(weights));
    }

    /** The units of {@code data} in another order or with repeats: unit index[j] is placed at j. */
    private static EvaluationData select(EvaluationData data, int[] index) {
        if (data instanceof ClassificationData c) return TestData.select(c, index);
        if (data instanceof RegressionData r) return RegressionTestData.select(r, index);
        if (data instanceof RetrievalDirection r) return TaskTestData.select(r, index);
        if (data instanceof GenerationData g) return g.select(index);
        RetrievalBothDirections b = (RetrievalBothDirections) data;
        int na = b.first().size();
        int[] ia = java.util.Arrays.stream(index).filter(i -> i < na).toArray();
        int[] ib = java.util.Arrays.stream(index).filter(i -> i >= na).map(i -> i - na).toArray();
        return new RetrievalBothDirections(TaskTestData.select(b.first(), ia), TaskTestData.select(b.second(), ib));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("metrics")
    void rowOrderDoesNotMatter(MetricDefinition d) {
        EvaluationData data = dataFor(d);
        int[] perm = permutation(data.size(), new SplittableRandom(1));
        double original = d.prepare(data, params(d)).value();
        double shuffled = d.prepare(permuted(data, perm), params(d)).value();
        assertThat(shuffled).isCloseTo(original, within(1e-12));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("metrics")
    void integerWeightsEqualRepetition(MetricDefinition d) {
        EvaluationData data = dataFor(d);
        SplittableRandom rng = new SplittableRandom(2);
        for (int trial = 0; trial < 5; trial++) {
            int[] w = new int[data.size()];
            for (int i = 0; i < w.length; i++) w[i] = rng.nextInt(4);   // zeros included
            w[0] = Math.max(w[0], 1);
            double weighted = d.prepare(data, params(d)).statistic().value(w);
            double repeated = d.prepare(repeated(data, w), params(d)).value();
            assertThat(weighted).isCloseTo(repeated, within(tolerance(d, repeated)));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("metrics")
    void jackknifeEqualsLeaveOneOut(MetricDefinition d) {
        EvaluationData data = dataFor(d);
        double[] jack = d.prepare(data, params(d)).statistic().jackknife();
        assertThat(jack).hasSize(data.size());
        for (int i : new int[] {0, 7, data.size() - 1}) {
            int[] w = new int[data.size()];
            java.util.Arrays.fill(w, 1);
            w[i] = 0;
            double without = d.prepare(repeated(data, w), params(d)).value();
            assertThat(jack[i]).as("unit %d", i).isCloseTo(without, within(tolerance(d, without)));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("classificationMetrics")
    void singleClassTruthGivesClearErrorOrDocumentedValue(MetricDefinition d) {
        ClassificationData src = classificationFor(d);
        int[] truth = new int[src.size()];   // every example of class 0
        ClassificationData data = new ClassificationData(src.source(), src.ids(), src.classes(), truth,
                src.predicted(), src.scores(), src.probabilities(), src.positive(), src.warnings());
        if (d.kind() == MetricKind.ROC_AUC) {
            // ROC AUC needs both classes (common practice; scikit-learn raises ValueError too)
            assertThatThrownBy(() -> d.prepare(data, params(d))).isInstanceOf(UserInputException.class)
                    .hasMessageContaining("no positive");
        } else {
            // documented values: ratios that are 0/0 count as 0 (scikit-learn zero_division=0)
            double v = d.prepare(data, params(d)).value();
            assertThat(v).isBetween(-1.0, 1.0);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("classificationMetrics")
    void missingPredictionsAreAClearError(MetricDefinition d) {
        ClassificationData src = classificationFor(d);
        ClassificationData noPred = new ClassificationData(src.source(), src.ids(), src.classes(), src.truth(),
                null, null, null, src.positive(), src.warnings());
        assertThatThrownBy(() -> d.prepare(noPred, params(d))).isInstanceOf(UserInputException.class)
                .hasMessageContaining("test.csv");
    }

    /** Exact to 1e-12 for classification; relative 1e-9 for sums of real values (regression near 1000). */
    private static double tolerance(MetricDefinition d, double expected) {
        return d.task() == Task.CLASSIFICATION ? 1e-12 : 1e-9 * Math.max(1, Math.abs(expected));
    }

    private static int[] permutation(int n, SplittableRandom rng) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) p[i] = i;
        for (int i = n - 1; i > 0; i--) {
            int j = rng.nextInt(i + 1);
            int t = p[i]; p[i] = p[j]; p[j] = t;
        }
        return p;
    }
}
