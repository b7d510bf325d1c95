package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import org.assay.stats.FinitePopulation;
import org.assay.stats.Interval;
import org.assay.stats.PairedDeLong;

/**
 * ROC AUC of two systems on the same items: DeLong's variance of the difference of two correlated
 * AUCs (DeLong, DeLong &amp; Clarke-Pearson 1988), a normal interval and z-test; with a known test-set
 * size the variance carries the finite-population correction (N-n)/(N-1), as single AUC claims do.
 */
final class PairedAucEvidence implements PairedEvidence {
    private final PairedDeLong delong;
    private final double factor;
    private final List<String> notes = new ArrayList<>();

    PairedAucEvidence(PairedDeLong delong, long n, Long population) {
        this.delong = delong;
        this.factor = population == null ? 1 : FinitePopulation.correction(n, population);
        if (population != null) {
            notes.add("paired DeLong variance multiplied by the finite-population correction (N-n)/(N-1) = "
                    + String.format(java.util.Locale.ROOT, "%.4f", factor));
        }
    }

    @Override public double gap() { return delong.difference(); }

    @Override public Interval interval(double confidence) { return delong.interval(confidence, factor); }

    @Override public double pValue() { return delong.pValue(factor); }

    @Override public String test() { return PairedDeLong.METHOD; }

    @Override public List<String> notes() { return notes; }
}
