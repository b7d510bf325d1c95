package org.assay.stats;

/**
 * The standard error of an ROC AUC from the AUC and the class sizes alone, by Hanley &amp; McNeil
 * (1982), "The meaning and use of the area under a receiver operating characteristic (ROC)
 * curve", Radiology 143:29&ndash;36. It needs no scores, so it serves when only a printed AUC and
 * the class counts are known; with the scores, {@link DeLong} estimates the variance directly.
 *
 * <p>SE&sup2; = [A(1 &minus; A) + (m &minus; 1)(Q1 &minus; A&sup2;) + (n &minus; 1)(Q2 &minus; A&sup2;)] / (m&middot;n)
 * for m positives and n negatives, with Q1 = A/(2 &minus; A) (two random positives both
 * ranked above one negative) and Q2 = 2A&sup2;/(1 + A) (one positive above two random negatives),
 * the values these take when the scores follow exponential distributions. Both Q &minus; A&sup2;
 * terms are non-negative on [0, 1], so the variance is never negative. At A = 1/2 it reduces to
 * (m + n + 1)/(12&middot;m&middot;n), the exact null variance of the Mann&ndash;Whitney statistic
 * divided by m&middot;n.
 */
public final class HanleyMcNeil {
    private HanleyMcNeil() {}

    /**
     * @param auc       the area, 0 &lt;= auc &lt;= 1
     * @param positives items of the positive (abnormal) class, &gt;= 1
     * @param negatives items of the negative (normal) class, &gt;= 1
     */
    public static double standardError(double auc, long positives, long negatives) {
        PowerChecks.proportion("ROC AUC", auc);
        PowerChecks.items("number of positives", positives);
        PowerChecks.items("number of negatives", negatives);
        return standardError(auc, (double) positives, (double) negatives);
    }

    /**
     * The same formula at class sizes that need not be whole numbers: the expected class sizes of
     * a random subsample, for planning. Both must be at least 1.
     */
    public static double standardError(double auc, double positives, double negatives) {
        PowerChecks.proportion("ROC AUC", auc);
        if (!(positives >= 1 && negatives >= 1)) {
            throw new IllegalArgumentException("need at least one positive and one negative, got " + positives + ", " + negatives);
        }
        // Q1 - A^2 and Q2 - A^2 in factored form: the same algebra, but no cancellation near 0 or 1.
        double q1MinusA2 = auc * (1 - auc) * (1 - auc) / (2 - auc);
        double q2MinusA2 = auc * auc * (1 - auc) / (1 + auc);
        double numerator = auc * (1 - auc) + (positives - 1) * q1MinusA2 + (negatives - 1) * q2MinusA2;
        return Math.sqrt(numerator / (positives * negatives));
    }
}
