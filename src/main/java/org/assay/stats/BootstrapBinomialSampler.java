package org.assay.stats;

import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.BinomialDistribution;

/**
 * Draws from Binomial(trials, p) by inverting its cumulative distribution, tabulated once
 * from Commons Math {@link BinomialDistribution#probability(int)} (Loader's saddle-point
 * evaluation of the mass function). A draw is the smallest x with F(x) &gt; u for one uniform
 * u, found by bisection, so one resample costs one uniform and O(log n) comparisons.
 *
 * <p>Commons Math's own {@code inverseCumulativeProbability} would give the same draws but
 * re-evaluates the regularized beta function a dozen times per draw; the table is the same
 * inversion done once. The table covers mean &plusmn; (40 sd + 10); mass outside it is below
 * 1e-40, far under the 2^-53 resolution of the uniform, and the kept mass is renormalised.
 * Immutable and safe to share between threads.
 */
final class BootstrapBinomialSampler {
    private final int first;          // smallest tabulated count
    private final double[] cumulative; // cumulative[j] = P(X <= first + j), last entry 1

    BootstrapBinomialSampler(int trials, double p) {
        double mean = trials * p;
        double halfWidth = 40 * Math.sqrt(trials * p * (1 - p)) + 10;
        int lo = (int) Math.max(0, Math.floor(mean - halfWidth));
        int hi = (int) Math.min(trials, Math.ceil(mean + halfWidth));
        BinomialDistribution binomial = new BinomialDistribution(null, trials, p);
        double[] table = new double[hi - lo + 1];
        double running = 0;
        for (int x = lo; x <= hi; x++) {
            running += binomial.probability(x);
            table[x - lo] = running;
        }
        for (int j = 0; j < table.length; j++) table[j] /= running;
        table[table.length - 1] = 1.0; // u < 1 always finds a count
        this.first = lo;
        this.cumulative = table;
    }

    /** One count; {@code rng} supplies the single uniform in [0, 1). */
    int draw(SplittableRandom rng) {
        return inverse(rng.nextDouble());
    }

    /** The smallest count x with F(x) &gt; u, for u in [0, 1). */
    int inverse(double u) {
        int lo = 0;
        int hi = cumulative.length - 1;
        while (lo < hi) { // smallest j with cumulative[j] > u
            int mid = (lo + hi) >>> 1;
            if (cumulative[mid] > u) hi = mid; else lo = mid + 1;
        }
        return first + lo;
    }
}
