package org.assay.stats;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;

/** Adjustments of p-values for testing several hypotheses at once. */
public final class Multiplicity {
    private Multiplicity() {}

    /**
     * Holm's step-down adjusted p-values (Holm 1979, "A simple sequentially rejective multiple
     * test procedure", Scandinavian Journal of Statistics 6:65&ndash;70). With the p-values sorted
     * ascending, p&#771;_(i) = min(1, max_{j &lt;= i} (m &minus; j + 1)&middot;p_(j)); the result is in
     * the input order, monotone in p, and rejecting where p&#771; &lt;= &alpha; controls the
     * family-wise error rate at &alpha;. Ties get equal adjusted values.
     */
    public static double[] holm(double[] p) {
        int m = p.length;
        Integer[] order = ascending(p);
        double[] adjusted = new double[m];
        double runningMax = 0;
        for (int rank = 0; rank < m; rank++) {
            int i = order[rank];
            runningMax = Math.max(runningMax, Math.min(1, (m - rank) * p[i]));
            adjusted[i] = runningMax;
        }
        return adjusted;
    }

    /**
     * Benjamini&ndash;Hochberg step-up adjusted p-values (Benjamini &amp; Hochberg 1995, "Controlling
     * the false discovery rate: a practical and powerful approach to multiple testing", Journal of
     * the Royal Statistical Society B 57:289&ndash;300). With the p-values sorted ascending,
     * p&#771;_(i) = min(1, min_{j &gt;= i} m&middot;p_(j)/j); rejecting where p&#771; &lt;= &alpha;
     * controls the false discovery rate at &alpha; for independent (or positively dependent) tests.
     * The result is in the input order and monotone in p; ties get equal adjusted values.
     */
    public static double[] benjaminiHochberg(double[] p) {
        int m = p.length;
        Integer[] order = ascending(p);
        double[] adjusted = new double[m];
        double runningMin = 1;
        for (int rank = m - 1; rank >= 0; rank--) {
            int i = order[rank];
            runningMin = Math.min(runningMin, (double) m / (rank + 1) * p[i]);
            adjusted[i] = runningMin;
        }
        return adjusted;
    }

    /** Indices of {@code p} by ascending value, after checking every value is a probability. */
    private static Integer[] ascending(double[] p) {
        for (int i = 0; i < p.length; i++) {
            if (!(p[i] >= 0 && p[i] <= 1)) {
                throw new IllegalArgumentException("p-value " + i + " is not in [0, 1]: " + p[i]);
            }
        }
        Integer[] order = IntStream.range(0, p.length).boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.comparingDouble(i -> p[i]));
        return order;
    }
}
