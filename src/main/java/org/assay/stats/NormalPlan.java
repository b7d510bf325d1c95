package org.assay.stats;

/**
 * Interval half-width and power as functions of the subsample size n when the estimate is taken
 * as normal around the true value with a known standard error se(n): the large-sample
 * approximation for a value with no exact method (ROC AUC, or any metric whose standard error is
 * extrapolated from a pilot). The tests mirror those on counts in {@link ExactCountPlan}, against a
 * claim that is the interval [claimLow, claimHigh] of values that round to it:
 * <ul>
 *   <li>discrepancy: the estimate lies more than z<sub>1&minus;&alpha;/2</sub>&middot;se beyond the
 *       nearer end of the claim (the two-sided z-test against that end);</li>
 *   <li>agreement (two one-sided tests, Schuirmann 1987): estimate &plusmn;
 *       z&middot;se at the equivalence confidence (z<sub>1&minus;&alpha;</sub> at 1 &minus; 2&alpha;)
 *       lies inside [claimLow &minus; margin, claimHigh + margin];</li>
 *   <li>consistency: agreement without discrepancy.</li>
 * </ul>
 * Power is the normal probability of each region; with claimLow = claimHigh the discrepancy
 * power is the textbook one-sample z-test power &Phi;(d/se &minus; z) + &Phi;(&minus;d/se &minus; z)
 * (Cohen, Statistical Power Analysis for the Behavioral Sciences, 2nd ed. 1988, chapter 12).
 */
public final class NormalPlan {
    /** The standard error of the estimate from a random subsample of n items (any finite-population correction included). */
    @FunctionalInterface
    public interface StandardError {
        /** se(n); NaN when the estimate is undefined at that size (too few items of a class, say). */
        double at(long n);
    }

    private final StandardError se;
    private final double claimLow;
    private final double claimHigh;
    private final double margin;
    private final double zTest;
    private final double zEquivalence;

    /**
     * @param testAlpha             level of the two-sided discrepancy test
     * @param equivalenceConfidence confidence of the agreement interval (1 &minus; 2&alpha; for two one-sided tests at &alpha;)
     */
    public NormalPlan(StandardError se, double claimLow, double claimHigh, double margin, double testAlpha,
                      double equivalenceConfidence) {
        if (!(claimLow <= claimHigh) || !(margin > 0)) {
            throw new IllegalArgumentException("need claimLow <= claimHigh and margin > 0");
        }
        PowerChecks.alpha(testAlpha);
        ProportionChecks.checkConfidence(equivalenceConfidence);
        this.se = se;
        this.claimLow = claimLow;
        this.claimHigh = claimHigh;
        this.margin = margin;
        this.zTest = PowerNormal.twoSidedCritical(testAlpha);
        this.zEquivalence = ProportionChecks.zCritical(equivalenceConfidence);
    }

    public double standardError(long n) { return se.at(n); }

    /** Half-width z<sub>1&minus;(1&minus;confidence)/2</sub>&middot;se(n) of the interval at that confidence. */
    public double halfWidth(long n, double confidence) {
        return ProportionChecks.zCritical(confidence) * se.at(n);
    }

    /** Probability that the estimate is discrepant when the true value is {@code truth}. */
    public double discrepantPower(long n, double truth) {
        double s = se.at(n);
        if (Double.isNaN(s)) return Double.NaN;
        if (s == 0) return truth < claimLow || truth > claimHigh ? 1 : 0;
        return PowerNormal.cdf((claimLow - zTest * s - truth) / s) + PowerNormal.cdf((truth - claimHigh - zTest * s) / s);
    }

    /** Probability that the two one-sided tests show agreement within the margin when the true value is {@code truth}. */
    public double agreementPower(long n, double truth) {
        double s = se.at(n);
        return probabilityBetween(claimLow - margin + zEquivalence * s, claimHigh + margin - zEquivalence * s, truth, s);
    }

    /** Probability of agreement without discrepancy (the audit's "consistent") when the true value is {@code truth}. */
    public double consistentPower(long n, double truth) {
        double s = se.at(n);
        double low = Math.max(claimLow - margin + zEquivalence * s, claimLow - zTest * s);
        double high = Math.min(claimHigh + margin - zEquivalence * s, claimHigh + zTest * s);
        return probabilityBetween(low, high, truth, s);
    }

    /** P(low &lt;= estimate &lt;= high) for an estimate N(truth, s&sup2;). */
    private static double probabilityBetween(double low, double high, double truth, double s) {
        if (Double.isNaN(s)) return Double.NaN;
        if (low > high) return 0;
        if (s == 0) return truth >= low && truth <= high ? 1 : 0;
        return Math.max(0, PowerNormal.cdf((high - truth) / s) - PowerNormal.cdf((low - truth) / s));
    }
}
