package org.assay.stats;

/**
 * The Clopper&ndash;Pearson ("exact") interval: the central interval inverting two one-sided
 * binomial tests at level &alpha;/2 each, from Clopper &amp; Pearson (1934), "The use of
 * confidence or fiducial limits illustrated in the case of the binomial", Biometrika
 * 26:404&ndash;413. Bounds are the beta quantiles B(&alpha;/2; k, n&minus;k+1) and
 * B(1&minus;&alpha;/2; k+1, n&minus;k).
 *
 * <p>Conventions (same as statsmodels 0.13 {@code proportion_confint(method="beta")}): the lower
 * bound is 0 at k = 0 and the upper bound is 1 at k = n; &alpha; is not re-spent at the boundary,
 * so those intervals cover with probability at least 1 &minus; &alpha;/2.
 * {@link BinomialTest#twoSidedPValue} is the test this interval inverts.
 */
final class ClopperPearsonInterval implements ProportionInterval {
    static final String METHOD = "Clopper-Pearson";

    @Override
    public Interval compute(long successes, long trials, double confidence) {
        ProportionChecks.check(successes, trials, confidence);
        double halfAlpha = (1 - confidence) / 2;
        double lower = successes == 0 ? 0 : BetaQuantile.quantile(halfAlpha, successes, trials - successes + 1);
        double upper = successes == trials ? 1
                : BetaQuantile.quantile(1 - halfAlpha, successes + 1, trials - successes);
        return new Interval(lower, upper, confidence, METHOD);
    }
}
