package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.assay.common.Progress;
import org.assay.data.EvaluationData;
import org.assay.metrics.MetricRegistry;
import org.assay.metrics.PreparedMetric;

/** Estimates metrics with intervals for a predictions file (the {@code measure} command). */
public final class Measurer {
    private final EstimationSettings settings;
    private final Progress progress;

    public Measurer(EstimationSettings settings) { this(settings, Progress.NONE); }

    /** @param progress where resampling reports how far it has got */
    public Measurer(EstimationSettings settings, Progress progress) {
        this.settings = settings;
        this.progress = progress;
    }

    /** A metric id with its parameters, as given on the command line. */
    public record MetricRequest(String id, Map<String, String> params) {}

    public List<Measurement> measure(EvaluationData data, List<MetricRequest> metrics, Long population) {
        if (population != null && data.size() > population) {
            throw org.assay.common.UserInputException.usage("--test-size " + population + " is smaller than the "
                    + data.size() + " examples in " + data.source(), "give the size of the full test set");
        }
        Estimator estimator = new Estimator(settings, progress);
        List<Measurement> out = new ArrayList<>();
        for (MetricRequest r : metrics) {
            PreparedMetric m = MetricRegistry.get(r.id()).prepare(data, r.params());
            if (m.notComputable() != null) {   // listed with its reason, never scored (a K beyond the scored depth)
                out.add(Measurement.notComputable(r.id(), r.params(), data.size(), population, m.notComputable()));
                continue;
            }
            Evidence e = estimator.evidence(m, population);
            List<String> notes = new ArrayList<>(e.notes());
            if (m.configuration() != null) notes.add("computed with " + m.configuration());
            out.add(new Measurement(r.id(), r.params(), data.size(), population, e.estimate(),
                    e.interval(settings.confidence()), e.standardError(), notes));
        }
        return out;
    }
}
