package org.assay.audit;

import java.nio.file.Path;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.EvaluationData;
import org.assay.metrics.MetricDefinition;
import org.assay.metrics.MetricKind;
import org.assay.metrics.PreparedMetric;

/**
 * A pilot: outputs for a first few items of the test set, whose spread stands in for the unknown
 * spread of a metric that has no variance formula. Its standard error at its own size is
 * extrapolated to other sizes as se&sup2; &prop; 1/n ({@link Evidence#standardErrorAt}), and then
 * multiplied by the finite-population correction of the planned size.
 */
public final class PlanPilot {
    private final EvaluationData data;

    public PlanPilot(EvaluationData data) { this.data = data; }

    public Path source() { return data.source(); }

    public int size() { return data.size(); }

    /** What the pilot says about one metric: its value and its standard error at the pilot's size. */
    record Spread(double value, Evidence evidence, String method) {}

    /** The metric on the pilot, with the audit's own method (DeLong for ROC AUC, the bootstrap otherwise), population unknown. */
    Spread spread(MetricDefinition metric, Map<String, String> params, EstimationSettings settings) {
        PreparedMetric prepared = metric.prepare(data, params);
        if (prepared.notComputable() != null) {
            throw UserInputException.usage("the pilot " + data.source() + " cannot give " + metric.id() + ": "
                    + prepared.notComputable(), "give a pilot that can");
        }
        // infinite population: the raw standard error at the pilot's size, so that se^2 * size is the per-item spread
        Evidence e = new Estimator(settings, org.assay.common.Progress.NONE).evidence(prepared, null);
        if (!(e.standardError() >= 0) || Double.isInfinite(e.standardError())) {
            throw UserInputException.usage("the pilot " + data.source() + " gives no standard error for " + metric.id(),
                    "give a larger pilot");
        }
        String method = metric.kind() == MetricKind.ROC_AUC && e instanceof AucEvidence
                ? "DeLong" : "bootstrap (" + settings.resamples() + " resamples, seed " + settings.seed() + ")";
        return new Spread(e.estimate(), e, method);
    }
}
