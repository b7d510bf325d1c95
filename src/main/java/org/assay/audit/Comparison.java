package org.assay.audit;

import java.util.List;
import org.assay.claims.Claim;
import org.assay.stats.Interval;

/**
 * A paired comparison of two reproduced rows of one table on one column: the claimed gap A &minus; B
 * (from the printed values) beside the reproduced gap on the same items, and a test of the claimed
 * ordering. All values are on the metric's fraction scale.
 *
 * @param claimA          the first row's claim (the pair's first row in {@code compare:})
 * @param claimB          the second row's claim, same column and metric
 * @param claimedLower    lower end of the claimed gap's rounding interval: A's lower end minus B's upper end
 * @param claimedUpper    upper end: A's upper end minus B's lower end
 * @param printedGap      the printed values' difference A &minus; B; its sign is the claimed ordering
 * @param n               items both rows were evaluated on
 * @param population      full test-set size N, or null when unknown
 * @param gap             the reproduced gap A &minus; B
 * @param interval        its interval, with method
 * @param test            the test behind the p-value (McNemar exact, paired DeLong, paired bootstrap, ...)
 * @param pValue          two-sided p-value of "the rows do not differ"
 * @param adjustedP       the same adjusted across the audit's comparisons (the audit's multiplicity method)
 * @param verdict         the verdict on the claimed ordering
 * @param discordant      for count metrics, items counted (outcome 1) for A only and for B only; else null
 * @param reason          for NOT_COMPUTABLE: why; else null
 * @param notes           how the evidence was computed
 */
public record Comparison(
        Claim claimA,
        Claim claimB,
        double claimedLower,
        double claimedUpper,
        double printedGap,
        long n,
        Long population,
        double gap,
        Interval interval,
        String test,
        double pValue,
        double adjustedP,
        ComparisonVerdict verdict,
        long[] discordant,
        String reason,
        List<String> notes) {

    public String tableId() { return claimA.tableId(); }

    /** Whether the claimed gap's rounding interval meets the reproduced gap's interval. */
    public boolean claimedGapInInterval() {
        return interval != null && interval.overlaps(claimedLower, claimedUpper);
    }

    Comparison withAdjustedP(double adjusted, double alpha) {
        return new Comparison(claimA, claimB, claimedLower, claimedUpper, printedGap, n, population, gap, interval, test,
                pValue, adjusted, ComparisonVerdict.of(printedGap, gap, adjusted, alpha), discordant, reason, notes);
    }

    static Comparison notComputable(Claim a, Claim b, double[] claimed, double printedGap, String reason) {
        return new Comparison(a, b, claimed[0], claimed[1], printedGap, 0, null, Double.NaN, null, null, Double.NaN,
                Double.NaN, ComparisonVerdict.NOT_COMPUTABLE, null, reason, List.of());
    }
}
