package org.assay.stats;

/**
 * What n test items can say about the gap between two printed accuracies p1 and p2 of systems
 * evaluated on the same items, when only the printed values are known. The paired test
 * ({@link McNemarTest}) needs the discordant counts b (first right, second wrong) and c (the other
 * way round), which a results table does not show; only b &minus; c is fixed by the accuracies.
 * So the analysis is a range over the unknown disagreement rate &psi; = (b + c)/n, in the spirit of
 * Card et al. (2020), "With Little Power Comes Great Responsibility", EMNLP:
 * <ul>
 *   <li>{@code mostFavourable}: &psi; = |p1 &minus; p2|, every disagreement in one direction (c = 0
 *       or b = 0): the smallest p-value and, in practice, the highest power the gap can have;</li>
 *   <li>{@code leastFavourable}: &psi; = min(p1 + p2, 2 &minus; p1 &minus; p2), as many disagreements
 *       as the accuracies allow (no item both get right, or none both get wrong).</li>
 * </ul>
 * The true value lies between; for strongly correlated systems it is near the favourable end.
 *
 * <p>Rounding: the printed proportions are first turned into counts of correct items,
 * k = round(p&middot;n) (half up); then b &minus; c = k1 &minus; k2 exactly, and the ends are
 * b + c = |k1 &minus; k2| and b + c = min(k1 + k2, 2n &minus; k1 &minus; k2). Both ends then have
 * integer b and c (b + c and b &minus; c have the same parity), and every number in this record
 * (the p-values, Connor's power with &delta; = (b &minus; c)/n and &psi; = (b + c)/n, and the unpaired
 * results on k1/n and k2/n) describes the same pair of counts. The disagreement rates are thus
 * |k1 &minus; k2|/n rather than |p1 &minus; p2| when p&middot;n is not a whole number.
 *
 * @param p1               first printed accuracy, as given
 * @param p2               second printed accuracy, as given
 * @param n                number of test items both were evaluated on
 * @param alpha            two-sided significance level
 * @param correct1         round(p1&middot;n)
 * @param correct2         round(p2&middot;n)
 * @param mostFavourable   the end with the fewest disagreements
 * @param leastFavourable  the end with the most disagreements
 * @param unpairedPValue   {@link TwoProportionTest#pValue} on k1/n and k2/n, n items each
 * @param unpairedPower    {@link TwoProportionTest#power} at the observed gap, n items each
 */
public record PairedGapRange(double p1, double p2, long n, double alpha, long correct1, long correct2,
                             End mostFavourable, End leastFavourable,
                             double unpairedPValue, double unpairedPower) {

    /**
     * One end of the range of disagreement rates.
     *
     * @param disagreement (b + c)/n
     * @param b            items the first system gets right and the second wrong
     * @param c            items the second system gets right and the first wrong
     * @param exactPValue  {@link McNemarTest#exactPValue}(b, c)
     * @param power        {@link McNemarTest#power} at &delta; = (b &minus; c)/n, &psi; = (b + c)/n
     */
    public record End(double disagreement, long b, long c, double exactPValue, double power) {}

    /** The range for printed accuracies p1, p2 (fractions) on the same n items, at level alpha. */
    public static PairedGapRange of(double p1, double p2, long n, double alpha) {
        PowerChecks.proportion("first accuracy", p1);
        PowerChecks.proportion("second accuracy", p2);
        PowerChecks.items("number of test items", n);
        PowerChecks.alpha(alpha);
        long k1 = Math.round(p1 * n);
        long k2 = Math.round(p2 * n);
        long gap = k1 - k2;
        End most = end(gap, Math.abs(gap), n, alpha);
        End least = end(gap, Math.min(k1 + k2, 2 * n - k1 - k2), n, alpha);
        double q1 = (double) k1 / n;
        double q2 = (double) k2 / n;
        return new PairedGapRange(p1, p2, n, alpha, k1, k2, most, least,
                TwoProportionTest.pValue(q1, q2, n, n), TwoProportionTest.power(q1, q2, n, n, alpha));
    }

    private static End end(long gap, long discordant, long n, double alpha) {
        long b = (discordant + gap) / 2;
        long c = (discordant - gap) / 2;
        return new End((double) discordant / n, b, c, McNemarTest.exactPValue(b, c),
                McNemarTest.power((double) gap / n, (double) discordant / n, n, alpha));
    }
}
