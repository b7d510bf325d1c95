package org.assay.audit;

import org.assay.common.UserInputException;
import org.assay.metrics.MetricKind;
import org.assay.metrics.PreparedMetric;
import org.assay.metrics.SumStatistic;
import org.assay.metrics.SwappedSums;
import org.assay.stats.ApproximateRandomization;
import org.assay.stats.BootstrapEngine;
import org.assay.stats.PairedDeLong;
import org.assay.stats.PairedDifference;

/**
 * Picks the paired method for one metric, as {@link Estimator} does for a single row: McNemar's exact
 * test for count metrics, paired DeLong for ROC AUC, and otherwise the paired bootstrap or, when
 * asked, approximate randomization. An --interval that moves a single row to the bootstrap moves the
 * comparison there too.
 */
final class PairedEstimator {
    private final EstimationSettings settings;
    private final PairedMethod method;

    PairedEstimator(EstimationSettings settings, PairedMethod method) {
        this.settings = settings;
        this.method = method;
    }

    /**
     * @param a          the metric on the first row's outputs
     * @param b          the same metric on the second row's outputs
     * @param pairing    b's position of each of a's units
     * @param sameCoding whether both outputs code their per-unit statistics alike (the same class list)
     * @param population full test-set size N, or null
     */
    PairedEvidence evidence(PreparedMetric a, PreparedMetric b, ReproductionPairing pairing, boolean sameCoding,
                            Long population) {
        MetricKind kind = a.definition().kind();
        IntervalChoice choice = settings.interval().resolve(kind, a.definition().id());
        int[] index = pairing.bIndexOfA();
        long n = a.units();
        if (kind == MetricKind.ROC_AUC && choice == IntervalChoice.DELONG) {
            double[] scoresB = new double[index.length];
            for (int i = 0; i < index.length; i++) {
                if (b.positive()[index[i]] != a.positive()[i]) {
                    throw new IllegalStateException("positive flags differ for a matched item");
                }
                scoresB[i] = b.scores()[index[i]];
            }
            return new PairedAucEvidence(PairedDeLong.of(a.scores(), scoresB, a.positive()), n, population);
        }
        IntervalChoice bootstrapChoice = choice.isBootstrap() ? choice : IntervalChoice.BCA;
        PairedBootstrapEvidence bootstrap = bootstrap(a, b, index, bootstrapChoice, population);
        if (kind == MetricKind.COUNT && choice.isProportion()) {
            SumStatistic sa = sums(a.statistic());
            SumStatistic sb = sums(b.statistic());
            long onlyA = 0;
            long onlyB = 0;
            for (int i = 0; i < index.length; i++) {
                boolean okA = sa.unitValue(i) == 1;
                boolean okB = sb.unitValue(index[i]) == 1;
                if (okA && !okB) onlyA++;
                if (okB && !okA) onlyB++;
            }
            return new PairedCountEvidence(onlyA, onlyB, bootstrap, population);
        }
        if (method == PairedMethod.RANDOMIZATION) {
            SumStatistic sa = sums(a.statistic());
            SumStatistic sb = sums(b.statistic());
            if (sa != null && sb != null && sameCoding && sa.table().width() == sb.table().width()) {
                try {
                    ApproximateRandomization.Result r = new ApproximateRandomization(settings.resamples(), settings.seed(),
                            settings.threads()).test(new SwappedSums(sa, sb, index));
                    return new RandomizationEvidence(r, bootstrap);
                } catch (IllegalArgumentException e) {
                    bootstrap.notes().add("approximate randomization was not possible (" + e.getMessage()
                            + "); the p-value is the paired bootstrap's");
                    return bootstrap;
                }
            }
            bootstrap.notes().add("approximate randomization needs both rows' statistics in one coding, summed per item ("
                    + (sameCoding ? a.definition().id() + " is not such a sum" : "the rows' outputs have different class lists")
                    + "); the p-value is the paired bootstrap's");
        }
        return bootstrap;
    }

    private PairedBootstrapEvidence bootstrap(PreparedMetric a, PreparedMetric b, int[] index, IntervalChoice choice,
                                              Long population) {
        BootstrapEngine engine = new BootstrapEngine(settings.resamples(), settings.seed(), settings.threads());
        try {
            var raw = engine.run(new PairedDifference(a.statistic(), b.statistic(), index));
            return new PairedBootstrapEvidence(raw, choice, a.units(), population);
        } catch (IllegalArgumentException e) {
            throw UserInputException.usage("the gap in " + a.definition().id() + " cannot be bootstrapped on these "
                    + a.units() + " items: " + e.getMessage(), "evaluate more items");
        }
    }

    /** A statistic as a sum over units (a cell statistic is one), or null when it is not such a sum. */
    private static SumStatistic sums(org.assay.stats.Resampled r) {
        if (r instanceof SumStatistic s) return s;
        if (r instanceof org.assay.metrics.CellStatistic c) return c.asSum();
        return null;
    }
}
