package org.assay.stats;

/**
 * The BCa acceleration from jackknife (leave-one-out) values: Efron &amp; Tibshirani (1993),
 * An Introduction to the Bootstrap, eq. 14.15,
 * {@code a = sum (m - t_i)^3 / (6 [sum (m - t_i)^2]^(3/2))} with m the mean of the t_i.
 * The same estimate is used by scipy.stats.bootstrap and by R boot's bca.ci given jackknife
 * influence values.
 */
final class BootstrapAcceleration {
    private BootstrapAcceleration() {}

    /**
     * Acceleration from one leave-one-out value per unit: {@link #fromWeighted} with every
     * multiplicity 1, the same sums in the same order, without an n-long array of ones.
     */
    static double fromJackknife(double[] leaveOneOut) {
        double sum = 0;
        for (int i = 0; i < leaveOneOut.length; i++) {
            if (!Double.isFinite(leaveOneOut[i])) {
                throw new IllegalArgumentException("jackknife value " + i + " is not finite: " + leaveOneOut[i]);
            }
            sum += leaveOneOut[i];
        }
        if (leaveOneOut.length < 2) throw new IllegalArgumentException("the jackknife needs at least 2 units");
        double mean = sum / leaveOneOut.length;
        double squares = 0;
        double cubes = 0;
        for (double value : leaveOneOut) {
            double d = mean - value;
            squares += d * d;
            cubes += d * d * d;
        }
        if (squares == 0) return 0;
        return cubes / (6 * Math.pow(squares, 1.5));
    }

    /**
     * Acceleration from distinct leave-one-out values with their multiplicities (how many
     * units give each value), so a count statistic needs two values, not n.
     * Returns 0 when all values are equal: the jackknife then shows no skewness to correct.
     */
    static double fromWeighted(double[] values, long[] multiplicity) {
        if (values.length != multiplicity.length) {
            throw new IllegalArgumentException("values and multiplicities differ in length");
        }
        double total = 0;
        double sum = 0;
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException("jackknife value " + i + " is not finite: " + values[i]);
            }
            if (multiplicity[i] < 0) throw new IllegalArgumentException("negative multiplicity");
            total += multiplicity[i];
            sum += multiplicity[i] * values[i];
        }
        if (total < 2) throw new IllegalArgumentException("the jackknife needs at least 2 units");
        double mean = sum / total;
        double squares = 0;
        double cubes = 0;
        for (int i = 0; i < values.length; i++) {
            double d = mean - values[i];
            squares += multiplicity[i] * d * d;
            cubes += multiplicity[i] * d * d * d;
        }
        if (squares == 0) return 0;
        return cubes / (6 * Math.pow(squares, 1.5));
    }
}
