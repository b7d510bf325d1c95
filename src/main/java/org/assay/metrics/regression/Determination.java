package org.assay.metrics.regression;

import org.assay.data.regression.RegressionData;
import org.assay.metrics.SumStatistic;

/**
 * The coefficient of determination R² = 1 - SS_res / SS_tot, SS_tot about the resample's own
 * weighted mean of the target. A unit contributes (1, y', y'², e²) with y' the target centred
 * by its full-data mean and e = target - prediction. Undefined (NaN) when the target is
 * constant; scikit-learn then returns 1 or 0 by default (force_finite=True).
 */
final class Determination {
    private Determination() {}

    static SumStatistic of(RegressionData data) {
        int n = data.size();
        double centre = CentredSums.mean(data.target());
        double[] stats = new double[4 * n];
        for (int i = 0; i < n; i++) {
            double y = data.target()[i];
            double yc = y - centre;
            double e = y - data.prediction()[i];
            stats[4 * i] = 1;
            stats[4 * i + 1] = yc;
            stats[4 * i + 2] = yc * yc;
            stats[4 * i + 3] = e * e;
        }
        return new SumStatistic(new DenseUnitTable(stats, 4), Determination::value);
    }

    static double value(double[] sums) {
        double ssTot = CentredSums.squares(sums[0], sums[1], sums[2]);
        return 1 - sums[3] / ssTot;
    }
}
