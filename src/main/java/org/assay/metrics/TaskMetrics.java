package org.assay.metrics;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.assay.data.regression.RegressionData;
import org.assay.metrics.regression.RegressionMetrics;

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
}
