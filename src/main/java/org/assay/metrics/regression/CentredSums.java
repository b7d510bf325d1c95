package org.assay.metrics.regression;

/**
 * Sums of squares and cross-products from weighted sums of centred values.
 *
 * <p>Values are centred once by their full-data mean before anything is summed, so
 * {@code S_xx = sum w x'^2 - (sum w x')^2 / W} never subtracts two huge, nearly equal numbers:
 * with a target of 1e6 + noise the raw sums of squares would be about 1e12 per unit and their
 * difference would keep only a few digits. A resample's mean differs from the full-data mean
 * by a fraction of a standard deviation, so the correction term stays small.
 */
final class CentredSums {
    /**
     * A sum of squares is taken as zero (the values as constant) when it is below this
     * fraction of the uncorrected sum: what is left is rounding error, not spread.
     */
    private static final double CONSTANT_TOLERANCE = 1e-12;

    private CentredSums() {}

    static double mean(double[] values) {
        double sum = 0;
        for (double v : values) sum += v;
        return sum / values.length;
    }

    /** Sum of squares about the weighted mean, or NaN when the values are constant (or W is 0). */
    static double squares(double weight, double sum, double sumOfSquares) {
        if (weight == 0) return Double.NaN;
        double s = sumOfSquares - sum * sum / weight;
        return s <= CONSTANT_TOLERANCE * sumOfSquares ? Double.NaN : s;
    }

    /** Sum of cross-products about the weighted means. */
    static double products(double weight, double sumX, double sumY, double sumXY) {
        return sumXY - sumX * sumY / weight;
    }

    /** Pearson's r from the sums of squares and products, clamped to [-1, 1] against rounding. */
    static double correlation(double sxx, double syy, double sxy) {
        double r = sxy / Math.sqrt(sxx * syy);   // NaN when either is NaN (constant values)
        return Double.isNaN(r) ? r : Math.max(-1, Math.min(1, r));
    }
}
