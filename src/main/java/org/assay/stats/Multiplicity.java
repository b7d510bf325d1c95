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
        for (int i = 0; i < m; i++) {
            if (!(p[i] >= 0 && p[i] <= 1)) {
                throw new IllegalArgumentException("p-value " + i + " is not in [0, 1]: " + p[i]);
            }
        }
        Integer[] order = IntStream.range(0, m).boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.comparingDouble(i -> p[i]));
        double[] adjusted = new double[m];
        double runningMax = 0;
        for (int rank = 0; rank < m; rank++) {
            int i = order[rank];
            runningMax = Math.max(runningMax, Math.min(1, (m - rank) * p[i]));
            adjusted[i] = runningMax;
        }
        return adjusted;
    }
}
