package org.assay.stats;

import java.util.Arrays;

/** Small {@link Resampled} statistics for the bootstrap tests, each with a closed-form jackknife. */
final class BootstrapTestStatistics {
    private BootstrapTestStatistics() {}

    /** Mean of x under integer weights: sum w_i x_i / sum w_i. */
    record WeightedMean(double[] x) implements Resampled {
        @Override public int units() { return x.length; }

        @Override public double estimate() { return Arrays.stream(x).sum() / x.length; }

        @Override public double value(int[] weights) {
            double sum = 0;
            long total = 0;
            for (int i = 0; i < x.length; i++) {
                sum += weights[i] * x[i];
                total += weights[i];
            }
            return sum / total;
        }

        /** Leave-one-out mean (S - x_i) / (n - 1). */
        @Override public double[] jackknife() {
            double s = Arrays.stream(x).sum();
            return Arrays.stream(x).map(v -> (s - v) / (x.length - 1)).toArray();
        }
    }

    /** Ratio of sums over paired units: sum w_i x_i / sum w_i y_i. */
    record RatioOfSums(double[] x, double[] y) implements Resampled {
        @Override public int units() { return x.length; }

        @Override public double estimate() { return Arrays.stream(x).sum() / Arrays.stream(y).sum(); }

        @Override public double value(int[] weights) {
            double sx = 0;
            double sy = 0;
            for (int i = 0; i < x.length; i++) {
                sx += weights[i] * x[i];
                sy += weights[i] * y[i];
            }
            return sx / sy;
        }

        /** Leave-one-out ratio (Sx - x_i) / (Sy - y_i). */
        @Override public double[] jackknife() {
            double sx = Arrays.stream(x).sum();
            double sy = Arrays.stream(y).sum();
            double[] out = new double[x.length];
            for (int i = 0; i < x.length; i++) out[i] = (sx - x[i]) / (sy - y[i]);
            return out;
        }
    }

    /** n values, the first k equal to 1 and the rest 0. */
    static double[] zeroOne(int k, int n) {
        double[] x = new double[n];
        Arrays.fill(x, 0, k, 1.0);
        return x;
    }
}
