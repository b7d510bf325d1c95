package org.assay.metrics;

import java.util.Map;
import java.util.Set;
import org.assay.data.ClassificationData;
import org.assay.data.EvaluationData;

/**
 * One entry of the metric registry: what the metric is, where its definition comes from,
 * which parameters it takes, and how to turn data into its per-unit statistics.
 */
public record MetricDefinition(
        String id,
        String title,
        MetricKind kind,
        String unit,
        String definition,
        String reference,
        Set<String> params,
        Task task,
        Preparer preparer) {

    /** Builds a metric's per-unit statistics from its task's data. */
    @FunctionalInterface
    public interface Preparer {
        PreparedMetric prepare(MetricDefinition self, EvaluationData data, Map<String, String> params);
    }

    /** The preparer of a classification metric, which reads classification data. */
    @FunctionalInterface
    public interface ClassificationPreparer {
        PreparedMetric prepare(MetricDefinition self, ClassificationData data, Map<String, String> params);
    }

    /** A classification metric. */
    public MetricDefinition(String id, String title, MetricKind kind, String unit, String definition, String reference,
                            Set<String> params, ClassificationPreparer preparer) {
        this(id, title, kind, unit, definition, reference, params, Task.CLASSIFICATION,
                (self, data, p) -> preparer.prepare(self, (ClassificationData) data, p));
    }

    public PreparedMetric prepare(EvaluationData data, Map<String, String> params) {
        if (!task.dataType().isInstance(data)) {
            throw org.assay.common.UserInputException.usage("metric " + id + " is a " + task.id() + " metric",
                    "measure it with --task " + task.id() + " on " + task.id() + " outputs");
        }
        for (String p : params.keySet()) {
            if (!this.params.contains(p)) {
                throw org.assay.common.UserInputException.usage(
                        "metric " + id + " takes no parameter '" + p + "'",
                        this.params.isEmpty() ? "remove it" : "allowed: " + String.join(", ", this.params));
            }
        }
        return preparer.prepare(this, data, params);
    }
}
