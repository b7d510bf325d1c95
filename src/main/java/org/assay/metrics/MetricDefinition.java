package org.assay.metrics;

import java.util.Map;
import java.util.Set;
import org.assay.data.ClassificationData;

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
        Preparer preparer) {

    /** Builds a metric's per-unit statistics from data. */
    @FunctionalInterface
    public interface Preparer {
        PreparedMetric prepare(MetricDefinition self, ClassificationData data, Map<String, String> params);
    }

    public PreparedMetric prepare(ClassificationData data, Map<String, String> params) {
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
