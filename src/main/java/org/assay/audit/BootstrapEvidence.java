package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import org.assay.stats.BootstrapDistribution;
import org.assay.stats.FinitePopulation;
import org.assay.stats.Interval;

/** Evidence from a seeded bootstrap over the metric's resampling unit (DESIGN.md principle 4). */
final class BootstrapEvidence implements Evidence {
    private final BootstrapDistribution distribution;
    private final IntervalChoice choice;
    private final long n;
    private final Long population;
    private final List<String> notes = new ArrayList<>();

    BootstrapEvidence(BootstrapDistribution raw, IntervalChoice choice, long n, Long population) {
        this.choice = choice;
        this.n = n;
        this.population = population;
        this.distribution = population == null ? raw : raw.withFinitePopulation(n, population);
        if (population != null) {
            notes.add("bootstrap deviations rescaled by sqrt((N-n)/(N-1)) for sampling without replacement from N = "
                    + population);
        }
        if (raw.countShortcut()) {
            notes.add("resampled counts drawn directly from Binomial(n, k/n), equivalent to resampling the 0/1 outcomes");
        }
        if (raw.categoryShortcut()) {
            notes.add("resampled confusion-matrix counts drawn directly from Multinomial(n, observed cell shares),"
                    + " equivalent to resampling the examples");
        }
    }

    BootstrapDistribution distribution() { return distribution; }

    @Override public double estimate() { return distribution.estimate(); }

    @Override
    public Interval interval(double confidence) {
        return choice.of(distribution, confidence);
    }

    @Override public double pValue(double lo, double hi) { return distribution.twoSidedPValue(lo, hi); }

    @Override
    public double[] rangeIfTrue(double lo, double hi, double confidence) {
        double[] low = distribution.rangeIfTrue(lo, confidence);
        double[] high = distribution.rangeIfTrue(hi, confidence);
        return new double[] {low[0], high[1]};
    }

    @Override public double standardError() { return distribution.standardError(); }

    @Override public Histogram histogram() { return Histogram.of(distribution.replicates(), 40); }

    @Override
    public double standardErrorAt(long units) {
        double se = distribution.standardError();
        double var = se * se;
        if (population != null) var /= Math.max(FinitePopulation.correction(n, population), 1e-300);
        var = var * n / units;
        if (population != null) var *= FinitePopulation.correction(units, population);
        return Math.sqrt(var);
    }

    @Override public List<String> notes() { return notes; }
}
