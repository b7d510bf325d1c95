package org.assay.report;

import java.util.List;
import java.util.Map;
import org.assay.audit.Finding;
import org.assay.audit.Histogram;
import org.assay.audit.Verdict;
import org.assay.claims.Claim;
import org.assay.claims.PrintedValue;
import org.assay.claims.Scale;
import org.assay.stats.Interval;

/** Findings made by hand for the plot tests; every number is on the fraction scale, as in Finding. */
final class PlotFixtures {
    private PlotFixtures() {}

    static Claim claim(String row, String column, String metric, String printed, Scale scale) {
        return new Claim("T2", row, List.of(column), metric, Map.of(), PrintedValue.parse(printed), scale, null, null,
                null, null, null);
    }

    /** A computed finding; the rounding interval comes from the printed value, the margin is 0.01. */
    static Finding computed(Claim c, Verdict v, double estimate, double lo, double hi, double eqLo, double eqHi,
                            Histogram histogram) {
        double[] r = c.value().roundingInterval(c.scale());
        double diff = estimate < r[0] ? estimate - r[0] : estimate > r[1] ? estimate - r[1] : 0;
        return new Finding(c, v, r[0], r[1], 400, 4000L, estimate, new Interval(lo, hi, 0.95, "exact"),
                new Interval(eqLo, eqHi, 0.90, "exact"), new double[] {lo, hi}, 0.05, 0.1, 0.01, diff, null, null,
                List.of(), histogram);
    }

    static Finding notComputable(Claim c, String reason) {
        double[] r = c.value().roundingInterval(c.scale());
        return new Finding(c, Verdict.NOT_COMPUTABLE, r[0], r[1], 0, null, Double.NaN, null, null, null, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN, null, reason, List.of(), null);
    }

    /** Printed 88.7% accuracy, reproduced 85.50 [81.88, 88.63]: inconclusive. */
    static Finding accuracy(String row) {
        return computed(claim(row, "Accuracy", "accuracy", "88.7", Scale.PERCENT), Verdict.INCONCLUSIVE,
                0.855, 0.8188, 0.8863, 0.8245, 0.8818, null);
    }

    /** Printed 0.991 ROC AUC, reproduced 0.9943 [0.9903, 0.9983]: consistent. */
    static Finding auc() {
        return computed(claim("Ours", "Wren AUC", "roc_auc", "0.991", Scale.FRACTION), Verdict.CONSISTENT,
                0.9943, 0.9903, 0.9983, 0.9909, 0.9976, null);
    }

    /** Printed 84.1% macro F1, reproduced 77.09 [72.17, 81.76] by bootstrap: discrepant, with a histogram. */
    static Finding macroF1() {
        int[] counts = {2, 5, 11, 30, 62, 101, 140, 120, 80, 33, 12, 4};
        return computed(claim("Ours", "Macro F1", "macro_f1", "84.1", Scale.PERCENT), Verdict.DISCREPANT,
                0.7709, 0.7217, 0.8176, 0.73, 0.81, new Histogram(0.71, 0.01, counts));
    }
}
