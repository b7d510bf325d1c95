package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import org.assay.stats.BootstrapDistribution;
import org.assay.stats.Interval;

/**
 * The paired bootstrap of Koehn (2004), "Statistical significance tests for machine translation
 * evaluation", EMNLP: every resample draws items with replacement and applies the same weights to
 * both systems, so the gap's distribution keeps their item-by-item correlation. The p-value is the
 * percentile interval inverted at 0 ({@link BootstrapDistribution#twoSidedPValue}); with a known
 * test-set size the deviations carry the finite-population correction.
 */
final class PairedBootstrapEvidence implements PairedEvidence {
    static final String TEST = "paired bootstrap";
    private final BootstrapDistribution distribution;
    private final IntervalChoice choice;
    private final List<String> notes = new ArrayList<>();

    /** @param raw the bootstrap of the difference, not yet rescaled */
    PairedBootstrapEvidence(BootstrapDistribution raw, IntervalChoice choice, long n, Long population) {
        this.choice = choice;
        this.distribution = population == null ? raw : raw.withFinitePopulation(n, population);
        notes.add("the gap's interval resamples items, the same resample for both rows (" + raw.resamples() + " resamples)");
        if (population != null) {
            notes.add("bootstrap deviations of the gap rescaled by sqrt((N-n)/(N-1)) for sampling without replacement "
                    + "from N = " + population);
        }
    }

    @Override public double gap() { return distribution.estimate(); }

    @Override
    public Interval interval(double confidence) {
        return choice.of(distribution, confidence);
    }

    @Override public double pValue() { return distribution.twoSidedPValue(0, 0); }

    @Override public String test() { return TEST; }

    @Override public List<String> notes() { return notes; }
}
