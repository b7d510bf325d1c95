package org.assay.audit;

import org.assay.common.Progress;
import org.assay.metrics.MetricKind;
import org.assay.metrics.PreparedMetric;
import org.assay.stats.BootstrapEngine;
import org.assay.stats.DeLong;

/** Turns a prepared metric into evidence with the method the settings ask for. */
final class Estimator {
    private final EstimationSettings settings;
    private final Progress progress;

    Estimator(EstimationSettings settings, Progress progress) {
        this.settings = settings;
        this.progress = progress;
    }

    /**
     * @param population full test-set size N, or null when unknown
     */
    Evidence evidence(PreparedMetric metric, Long population) {
        return evidence(metric, population, null);
    }

    /**
     * @param population full test-set size N, or null when unknown
     * @param stratumOf  each unit's stratum when the subsample was drawn stratified, else null:
     *                   bootstrap intervals then resample within the strata
     */
    Evidence evidence(PreparedMetric metric, Long population, int[] stratumOf) {
        MetricKind kind = metric.definition().kind();
        IntervalChoice choice = settings.interval().resolve(kind, metric.definition().id());
        long n = metric.units();
        if (kind == MetricKind.COUNT && choice.isProportion()) {
            return new CountEvidence(metric.successes(), n, population, choice);
        }
        if (kind == MetricKind.ROC_AUC && choice == IntervalChoice.DELONG) {
            return new AucEvidence(DeLong.of(metric.scores(), metric.positive()), n, population);
        }
        BootstrapEngine engine = new BootstrapEngine(settings.resamples(), settings.seed(), settings.threads())
                .reportingTo(progress, "resampling " + metric.definition().id());
        try {
            if (stratumOf != null) {
                BootstrapEvidence e = new BootstrapEvidence(engine.runStratified(metric.statistic(), stratumOf), choice, n,
                        population);
                e.notes().add("bootstrap resamples drawn within the strata of the stratified subsample");
                return e;
            }
            var raw = kind == MetricKind.COUNT
                    ? engine.runCount(metric.successes(), n)
                    : engine.run(metric.statistic());
            return new BootstrapEvidence(raw, choice, n, population);
        } catch (IllegalArgumentException e) {
            // the metric is undefined on some resample (for example a class missing from it)
            throw org.assay.common.UserInputException.usage(metric.definition().id() + " cannot be bootstrapped on these "
                    + n + " examples: " + e.getMessage(), "evaluate more examples, or choose another --interval");
        }
    }
}
