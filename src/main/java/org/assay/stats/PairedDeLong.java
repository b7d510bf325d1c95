package org.assay.stats;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.assay.common.UserInputException;

/**
 * The difference of two correlated ROC AUCs, two systems scored on the same items, with DeLong's
 * variance of the difference: DeLong, DeLong &amp; Clarke-Pearson (1988), "Comparing the areas under
 * two or more correlated receiver operating characteristic curves: a nonparametric approach",
 * Biometrics 44:837&ndash;845. With V10 the placements of the m positives and V01 those of the n
 * negatives (see {@link DeLong#placements}), S10 and S01 their 2&times;2 sample covariance matrices
 * over the two systems (divisor m &minus; 1 and n &minus; 1), the covariance matrix of the two AUCs is
 * S = S10/m + S01/n and var(A &minus; B) = S_AA + S_BB &minus; 2 S_AB. The test statistic is
 * z = (A &minus; B)/&radic;var, as pROC's {@code roc.test(method = "delong", paired = TRUE)} computes it.
 *
 * @param aucA      the first system's AUC
 * @param aucB      the second system's AUC
 * @param varianceA DeLong variance of aucA
 * @param varianceB DeLong variance of aucB
 * @param covariance DeLong covariance of aucA and aucB
 * @param positives  number of positive items
 * @param negatives  number of negative items
 */
public record PairedDeLong(double aucA, double aucB, double varianceA, double varianceB, double covariance,
                           int positives, int negatives) {
    /** Method name carried by {@link #interval}'s result. */
    public static final String METHOD = "paired DeLong";
    private static final NormalDistribution NORMAL = new NormalDistribution(null, 0, 1);

    /**
     * Both systems' scores for the same items, aligned (item i is {@code scoresA[i]} and
     * {@code scoresB[i]}), and whether each item is a positive. A usage error when a class has fewer
     * than two items (the covariances are undefined) or a score is NaN.
     */
    public static PairedDeLong of(double[] scoresA, double[] scoresB, boolean[] positive) {
        if (scoresA.length != scoresB.length) {
            throw new IllegalArgumentException(scoresA.length + " scores against " + scoresB.length);
        }
        DeLong.Placements a = DeLong.placements(scoresA, positive);
        DeLong.Placements b = DeLong.placements(scoresB, positive);
        int m = a.positives();
        int n = a.negatives();
        if (m < 2 || n < 2) {
            throw UserInputException.usage("the paired DeLong test needs at least two positives and two negatives, "
                    + "but there are " + m + " and " + n, "evaluate on more items");
        }
        double[] pos = new double[3];   // sums of products over positives: AA, BB, AB
        double[] neg = new double[3];
        for (int i = 0; i < positive.length; i++) {
            double da = a.values()[i] - a.auc();
            double db = b.values()[i] - b.auc();
            double[] s = positive[i] ? pos : neg;
            s[0] += da * da;
            s[1] += db * db;
            s[2] += da * db;
        }
        double[] cov = new double[3];
        for (int k = 0; k < 3; k++) cov[k] = pos[k] / (m - 1) / m + neg[k] / (n - 1) / n;
        return new PairedDeLong(a.auc(), b.auc(), cov[0], cov[1], cov[2], m, n);
    }

    public double difference() { return aucA - aucB; }

    /** var(A &minus; B), never below 0 (rounding can take an exactly zero variance a hair below). */
    public double differenceVariance() { return Math.max(0, varianceA + varianceB - 2 * covariance); }

    /**
     * z = (A &minus; B)/&radic;(var&middot;varianceFactor); varianceFactor is 1 for an infinite population
     * or the finite-population correction. NaN when the variance is 0 and so is the difference.
     */
    public double z(double varianceFactor) {
        double se = Math.sqrt(differenceVariance() * varianceFactor);
        if (se == 0) return difference() == 0 ? Double.NaN : Math.copySign(Double.POSITIVE_INFINITY, difference());
        return difference() / se;
    }

    /** Two-sided p-value 2&Phi;(&minus;|z|) of H0: equal AUCs; 1 when both the difference and its variance are 0. */
    public double pValue(double varianceFactor) {
        double z = z(varianceFactor);
        if (Double.isNaN(z)) return 1;
        return Math.min(1, 2 * NORMAL.cumulativeProbability(-Math.abs(z)));
    }

    /** The normal interval (A &minus; B) &plusmn; z&middot;&radic;(var&middot;varianceFactor), clipped to [&minus;1, 1]. */
    public Interval interval(double confidence, double varianceFactor) {
        ProportionChecks.checkConfidence(confidence);
        double half = ProportionChecks.zCritical(confidence) * Math.sqrt(differenceVariance() * varianceFactor);
        double d = difference();
        return new Interval(Math.max(-1, d - half), Math.min(1, d + half), confidence, METHOD);
    }
}
