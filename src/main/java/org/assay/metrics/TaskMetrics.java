package org.assay.metrics;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.EvaluationData;
import org.assay.data.generation.GenerationData;
import org.assay.data.regression.RegressionData;
import org.assay.data.retrieval.RetrievalBothDirections;
import org.assay.data.retrieval.RetrievalDirection;
import org.assay.metrics.generation.GenerationMeasure;
import org.assay.metrics.generation.GenerationMetrics;
import org.assay.metrics.regression.RegressionMetrics;
import org.assay.metrics.retrieval.RetrievalMeasure;
import org.assay.metrics.retrieval.RetrievalMetrics;

/**
 * Registry entries for the metric engines of the tasks beyond classification. Each engine owns
 * its definitions and references; this class only states each metric's kind and task.
 */
final class TaskMetrics {
    private TaskMetrics() {}

    static List<MetricDefinition> regression() {
        List<MetricDefinition> out = new ArrayList<>();
        for (String id : RegressionMetrics.ids()) {
            RegressionMetrics.Info info = RegressionMetrics.info(id);
            out.add(new MetricDefinition(id, info.title(), MetricKind.OTHER, "example", info.definition(),
                    info.reference(), Set.of(), Task.REGRESSION,
                    (self, data, params) -> new PreparedMetric(self,
                            RegressionMetrics.prepare(id, params, (RegressionData) data), -1, null, null)));
        }
        return out;
    }

    /** Retrieval metrics: the query is the unit; Recall@K as a hit rate is a count metric. */
    static List<MetricDefinition> retrieval() {
        List<MetricDefinition> out = new ArrayList<>();
        for (String id : RetrievalMetrics.ids()) {
            MetricKind kind = id.equals("recall_at_k") ? MetricKind.COUNT : MetricKind.OTHER;
            out.add(new MetricDefinition(id, RetrievalMetrics.title(id), kind, "query", RetrievalMetrics.definition(id),
                    RetrievalMetrics.reference(id), RetrievalMetrics.params(id), Task.RETRIEVAL,
                    (self, data, params) -> {
                        RetrievalMeasure m;
                        if (id.equals("rsum")) {
                            RetrievalBothDirections b = both(id, data);
                            m = RetrievalMetrics.rsum(b.first().ranks(), b.second().ranks());
                        } else {
                            m = RetrievalMetrics.prepare(id, params, direction(id, data).ranks());
                        }
                        return new PreparedMetric(self, m.statistic(), m.successes(), null, null,
                                m.notComputable(), null);
                    }));
        }
        return out;
    }

    /** Generation metrics: the item (a hypothesis with its references) is the unit. */
    static List<MetricDefinition> generation() {
        List<MetricDefinition> out = new ArrayList<>();
        for (GenerationMetrics.Info info : GenerationMetrics.all()) {
            String id = info.id();
            out.add(new MetricDefinition(id, info.title(), info.kind(), "item", info.definition(), info.reference(),
                    info.params(), Task.GENERATION,
                    (self, data, params) -> {
                        if (!(data instanceof GenerationData g)) throw wrongData(id, "generation outputs", data);
                        GenerationMeasure m = GenerationMetrics.prepare(id, params, g);
                        return new PreparedMetric(self, m.statistic(), m.successes(), null, null, null,
                                m.configuration());
                    }));
        }
        return out;
    }

    private static RetrievalDirection direction(String id, EvaluationData data) {
        if (data instanceof RetrievalDirection d) return d;
        throw wrongData(id, "one retrieval direction", data);
    }

    private static RetrievalBothDirections both(String id, EvaluationData data) {
        if (data instanceof RetrievalBothDirections b) return b;
        throw wrongData(id, "both retrieval directions", data);
    }

    private static UserInputException wrongData(String id, String needed, EvaluationData data) {
        return UserInputException.usage("metric " + id + " needs " + needed + ", not " + data.source(),
                id.equals("rsum") ? "give both directions (--direction both, or two directions in the audit file)"
                        : "give outputs of the metric's task");
    }

}
