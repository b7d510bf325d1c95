package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import org.assay.stats.ApproximateRandomization;
import org.assay.stats.Interval;

/**
 * Approximate randomization (Riezler &amp; Maxwell 2005; Noreen 1989): the p-value comes from swapping
 * each item's pair of outputs between the systems; the gap's interval still comes from the paired
 * bootstrap, since a randomization test gives no interval.
 */
final class RandomizationEvidence implements PairedEvidence {
    static final String TEST = "approximate randomization";
    private final ApproximateRandomization.Result result;
    private final PairedBootstrapEvidence interval;
    private final List<String> notes = new ArrayList<>();

    RandomizationEvidence(ApproximateRandomization.Result result, PairedBootstrapEvidence interval) {
        this.result = result;
        this.interval = interval;
        notes.add(result.exact()
                ? "randomization p-value exact: all " + result.trials() + " ways to swap the items' outputs were enumerated"
                : "randomization p-value from " + result.trials() + " seeded trials, each swapping every item's outputs "
                        + "with probability 1/2; (1 + extreme) / (1 + trials)");
        notes.addAll(interval.notes());
    }

    @Override public double gap() { return interval.gap(); }

    @Override public Interval interval(double confidence) { return interval.interval(confidence); }

    @Override public double pValue() { return result.pValue(); }

    @Override public String test() { return result.exact() ? "exact randomization" : TEST; }

    @Override public List<String> notes() { return notes; }
}
