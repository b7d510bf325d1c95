package org.assay.stats;

import java.util.Arrays;
import org.assay.common.UserInputException;

/**
 * ROC AUC with its DeLong variance. The AUC is the Mann&ndash;Whitney probability that a positive
 * scores above a negative, ties counted one half. Its variance comes from the structural
 * components (placement values) of DeLong, DeLong &amp; Clarke-Pearson (1988), "Comparing the
 * areas under two or more correlated receiver operating characteristic curves: a nonparametric
 * approach", Biometrics 44:837&ndash;845. Placements are found by sorting each class once and
 * binary-searching the other, O(n log n), in the spirit of Sun &amp; Xu (2014), "Fast
 * implementation of DeLong's algorithm", IEEE Signal Processing Letters 21:1389&ndash;1393.
 *
 * <p>Higher scores mean "more positive" (pROC's {@code direction = "<"}: controls below cases).
 * Written by hand because Commons Math has no AUC or DeLong variance.
 */
public final class DeLong {
    /** Method name carried by {@link #interval}'s result. */
    public static final String METHOD = "DeLong";

    private DeLong() {}

    /**
     * AUC, its DeLong variance, and the class sizes. The variance is NaN when a class has a single
     * member (the sample variance of its placements is undefined).
     */
    public record AucVariance(double auc, double variance, int positives, int negatives) {}

    /**
     * Placement values, aligned with the input: for a positive item, the fraction of negatives
     * scoring below it (ties one half); for a negative item, the fraction of positives scoring
     * above it (ties one half). Their mean over positives, and over negatives, is the AUC.
     * {@link #leaveOneOutAuc()} gives the jackknife values for a BCa interval in O(n).
     */
    public record Placements(double[] values, boolean[] positive, int positives, int negatives, double auc) {
        /** The AUC with item i removed, for every i, from the placements (no re-sorting). */
        public double[] leaveOneOutAuc() {
            double[] out = new double[values.length];
            for (int i = 0; i < values.length; i++) {
                out[i] = positive[i]
                        ? (positives * auc - values[i]) / (positives - 1)
                        : (negatives * auc - values[i]) / (negatives - 1);
            }
            return out;
        }
    }

    /** Placement values of every item; a usage error when a class is empty or a score is NaN. */
    public static Placements placements(double[] scores, boolean[] positive) {
        SortedClasses sorted = SortedClasses.of(scores, positive);
        double[] values = new double[scores.length];
        double sum = 0;
        for (int i = 0; i < scores.length; i++) {
            values[i] = sorted.placement(scores[i], positive[i]);
            if (positive[i]) sum += values[i];
        }
        return new Placements(values, positive.clone(), sorted.pos.length, sorted.neg.length, sum / sorted.pos.length);
    }

    /**
     * AUC and its DeLong variance S10/m + S01/n (sample variances of the two sets of placements).
     * The placements are computed twice (for the AUC, then for the deviations from it) rather than
     * stored: the same values in the same order as {@link #placements}, without an n-long array.
     */
    public static AucVariance of(double[] scores, boolean[] positive) {
        SortedClasses sorted = SortedClasses.of(scores, positive);
        int m = sorted.pos.length;
        int n = sorted.neg.length;
        double sum = 0;
        for (int i = 0; i < scores.length; i++) if (positive[i]) sum += sorted.placement(scores[i], true);
        double auc = sum / m;
        double s10 = 0;
        double s01 = 0;
        for (int i = 0; i < scores.length; i++) {
            double d = sorted.placement(scores[i], positive[i]) - auc;
            if (positive[i]) s10 += d * d; else s01 += d * d;
        }
        double variance = (m < 2 || n < 2) ? Double.NaN : s10 / (m - 1) / m + s01 / (n - 1) / n;
        return new AucVariance(auc, variance, m, n);
    }

    /** The scores of each class, sorted once; placements are binary searches in the other class. */
    private record SortedClasses(double[] pos, double[] neg) {
        static SortedClasses of(double[] scores, boolean[] positive) {
            if (scores.length != positive.length) {
                throw new IllegalArgumentException(scores.length + " scores but " + positive.length + " labels");
            }
            int m = 0;
            for (int i = 0; i < scores.length; i++) {
                if (Double.isNaN(scores[i])) {
                    throw UserInputException.usage("score of item " + (i + 1) + " is not a number",
                            "give every item a numeric score");
                }
                if (positive[i]) m++;
            }
            int n = scores.length - m;
            if (m == 0 || n == 0) {
                throw UserInputException.usage("ROC AUC needs both classes, but there are " + m + " positives and "
                        + n + " negatives", "evaluate on items from both classes");
            }
            double[] pos = new double[m];
            double[] neg = new double[n];
            for (int i = 0, a = 0, b = 0; i < scores.length; i++) {
                if (positive[i]) pos[a++] = scores[i]; else neg[b++] = scores[i];
            }
            Arrays.sort(pos);
            Arrays.sort(neg);
            return new SortedClasses(pos, neg);
        }

        /** For a positive, the share of negatives below it; for a negative, of positives above; ties one half. */
        double placement(double score, boolean isPositive) {
            if (isPositive) return (firstAtLeast(neg, score) + 0.5 * ties(neg, score)) / neg.length;
            int above = pos.length - firstAbove(pos, score);
            return (above + 0.5 * ties(pos, score)) / pos.length;
        }
    }

    /**
     * The normal interval auc &plusmn; z&middot;sqrt(variance&middot;varianceFactor), clipped to
     * [0, 1] as pROC's {@code ci.auc(method = "delong")} does. {@code varianceFactor} is 1 for an
     * infinite population, or the finite-population correction {@link FinitePopulation#correction}.
     */
    public static Interval interval(AucVariance v, double confidence, double varianceFactor) {
        ProportionChecks.checkConfidence(confidence);
        if (!(varianceFactor >= 0) || Double.isInfinite(varianceFactor)) {
            throw new IllegalArgumentException("variance factor must be finite and >= 0, got " + varianceFactor);
        }
        if (Double.isNaN(v.variance())) {
            throw UserInputException.usage("the DeLong variance needs at least two positives and two negatives, "
                    + "but there are " + v.positives() + " and " + v.negatives(), "evaluate on more items");
        }
        double half = ProportionChecks.zCritical(confidence) * Math.sqrt(v.variance() * varianceFactor);
        return new Interval(ProportionChecks.clip01(v.auc() - half), ProportionChecks.clip01(v.auc() + half),
                confidence, METHOD);
    }

    /** Index of the first element &gt;= x in a sorted array (= count of elements &lt; x). */
    private static int firstAtLeast(double[] sorted, double x) {
        int lo = 0, hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < x) lo = mid + 1; else hi = mid;
        }
        return lo;
    }

    /** Index of the first element &gt; x in a sorted array (= count of elements &lt;= x). */
    private static int firstAbove(double[] sorted, double x) {
        int lo = 0, hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] <= x) lo = mid + 1; else hi = mid;
        }
        return lo;
    }

    private static int ties(double[] sorted, double x) {
        return firstAbove(sorted, x) - firstAtLeast(sorted, x);
    }
}
