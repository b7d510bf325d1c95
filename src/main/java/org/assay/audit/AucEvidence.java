package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.assay.stats.DeLong;
import org.assay.stats.FinitePopulation;
import org.assay.stats.Interval;

/**
 * Evidence for ROC AUC from DeLong's variance (DeLong, DeLong &amp; Clarke-Pearson 1988). With a
 * known test-set size the variance carries the finite-population correction (N-n)/(N-1), an
 * approximation that treats the subsample as a simple random sample of examples.
 */
final class AucEvidence implements Evidence {
    private static final NormalDistribution NORMAL = new NormalDistribution(null, 0, 1);
    private final DeLong.AucVariance variance;
    private final long n;
    private final Long population;
    private final double factor;
    private final List<String> notes = new ArrayList<>();

    AucEvidence(DeLong.AucVariance variance, long n, Long population) {
        this.variance = variance;
        this.n = n;
        this.population = population;
        this.factor = population == null ? 1 : FinitePopulation.correction(n, population);
        if (population != null) {
            notes.add("DeLong variance multiplied by the finite-population correction (N-n)/(N-1) = "
                    + String.format(java.util.Locale.ROOT, "%.4f", factor));
        }
    }

    @Override public double estimate() { return variance.auc(); }

    @Override
    public Interval interval(double confidence) { return DeLong.interval(variance, confidence, factor); }

    @Override
    public double pValue(double lo, double hi) {
        double est = estimate();
        double c = Math.max(lo, Math.min(hi, est));
        double se = standardError();
        if (se == 0) return est == c ? 1 : 0;
        return Math.min(1, 2 * NORMAL.cumulativeProbability(-Math.abs(est - c) / se));
    }

    @Override
    public double[] rangeIfTrue(double lo, double hi, double confidence) {
        double z = NORMAL.inverseCumulativeProbability(1 - (1 - confidence) / 2);
        double se = standardError();
        return new double[] {Math.max(0, lo - z * se), Math.min(1, hi + z * se)};
    }

    @Override public double standardError() { return Math.sqrt(variance.variance() * factor); }

    @Override
    public double standardErrorAt(long units) {
        double var = variance.variance() * n / units;
        if (population != null) var *= FinitePopulation.correction(units, population);
        return Math.sqrt(var);
    }

    @Override public List<String> notes() { return notes; }
}
