package org.assay.stats;

import static org.assay.stats.ProportionChecks.clip01;

/**
 * The Wald (normal-approximation) interval p&#770; &plusmn; z&middot;sqrt(p&#770;(1&minus;p&#770;)/n);
 * see Brown, Cai &amp; DasGupta (2001), Statistical Science 16:101&ndash;133, for its poor coverage.
 *
 * <p>Conventions (same as statsmodels 0.13 {@code proportion_confint(method="normal")}): at
 * k = 0 and k = n the interval has zero width (the point 0 or 1); bounds are clipped to [0, 1].
 */
final class WaldInterval implements ProportionInterval {
    static final String METHOD = "Wald";

    @Override
    public Interval compute(long successes, long trials, double confidence) {
        ProportionChecks.check(successes, trials, confidence);
        double n = trials;
        double p = successes / n;
        double half = ProportionChecks.zCritical(confidence) * Math.sqrt(p * (1 - p) / n);
        return new Interval(clip01(p - half), clip01(p + half), confidence, METHOD);
    }
}
