package org.assay.metrics;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;

/** Every metric assay knows, by canonical id. */
public final class MetricRegistry {
    private static final Map<String, MetricDefinition> BY_ID = new LinkedHashMap<>();

    static {
        for (MetricDefinition d : ClassificationMetrics.all()) BY_ID.put(d.id(), d);
        for (MetricDefinition d : TaskMetrics.retrieval()) BY_ID.put(d.id(), d);
        for (MetricDefinition d : TaskMetrics.generation()) BY_ID.put(d.id(), d);
        for (MetricDefinition d : TaskMetrics.regression()) BY_ID.put(d.id(), d);
    }

    private MetricRegistry() {}

    public static List<MetricDefinition> all() { return List.copyOf(BY_ID.values()); }

    public static boolean knows(String id) { return BY_ID.containsKey(id); }

    public static MetricDefinition get(String id) {
        MetricDefinition d = BY_ID.get(id);
        if (d == null) {
            throw UserInputException.usage("unknown metric '" + id + "'",
                    "known metrics: " + String.join(", ", BY_ID.keySet()));
        }
        return d;
    }
}
