package org.assay.audit;

import org.assay.common.UserInputException;

/**
 * What a plan aims for, and how the audit it plans for will test: the same confidence (and so the
 * same &alpha;) and, for a pilot's bootstrap, the same resamples and seed.
 *
 * @param margin     default equivalence margin on the fraction scale (0.01 = one percentage point);
 *                   a claim's own margin replaces it
 * @param power      target power of the discrepancy test and of the two one-sided tests
 * @param confidence confidence of the audit's intervals; &alpha; = 1 &minus; confidence
 * @param direction  which wrong values the discrepancy test should catch
 * @param sizes      extra subsample sizes to show in the table (each at most the test-set size)
 */
public record PlanSettings(double margin, double power, double confidence, PlanDirection direction,
                           java.util.List<Long> sizes, int resamples, long seed, int threads) {
    public PlanSettings {
        if (!(margin > 0)) {
            throw UserInputException.usage("margin " + margin * 100 + " points is not positive", "use for example --margin 1");
        }
        if (!(confidence > 0.5 && confidence < 1)) {
            throw UserInputException.usage("confidence " + confidence + " is outside (0.5, 1)",
                    "use for example --confidence 0.95 (or --alpha 0.05)");
        }
        if (!(power > 1 - confidence && power < 1)) {
            throw UserInputException.usage("power " + power + " must lie between alpha "
                    + Math.round(alpha(confidence) * 1e6) / 1e6 + " and 1",
                    "use for example --power 0.8");
        }
        sizes = sizes == null ? java.util.List.of() : java.util.List.copyOf(sizes);
        for (long n : sizes) {
            if (n < 1) throw UserInputException.usage("--sizes holds " + n + ", not a subsample size", "give sizes of at least 1");
        }
    }

    /** The level of the audit's tests, computed as the audit computes it ({@link EstimationSettings#alpha}). */
    public double alpha() { return alpha(confidence); }

    private static double alpha(double confidence) { return 1 - confidence; }

    /** The confidence of the two one-sided tests' interval, as {@link ClaimAssessor} computes it. */
    double equivalenceConfidence() { return 1 - 2 * alpha(); }

    EstimationSettings estimation() {
        return new EstimationSettings(confidence, resamples, seed, threads, IntervalChoice.AUTO);
    }
}
