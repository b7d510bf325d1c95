package org.assay.stats;

import java.util.Arrays;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.assay.common.UserInputException;

/**
 * The bootstrap replicates of one statistic, with the intervals and tests read from them.
 * Immutable.
 *
 * <p>Quantile rule: every quantile q(p) of the replicates is the linear interpolation between
 * order statistics at 0-based position (B - 1) p (Hyndman &amp; Fan 1996 definition 7; the
 * default of numpy.percentile, used by scipy.stats.bootstrap). R boot's norm.inter
 * interpolates at (B + 1) p on the normal scale instead; at B in the thousands the two differ
 * by a fraction of one order-statistic spacing.
 */
public final class BootstrapDistribution {
    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);
    private static final String RESCALED = " (finite-population rescaled)";

    private final double estimate;
    private final double[] sorted;
    private final double acceleration;
    private final long units;
    private final boolean countShortcut;
    private final boolean rescaled;
    private final boolean categoryShortcut;

    /** {@code replicates} is taken over and sorted in place. */
    BootstrapDistribution(double estimate, double[] replicates, double acceleration, long units,
                          boolean countShortcut, boolean rescaled) {
        this(estimate, replicates, acceleration, units, countShortcut, rescaled, false);
    }

    /** As above; {@code categoryShortcut} says the replicates came from multinomial category counts. */
    BootstrapDistribution(double estimate, double[] replicates, double acceleration, long units,
                          boolean countShortcut, boolean rescaled, boolean categoryShortcut) {
        Arrays.sort(replicates);
        this.estimate = estimate;
        this.sorted = replicates;
        this.acceleration = acceleration;
        this.units = units;
        this.countShortcut = countShortcut;
        this.rescaled = rescaled;
        this.categoryShortcut = categoryShortcut;
    }

    /** The statistic on the data (every unit weighted 1). */
    public double estimate() { return estimate; }

    /** The replicates, sorted ascending (a copy). */
    public double[] replicates() { return sorted.clone(); }

    public int resamples() { return sorted.length; }

    /** Resampling units the distribution was built from (n). */
    public long units() { return units; }

    /** True when the replicates were drawn as binomial counts instead of weight vectors. */
    public boolean countShortcut() { return countShortcut; }

    /** True when the replicates were drawn as multinomial category counts instead of weight vectors. */
    public boolean categoryShortcut() { return categoryShortcut; }

    /** True after {@link #withFinitePopulation(long, long)}. */
    public boolean finitePopulationRescaled() { return rescaled; }

    /** BCa acceleration from the jackknife (Efron &amp; Tibshirani 1993 eq. 14.15). */
    double acceleration() { return acceleration; }

    /** Standard deviation of the replicates with divisor B - 1 (as scipy and R boot report). */
    public double standardError() {
        return new StandardDeviation(true).evaluate(sorted);
    }

    /**
     * The rescaling bootstrap for a simple random sample of n units drawn without replacement
     * from N: every replicate's deviation from the estimate is multiplied by
     * sqrt((N - n)/(N - 1)), so the bootstrap variance carries the finite-population correction
     * (the rescaling idea of Rao &amp; Wu 1988, JASA 83:231-241, in its simplest form). This is
     * an approximation: it corrects the spread, not the shape, of the with-replacement
     * distribution. n == N gives a zero-width distribution at the estimate (the whole
     * population was observed). The acceleration is unchanged, being scale-free.
     *
     * @throws UserInputException when n differs from {@link #units()}, or N &lt; n
     * @throws IllegalStateException when this distribution is already rescaled
     */
    public BootstrapDistribution withFinitePopulation(long n, long populationSize) {
        if (rescaled) throw new IllegalStateException("bootstrap distribution is already finite-population rescaled");
        if (n != units) {
            throw UserInputException.usage("finite-population correction for n = " + n
                    + " units, but the bootstrap resampled " + units, "pass the number of units resampled");
        }
        if (populationSize < n) {
            throw UserInputException.usage("population size " + populationSize + " is smaller than the sample size " + n,
                    "check the stated test-set size");
        }
        double factor = Math.sqrt((double) (populationSize - n) / (populationSize - 1));
        double[] scaled = new double[sorted.length];
        for (int b = 0; b < sorted.length; b++) {
            // an affine map with factor >= 0 keeps the order, and exact ties at the estimate
            scaled[b] = estimate + factor * (sorted[b] - estimate);
        }
        return new BootstrapDistribution(estimate, scaled, acceleration, units, countShortcut, true, categoryShortcut);
    }

    /** Percentile interval [q(alpha/2), q(1 - alpha/2)] (Efron &amp; Tibshirani 1993 ch. 13). */
    public Interval percentile(double confidence) {
        double tail = tail(confidence);
        return new Interval(quantile(tail), quantile(1 - tail), confidence, name("bootstrap percentile"));
    }

    /**
     * Basic (reverse percentile) interval [2 t - q(1 - alpha/2), 2 t - q(alpha/2)]
     * (Davison &amp; Hinkley 1997, Bootstrap Methods and their Application, eq. 5.6).
     */
    public Interval basic(double confidence) {
        double tail = tail(confidence);
        return new Interval(2 * estimate - quantile(1 - tail), 2 * estimate - quantile(tail),
                confidence, name("bootstrap basic"));
    }

    /**
     * Bias-corrected and accelerated interval (Efron 1987, JASA 82:171-185; DiCiccio &amp;
     * Efron 1996, Stat. Sci. 11:189-228): endpoints q(Phi(z0 + (z0 + z)/(1 - a (z0 + z))))
     * for z = Phi^-1(alpha/2) and Phi^-1(1 - alpha/2).
     *
     * <p>z0 = Phi^-1 of the fraction of replicates below the estimate, ties at the estimate
     * counted one half (the "mean" rank used by scipy.stats.bootstrap 1.10; it matters for
     * discrete statistics such as proportions, where many replicates equal the estimate).
     * The acceleration a is from the jackknife (Efron &amp; Tibshirani 1993 eq. 14.15).
     *
     * <p>Degenerate cases: all replicates equal gives the zero-width interval at the estimate.
     * When every replicate lies on one side of the estimate z0 is infinite, and when
     * a (z0 + z) &ge; 1 the correction is undefined; both return the percentile interval,
     * with the method name saying "BCa fallback" and why.
     */
    public Interval bca(double confidence) {
        double tail = tail(confidence);
        if (sorted[0] == sorted[sorted.length - 1]) {
            return new Interval(estimate, estimate, confidence, name("bootstrap BCa"));
        }
        long below = 0;
        long atOrBelow = 0;
        for (double t : sorted) {
            if (t < estimate) below++;
            if (t <= estimate) atOrBelow++;
        }
        double fraction = (below + atOrBelow) / (2.0 * sorted.length);
        if (fraction == 0 || fraction == 1) {
            return fallback(confidence, "no replicates on one side of the estimate");
        }
        double z0 = STANDARD_NORMAL.inverseCumulativeProbability(fraction);
        double zLow = STANDARD_NORMAL.inverseCumulativeProbability(tail);
        double zHigh = -zLow;
        double denomLow = 1 - acceleration * (z0 + zLow);
        double denomHigh = 1 - acceleration * (z0 + zHigh);
        if (denomLow <= 0 || denomHigh <= 0) {
            return fallback(confidence, "acceleration too large");
        }
        double levelLow = STANDARD_NORMAL.cumulativeProbability(z0 + (z0 + zLow) / denomLow);
        double levelHigh = STANDARD_NORMAL.cumulativeProbability(z0 + (z0 + zHigh) / denomHigh);
        return new Interval(quantile(levelLow), quantile(levelHigh), confidence, name("bootstrap BCa"));
    }

    /**
     * Two-sided p-value for H0: the true value lies in [lo, hi] (a claim's rounding interval).
     * 1 when the estimate is inside; otherwise, with c the point of [lo, hi] nearest the
     * estimate, min(1, 2 min(#(t* &le; c) + 1, #(t* &ge; c) + 1) / (B + 1)): the smallest
     * level at which a percentile interval would exclude c, with the usual +1 correction so
     * a Monte Carlo p-value is never 0 (Davison &amp; Hinkley 1997 sec. 4.2.1, the (1 + #)/(B + 1)
     * rule).
     */
    public double twoSidedPValue(double lo, double hi) {
        if (Double.isNaN(lo) || Double.isNaN(hi) || lo > hi) {
            throw new IllegalArgumentException("[" + lo + ", " + hi + "] is not an interval");
        }
        if (estimate >= lo && estimate <= hi) return 1.0;
        double c = estimate < lo ? lo : hi;
        long atOrBelow = 0;
        long atOrAbove = 0;
        for (double t : sorted) {
            if (t <= c) atOrBelow++;
            if (t >= c) atOrAbove++;
        }
        double p = 2.0 * (Math.min(atOrBelow, atOrAbove) + 1) / (sorted.length + 1.0);
        return Math.min(1.0, p);
    }

    /**
     * Where a reproduction like this one would fall if the true value were {@code claimed}:
     * the percentile interval's deviations from the estimate moved to the claim,
     * [claimed + (q(alpha/2) - t), claimed + (q(1 - alpha/2) - t)].
     */
    public double[] rangeIfTrue(double claimed, double confidence) {
        double tail = tail(confidence);
        return new double[] {claimed + (quantile(tail) - estimate), claimed + (quantile(1 - tail) - estimate)};
    }

    private Interval fallback(double confidence, String why) {
        Interval p = percentile(confidence);
        return new Interval(p.lower(), p.upper(), confidence,
                name("bootstrap percentile (BCa fallback: " + why + ")"));
    }

    private double quantile(double p) { return BootstrapQuantile.linear(sorted, p); }

    private String name(String method) { return rescaled ? method + RESCALED : method; }

    private static double tail(double confidence) {
        if (!(confidence > 0 && confidence < 1)) {
            throw UserInputException.usage("confidence must be strictly between 0 and 1, got " + confidence,
                    "use e.g. 0.95");
        }
        return (1 - confidence) / 2;
    }
}
