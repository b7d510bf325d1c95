package org.assay.stats;

/**
 * The Wilson score interval: the set of p whose score test does not reject, from
 * Wilson (1927), "Probable inference, the law of succession, and statistical inference",
 * JASA 22:209&ndash;212.
 *
 * <p>Conventions (same as statsmodels 0.13 {@code proportion_confint(method="wilson")}): the
 * closed form needs no clipping. At k = 0 the lower bound is 0 and at k = n the upper bound is 1
 * exactly in real arithmetic; they are set exactly so that rounding (e.g. 0.9999999999999999 at
 * 30/30) cannot leave the estimate outside its own interval.
 */
final class WilsonInterval implements ProportionInterval {
    static final String METHOD = "Wilson score";

    @Override
    public Interval compute(long successes, long trials, double confidence) {
        ProportionChecks.check(successes, trials, confidence);
        double n = trials;
        double p = successes / n;
        double z = ProportionChecks.zCritical(confidence);
        double z2 = z * z;
        double denominator = 1 + z2 / n;
        double centre = (p + z2 / (2 * n)) / denominator;
        double half = z * Math.sqrt(p * (1 - p) / n + z2 / (4 * n * n)) / denominator;
        double lower = successes == 0 ? 0 : ProportionChecks.clip01(centre - half);
        double upper = successes == trials ? 1 : ProportionChecks.clip01(centre + half);
        return new Interval(lower, upper, confidence, METHOD);
    }
}
