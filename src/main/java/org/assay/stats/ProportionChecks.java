package org.assay.stats;

import org.apache.commons.math3.distribution.NormalDistribution;

/** Argument checks and helpers shared by every {@link ProportionInterval}: one place, one wording. */
final class ProportionChecks {
    private ProportionChecks() {}

    static void check(long successes, long trials, double confidence) {
        if (trials <= 0) {
            throw new IllegalArgumentException("trials must be > 0, got " + trials);
        }
        if (successes < 0 || successes > trials) {
            throw new IllegalArgumentException("successes must be in [0, " + trials + "], got " + successes);
        }
        checkConfidence(confidence);
    }

    static void checkConfidence(double confidence) {
        if (!(confidence > 0 && confidence < 1)) {
            throw new IllegalArgumentException("confidence must be strictly between 0 and 1, got " + confidence);
        }
    }

    /** The standard normal quantile z with P(Z > z) = (1 - confidence) / 2. */
    static double zCritical(double confidence) {
        // A null RandomGenerator: no sampling is needed, and building the default RNG is costly.
        return new NormalDistribution(null, 0, 1).inverseCumulativeProbability(1 - (1 - confidence) / 2);
    }

    static double clip01(double x) {
        return Math.max(0, Math.min(1, x));
    }
}
