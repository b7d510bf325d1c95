package org.assay.audit;

import org.assay.stats.ExactCountPlan;

/**
 * Exact curves for a count metric: the tests {@link CountEvidence} and {@link ClaimAssessor} apply
 * to a subsample's count, with their probabilities summed over its hypergeometric distribution
 * ({@link ExactCountPlan}).
 */
final class CountPlanCurves implements PlanCurves {
    private final ExactCountPlan exact;
    private final long testSize;
    private final double value;
    private final double confidence;
    private final Long lowerCount;
    private final Long higherCount;
    private final long agreeCount;

    /**
     * @param lowerTruth  true value one margin below the claim, or null when not planned
     * @param higherTruth true value one margin above the claim, or null when not planned
     */
    CountPlanCurves(long testSize, double value, double lo, double hi, double margin, PlanSettings settings,
                    Double lowerTruth, Double higherTruth) {
        this.testSize = testSize;
        this.value = value;
        this.confidence = settings.confidence();
        // the counts of the test set the audit tests the claim against
        long[] range = new CountEvidence(0, 1, testSize, IntervalChoice.EXACT).populationCounts(lo, hi);
        this.exact = new ExactCountPlan(testSize, range[0], range[1], settings.alpha(),
                bandLow(lo - margin - 1e-12, testSize), bandHigh(hi + margin + 1e-12, testSize),
                settings.equivalenceConfidence());
        // a true count at most one margin away (rounded toward the claim), so the power is not overstated
        this.lowerCount = lowerTruth == null ? null : Math.max(0, (long) Math.ceil(lowerTruth * testSize - 1e-9));
        this.higherCount = higherTruth == null ? null : Math.min(testSize, (long) Math.floor(higherTruth * testSize + 1e-9));
        this.agreeCount = Math.max(range[0], Math.min(range[1], Math.round(value * testSize)));
    }

    /**
     * The smallest count K whose K/N passes {@link ClaimAssessor}'s test on the agreement interval's
     * lower end, {@code lower >= claimLower - margin - 1e-12}, evaluated in the same double arithmetic.
     */
    static long bandLow(double threshold, long testSize) {
        long k = Math.max(0, Math.min(testSize + 1, (long) Math.ceil(threshold * testSize) - 2));
        while (k <= testSize && !((double) k / testSize >= threshold)) k++;
        while (k > 0 && (double) (k - 1) / testSize >= threshold) k--;
        return k;
    }

    /** The largest count K whose K/N passes {@code upper <= claimUpper + margin + 1e-12}, likewise. */
    static long bandHigh(double threshold, long testSize) {
        long k = Math.max(-1, Math.min(testSize, (long) Math.floor(threshold * testSize) + 2));
        while (k >= 0 && !((double) k / testSize <= threshold)) k--;
        while (k < testSize && (double) (k + 1) / testSize <= threshold) k++;
        return k;
    }

    /** Half-width of the exact interval when the subsample shows the claimed value (its count nearest value &middot; n). */
    @Override
    public double halfWidth(long n) {
        long k = Math.max(0, Math.min(n, Math.round(value * n)));
        return ExactCountPlan.interval(k, n, testSize, confidence).halfWidth();
    }

    @Override
    public double detectLower(long n) { return lowerCount == null ? Double.NaN : exact.discrepantPower(n, lowerCount); }

    @Override
    public double detectHigher(long n) { return higherCount == null ? Double.NaN : exact.discrepantPower(n, higherCount); }

    @Override
    public double agree(long n) { return exact.consistentPower(n, agreeCount); }

    @Override
    public boolean zigzags() { return true; }

    /** The exact tests, for the check that their regions are the audit's verdicts. */
    ExactCountPlan exact() { return exact; }

    Long lowerCount() { return lowerCount; }

    Long higherCount() { return higherCount; }

    long agreeCount() { return agreeCount; }
}
