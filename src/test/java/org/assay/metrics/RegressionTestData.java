package org.assay.metrics;

import java.util.ArrayList;
import java.util.List;
import org.assay.data.regression.RegressionData;

/** Permuted and repeated copies of regression data for the common metric checks. */
final class RegressionTestData {
    private RegressionTestData() {}

    /** The examples at the given indices, in that order (indices may repeat). */
    static RegressionData select(RegressionData r, int[] index) {
        double[] y = new double[index.length], p = new double[index.length];
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < index.length; i++) {
            y[i] = r.target()[index[i]];
            p[i] = r.prediction()[index[i]];
            ids.add(r.ids().get(index[i]) + "#" + i);
        }
        return new RegressionData(r.source(), ids, y, p);
    }

    /** Index i repeated weights[i] times. */
    static int[] repeat(int[] weights) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < weights.length; i++) for (int k = 0; k < weights[i]; k++) out.add(i);
        return out.stream().mapToInt(Integer::intValue).toArray();
    }
}
