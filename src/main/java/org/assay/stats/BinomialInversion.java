package org.assay.stats;

import org.apache.commons.math3.distribution.BinomialDistribution;

/**
 * Exact draws from Binomial(trials, p) for parameters that change from draw to draw (the
 * conditional binomials of a multinomial), by inversion: the draw for a uniform u is the smallest
 * x with F(x) &gt; u, as {@link BootstrapBinomialSampler} gives for fixed parameters. The search
 * starts at the mode and walks outward with the ratio P(x+1)/P(x) = (trials - x)/(x + 1) &middot;
 * p/(1 - p): the modal method of Kemp (1986), Communications in Statistics - Theory and Methods
 * 15:805-813 (from memory). The mass at the mode is Commons Math's saddle-point pmf
 * ({@link BinomialDistribution#probability}); F at the mode is the sum of the lower tail by the
 * same ratio, down to where the terms fall below 1e-20 of the sum. That sum is used rather than
 * Commons Math's regularized-beta CDF, which drifts by up to 5e-11 at three million trials, so
 * that the walk inverts exactly the masses it steps through.
 *
 * <p>Cost: about ten standard deviations of steps for F at the mode and one for the walk, so
 * O(sqrt(trials p (1 - p))) per draw and no table, where a table over the support would cost
 * O(trials) per parameter pair. Accuracy: each mass carries rounding of about 1e-16 per step,
 * so a draw can differ from exact inversion only when u falls within about 1e-13 of a step of F;
 * the uniform itself has a resolution of 2^-53.
 */
final class BinomialInversion {
    /** Lower-tail terms below this share of the running sum are dropped (their total stays under 1e-16). */
    private static final double NEGLIGIBLE = 1e-20;

    private BinomialInversion() {}

    /** The smallest x in [0, trials] with F(x) &gt; u, for u in [0, 1). */
    static int inverse(int trials, double p, double u) {
        if (trials < 0 || !(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("need trials >= 0 and 0 <= p <= 1, got " + trials + ", " + p);
        }
        if (trials == 0 || p == 0) return 0;
        if (p == 1) return trials;
        int mode = (int) Math.min(trials, Math.floor((trials + 1.0) * p));
        double atMode = new BinomialDistribution(null, trials, p).probability(mode);
        double odds = p / (1 - p);

        double cdf = atMode;   // F(mode): the lower tail summed from the mode down
        double mass = atMode;
        for (int x = mode; x > 0; x--) {
            mass *= x / ((trials - x + 1.0) * odds);   // P(x - 1)
            cdf += mass;
            if (mass < NEGLIGIBLE * cdf) break;
        }

        int x = mode;
        mass = atMode;
        if (u < cdf) {
            // the answer is at most the mode: step down while F(x - 1) still exceeds u
            while (x > 0) {
                double below = cdf - mass;
                if (!(below > u)) return x;
                mass *= x / ((trials - x + 1.0) * odds);
                cdf = below;
                x--;
            }
            return 0;
        }
        // F(mode) <= u: step up until F(x) exceeds u; past negligible mass, u sits in F's rounding
        while (x < trials) {
            mass *= (trials - x) * odds / (x + 1.0);   // P(x + 1)
            x++;
            cdf += mass;
            if (cdf > u || mass < NEGLIGIBLE * cdf) return x;
        }
        return trials;
    }
}
