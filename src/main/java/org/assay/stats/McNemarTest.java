package org.assay.stats;

import org.apache.commons.math3.special.Gamma;
import org.assay.common.UserInputException;

/**
 * McNemar's test for two systems scored on the same items, from the discordant counts only:
 * b items the first system gets right and the second wrong, c items the other way round
 * (McNemar (1947), "Note on the sampling error of the difference between correlated proportions
 * or percentages", Psychometrika 12:153&ndash;157). Under H0 (equal accuracy) each discordant
 * item falls on either side with probability 1/2; items both systems get right or both wrong
 * carry no information about the difference.
 */
public final class McNemarTest {
    private McNemarTest() {}

    /**
     * The exact (conditional) test: two-sided binomial test of min(b, c) out of b + c with
     * p = 1/2, p = min(1, 2&middot;P(X &lt;= min(b, c))), through {@link BinomialTest}. Same as
     * statsmodels {@code mcnemar(table, exact=True).pvalue}. It is 1 when b + c = 0.
     */
    public static double exactPValue(long b, long c) {
        checkCounts(b, c);
        long discordant = b + c;
        if (discordant == 0) return 1;
        return BinomialTest.twoSidedPValue(Math.min(b, c), discordant, 0.5);
    }

    /**
     * The chi-square form: statistic (|b &minus; c| &minus; k)&sup2; / (b + c) on one degree of freedom,
     * with k = 1 for the continuity correction (Edwards (1948), "Note on the 'correction for
     * continuity' in testing the significance of the difference between correlated proportions",
     * Psychometrika 13:185&ndash;187) or k = 0 without. Same as statsmodels {@code mcnemar(table,
     * exact=False, correction=continuity).pvalue}, including its convention that with the
     * correction a tie b = c gives the statistic 1/(b + c), not 0. The upper tail is
     * Q(1/2, x/2), the regularized upper incomplete gamma function (Commons Math {@link Gamma}),
     * so small p-values keep their relative accuracy.
     *
     * <p>When b + c = 0 this returns 1 (no discordant item, no evidence); statsmodels returns NaN
     * without the correction and 0 with it there (a division by zero).
     */
    public static double chiSquarePValue(long b, long c, boolean continuity) {
        checkCounts(b, c);
        long discordant = b + c;
        if (discordant == 0) return 1;
        double excess = Math.abs((double) b - c) - (continuity ? 1 : 0);
        double statistic = excess * excess / discordant;
        return Gamma.regularizedGammaQ(0.5, statistic / 2);
    }

    /**
     * Power of McNemar's test on n pairs when the true accuracy difference is &delta; = p1 &minus; p2
     * (= (b &minus; c)/n in expectation) and the true discordance rate is &psi; = (b + c)/n in
     * expectation, by the normal approximation of Connor (1987), "Sample size for testing
     * differences in proportions for the paired-sample design", Biometrics 43:207&ndash;211:
     * &Phi;((&radic;n&middot;|&delta;| &minus; z&middot;&radic;&psi;) / &radic;(&psi; &minus; &delta;&sup2;)) with z the
     * two-sided critical value. The other tail, &Phi;((&minus;&radic;n&middot;|&delta;| &minus;
     * z&middot;&radic;&psi;) / &radic;(&psi; &minus; &delta;&sup2;)), is added; it is negligible unless
     * the power is near alpha, and with it the power at &delta; = 0 is exactly alpha.
     *
     * <p>The formula approximates the unconditional chi-square test; the exact test is somewhat
     * more conservative when n&middot;&psi; is small. When &psi; = &delta;&sup2; (no discordant item, or
     * every item discordant in one direction) the difference has no spread and the power is 1 if
     * &radic;n&middot;|&delta;| &gt; z&middot;&radic;&psi;, else 0.
     *
     * @param difference   &delta;, between &minus;1 and 1
     * @param disagreement &psi;, with |&delta;| &lt;= &psi; &lt;= 1
     */
    public static double power(double difference, double disagreement, long n, double alpha) {
        checkRates(difference, disagreement);
        PowerChecks.items("number of paired items", n);
        PowerChecks.alpha(alpha);
        double z = PowerNormal.twoSidedCritical(alpha);
        double shift = Math.sqrt(n) * Math.abs(difference);
        double threshold = z * Math.sqrt(disagreement);
        double spread = Math.sqrt(Math.max(0, disagreement - difference * difference));
        if (spread == 0) return shift > threshold ? 1 : 0;
        return PowerNormal.cdf((shift - threshold) / spread) + PowerNormal.cdf((-shift - threshold) / spread);
    }

    private static void checkCounts(long b, long c) {
        PowerChecks.count("discordant count b", b);
        PowerChecks.count("discordant count c", c);
    }

    private static void checkRates(double difference, double disagreement) {
        if (!(Math.abs(difference) <= 1)) {
            throw UserInputException.usage(
                    "accuracy difference must be between -1 and 1, got " + difference, "give it as a fraction");
        }
        PowerChecks.proportion("disagreement rate", disagreement);
        if (disagreement < Math.abs(difference)) {
            throw UserInputException.usage("disagreement rate " + disagreement
                    + " is below the accuracy difference " + Math.abs(difference),
                    "two systems differ on at least as many items as their accuracies differ by");
        }
    }
}
