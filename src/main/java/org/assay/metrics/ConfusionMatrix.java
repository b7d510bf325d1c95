package org.assay.metrics;

/**
 * Metrics computed from a weighted K x K confusion matrix {@code m[t * K + p]} (row = true
 * class, column = predicted class). Definitions follow scikit-learn's metrics module, which
 * the tests use as the reference; where a ratio is 0/0 the value is 0, as scikit-learn does
 * with {@code zero_division=0}.
 */
final class ConfusionMatrix {
    private ConfusionMatrix() {}

    static double total(double[] m) {
        double s = 0;
        for (double v : m) s += v;
        return s;
    }

    static double trueCount(double[] m, int k, int c) {
        double s = 0;
        for (int p = 0; p < k; p++) s += m[c * k + p];
        return s;
    }

    static double predictedCount(double[] m, int k, int c) {
        double s = 0;
        for (int t = 0; t < k; t++) s += m[t * k + c];
        return s;
    }

    static double accuracy(double[] m, int k) {
        double total = total(m);
        if (total == 0) return Double.NaN;
        double diag = 0;
        for (int c = 0; c < k; c++) diag += m[c * k + c];
        return diag / total;
    }

    private static double ratio(double num, double den) { return den == 0 ? 0 : num / den; }

    static double precision(double[] m, int k, int c) { return ratio(m[c * k + c], predictedCount(m, k, c)); }

    static double recall(double[] m, int k, int c) { return ratio(m[c * k + c], trueCount(m, k, c)); }

    static double f1(double[] m, int k, int c) {
        double tp = m[c * k + c];
        return ratio(2 * tp, trueCount(m, k, c) + predictedCount(m, k, c));
    }

    /** A class takes part in a macro average when it occurs in the truth or the predictions. */
    static boolean present(double[] m, int k, int c) {
        return trueCount(m, k, c) > 0 || predictedCount(m, k, c) > 0;
    }

    interface PerClass { double of(double[] m, int k, int c); }

    static double macro(double[] m, int k, PerClass f) {
        double s = 0;
        int classes = 0;
        for (int c = 0; c < k; c++) {
            if (present(m, k, c)) { s += f.of(m, k, c); classes++; }
        }
        return classes == 0 ? Double.NaN : s / classes;
    }

    static double weighted(double[] m, int k, PerClass f) {
        double s = 0, support = 0;
        for (int c = 0; c < k; c++) {
            double w = trueCount(m, k, c);
            s += w * f.of(m, k, c);
            support += w;
        }
        return support == 0 ? Double.NaN : s / support;
    }

    /** Micro averages pool TP, FP and FN over classes; for single-label data they all equal accuracy. */
    static double micro(double[] m, int k) { return accuracy(m, k); }

    /** Balanced accuracy: mean recall over the classes that occur in the truth (scikit-learn's rule). */
    static double balancedAccuracy(double[] m, int k) {
        double s = 0;
        int classes = 0;
        for (int c = 0; c < k; c++) {
            if (trueCount(m, k, c) > 0) { s += recall(m, k, c); classes++; }
        }
        return classes == 0 ? Double.NaN : s / classes;
    }

    /**
     * Matthews correlation for K classes, Gorodkin (2004) Comput. Biol. Chem. 28:367-374
     * (the R_K statistic); equals the binary MCC when K = 2. Zero when a denominator is zero,
     * as scikit-learn returns.
     */
    static double matthews(double[] m, int k) {
        double s = total(m);
        double c = 0;
        for (int i = 0; i < k; i++) c += m[i * k + i];
        double sumPt = 0, sumP2 = 0, sumT2 = 0;
        for (int i = 0; i < k; i++) {
            double t = trueCount(m, k, i), p = predictedCount(m, k, i);
            sumPt += p * t;
            sumP2 += p * p;
            sumT2 += t * t;
        }
        double den = Math.sqrt(s * s - sumP2) * Math.sqrt(s * s - sumT2);
        return den == 0 ? 0 : (c * s - sumPt) / den;
    }

    /** Cohen's kappa, Cohen (1960) Educ. Psychol. Meas. 20:37-46: (p_o - p_e) / (1 - p_e). */
    static double cohenKappa(double[] m, int k) {
        double s = total(m);
        if (s == 0) return Double.NaN;
        double po = accuracy(m, k);
        double pe = 0;
        for (int i = 0; i < k; i++) pe += trueCount(m, k, i) * predictedCount(m, k, i);
        pe /= s * s;
        return pe == 1 ? Double.NaN : (po - pe) / (1 - pe);
    }
}
