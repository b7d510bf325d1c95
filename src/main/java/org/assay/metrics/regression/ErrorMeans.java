package org.assay.metrics.regression;

import org.assay.data.regression.RegressionData;
import org.assay.metrics.SumStatistic;

/**
 * Mean absolute error and root mean squared error. A unit contributes (1, |e|) or (1, e²),
 * e = target - prediction, so a weighted mean is a ratio of two sums.
 */
final class ErrorMeans {
    private ErrorMeans() {}

    static SumStatistic meanAbsoluteError(RegressionData data) {
        return new SumStatistic(table(data, false), sums -> sums[0] == 0 ? Double.NaN : sums[1] / sums[0]);
    }

    static SumStatistic rootMeanSquaredError(RegressionData data) {
        return new SumStatistic(table(data, true), sums -> sums[0] == 0 ? Double.NaN : Math.sqrt(sums[1] / sums[0]));
    }

    private static DenseUnitTable table(RegressionData data, boolean squared) {
        int n = data.size();
        double[] stats = new double[2 * n];
        for (int i = 0; i < n; i++) {
            double e = data.target()[i] - data.prediction()[i];
            stats[2 * i] = 1;
            stats[2 * i + 1] = squared ? e * e : Math.abs(e);
        }
        return new DenseUnitTable(stats, 2);
    }
}
