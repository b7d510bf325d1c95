package org.assay.stats;

import org.apache.commons.math3.distribution.BetaDistribution;

/** Quantiles of the beta distribution at full double accuracy, for the beta-based intervals. */
final class BetaQuantile {
    /** Commons Math's default inverse accuracy (1e-9 absolute) is too coarse for 1e-9 agreement. */
    private static final double INVERSE_ACCURACY = 1e-15;

    private BetaQuantile() {}

    static double quantile(double probability, double a, double b) {
        // A null RandomGenerator avoids building an RNG that is never used.
        return new BetaDistribution(null, a, b, INVERSE_ACCURACY).inverseCumulativeProbability(probability);
    }
}
