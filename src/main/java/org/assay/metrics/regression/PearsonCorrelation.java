package org.assay.metrics.regression;

import org.assay.metrics.SumStatistic;

/**
 * Pearson's correlation of two variables from weighted sums. A unit contributes
 * (1, x', y', x'², y'², x'y'), x' and y' centred by their full-data means
 * (see {@link CentredSums} for why). Undefined (NaN) when either variable is constant.
 */
final class PearsonCorrelation {
    private PearsonCorrelation() {}

    static SumStatistic of(double[] x, double[] y) {
        int n = x.length;
        double cx = CentredSums.mean(x);
        double cy = CentredSums.mean(y);
        double[] stats = new double[6 * n];
        for (int i = 0; i < n; i++) {
            double a = x[i] - cx;
            double b = y[i] - cy;
            int at = 6 * i;
            stats[at] = 1;
            stats[at + 1] = a;
            stats[at + 2] = b;
            stats[at + 3] = a * a;
            stats[at + 4] = b * b;
            stats[at + 5] = a * b;
        }
        return new SumStatistic(new DenseUnitTable(stats, 6), PearsonCorrelation::value);
    }

    static double value(double[] s) {
        if (s[0] == 0) return Double.NaN;
        double sxx = CentredSums.squares(s[0], s[1], s[3]);
        double syy = CentredSums.squares(s[0], s[2], s[4]);
        double sxy = CentredSums.products(s[0], s[1], s[2], s[5]);
        return CentredSums.correlation(sxx, syy, sxy);
    }
}
