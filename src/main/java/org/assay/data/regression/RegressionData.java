package org.assay.data.regression;

import java.nio.file.Path;
import java.util.List;

/**
 * Regression predictions, one example per index: its id, true value and predicted value.
 * All values are finite; ids are distinct.
 */
public record RegressionData(Path source, List<String> ids, double[] target, double[] prediction)
        implements org.assay.data.EvaluationData {

    public RegressionData {
        if (ids.size() != target.length || target.length != prediction.length) {
            throw new IllegalArgumentException("ids, target and prediction differ in length: "
                    + ids.size() + ", " + target.length + ", " + prediction.length);
        }
    }

    public int size() { return target.length; }

    @Override public List<String> warnings() { return List.of(); }
}
