package org.assay.stats;

/**
 * The Jeffreys interval: the central (equal-tailed) interval of the Beta(k + 1/2, n &minus; k + 1/2)
 * posterior under the Jeffreys prior, as recommended by Brown, Cai &amp; DasGupta (2001),
 * "Interval estimation for a binomial proportion", Statistical Science 16:101&ndash;133.
 *
 * <p>Conventions (same as statsmodels 0.13 {@code proportion_confint(method="jeffreys")}): the
 * plain equal-tailed interval at every k. Brown, Cai &amp; DasGupta's boundary modification (lower
 * bound 0 at k = 0, upper bound 1 at k = n) is NOT applied, so at k = 0 the lower bound is
 * slightly above 0 and at k = n the upper bound slightly below 1.
 */
final class JeffreysInterval implements ProportionInterval {
    static final String METHOD = "Jeffreys";

    @Override
    public Interval compute(long successes, long trials, double confidence) {
        ProportionChecks.check(successes, trials, confidence);
        double halfAlpha = (1 - confidence) / 2;
        double a = successes + 0.5;
        double b = trials - successes + 0.5;
        return new Interval(BetaQuantile.quantile(halfAlpha, a, b), BetaQuantile.quantile(1 - halfAlpha, a, b),
                confidence, METHOD);
    }
}
