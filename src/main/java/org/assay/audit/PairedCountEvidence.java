package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import org.assay.stats.Interval;
import org.assay.stats.McNemarTest;

/**
 * A count metric (accuracy, error rate, top-k, Recall@K as a hit rate) on the same items: McNemar's
 * exact test from the items only one system gets right (McNemar 1947, Psychometrika 12:153&ndash;157),
 * which is also the exact randomization test of paired 0/1 outcomes. The gap's interval comes from
 * the paired bootstrap, as no exact interval for a paired difference is in use here.
 */
final class PairedCountEvidence implements PairedEvidence {
    static final String TEST = "McNemar exact";
    private final long onlyA;
    private final long onlyB;
    private final PairedBootstrapEvidence interval;
    private final List<String> notes = new ArrayList<>();

    /**
     * @param onlyA    items whose outcome is 1 for A and 0 for B (a hit, or an error for error_rate)
     * @param onlyB    items whose outcome is 0 for A and 1 for B
     * @param interval the paired bootstrap of the same gap, for its interval
     */
    PairedCountEvidence(long onlyA, long onlyB, PairedBootstrapEvidence interval, Long population) {
        this.onlyA = onlyA;
        this.onlyB = onlyB;
        this.interval = interval;
        notes.add("McNemar's exact test on the " + (onlyA + onlyB) + " items where the rows differ (" + onlyA
                + " counted for the first row only, " + onlyB + " for the second only)");
        if (population != null) {
            notes.add("McNemar's test ignores the finite-population correction, which makes it conservative");
        }
        notes.addAll(interval.notes());
    }

    @Override public double gap() { return interval.gap(); }

    @Override public Interval interval(double confidence) { return interval.interval(confidence); }

    @Override public double pValue() { return McNemarTest.exactPValue(onlyA, onlyB); }

    @Override public String test() { return TEST; }

    @Override public List<String> notes() { return notes; }

    @Override public long[] discordant() { return new long[] {onlyA, onlyB}; }
}
