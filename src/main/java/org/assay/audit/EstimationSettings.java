package org.assay.audit;

/**
 * How estimates are computed.
 *
 * @param confidence confidence level of every interval (default 0.95)
 * @param resamples  bootstrap resamples (default 10,000)
 * @param seed       bootstrap seed (default fixed, printed in every report)
 * @param threads    worker threads; results do not depend on it
 * @param interval   interval method, AUTO by default
 */
public record EstimationSettings(double confidence, int resamples, long seed, int threads, IntervalChoice interval) {
    public static final long DEFAULT_SEED = 20240917L;
    public static final int DEFAULT_RESAMPLES = 10_000;
    public static final double DEFAULT_CONFIDENCE = 0.95;

    public EstimationSettings {
        if (!(confidence > 0.5 && confidence < 1)) {
            throw org.assay.common.UserInputException.usage("confidence " + confidence + " is outside (0.5, 1)",
                    "use for example --confidence 0.95");
        }
        if (resamples < 100) {
            throw org.assay.common.UserInputException.usage("resamples " + resamples + " is too few",
                    "use at least 1000 (default 10000)");
        }
        if (threads < 1) threads = 1;
    }

    public static EstimationSettings defaults() {
        return new EstimationSettings(DEFAULT_CONFIDENCE, DEFAULT_RESAMPLES, DEFAULT_SEED,
                Runtime.getRuntime().availableProcessors(), IntervalChoice.AUTO);
    }

    public double alpha() { return 1 - confidence; }
}
