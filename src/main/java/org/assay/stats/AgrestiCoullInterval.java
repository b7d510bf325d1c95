package org.assay.stats;

import static org.assay.stats.ProportionChecks.clip01;

/**
 * The Agresti&ndash;Coull ("add z&sup2;/2 successes and z&sup2;/2 failures") interval: a Wald
 * interval around p&#771; = (k + z&sup2;/2)/(n + z&sup2;) with n&#771; = n + z&sup2;, from Agresti &amp;
 * Coull (1998), "Approximate is better than 'exact' for interval estimation of binomial
 * proportions", The American Statistician 52:119&ndash;126.
 *
 * <p>Conventions (same as statsmodels 0.13 {@code proportion_confint(method="agresti_coull")}):
 * the exact z&sup2; is used (not the rounded "add two"), and bounds are clipped to [0, 1], which
 * matters at and near k = 0 and k = n.
 */
final class AgrestiCoullInterval implements ProportionInterval {
    static final String METHOD = "Agresti-Coull";

    @Override
    public Interval compute(long successes, long trials, double confidence) {
        ProportionChecks.check(successes, trials, confidence);
        double z = ProportionChecks.zCritical(confidence);
        double z2 = z * z;
        double nTilde = trials + z2;
        double pTilde = (successes + z2 / 2) / nTilde;
        double half = z * Math.sqrt(pTilde * (1 - pTilde) / nTilde);
        return new Interval(clip01(pTilde - half), clip01(pTilde + half), confidence, METHOD);
    }
}
