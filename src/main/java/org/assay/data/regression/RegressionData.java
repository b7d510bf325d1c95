package org.assay.data.regression;

import java.nio.file.Path;
import java.util.List;

/**
 * Regression predictions, one example per index: its id, true value and predicted value.
 * All values are finite; ids are distinct.
 */
public record RegressionData(Path source, List<String> ids, double[] target, double[] prediction,
                             List<String> warnings)
        implements org.assay.data.EvaluationData {

    /** Data without reading warnings (built in code rather than read from a file). */
    public RegressionData(Path source, List<String> ids, double[] target, double[] prediction) {
        this(source, ids, target, prediction, List.of());
    }

    public RegressionData {
        if (ids.size() != target.length || target.length != prediction.length) {
            throw new IllegalArgumentException("ids, target and prediction differ in length: "
                    + ids.size() + ", " + target.length + ", " + prediction.length);
        }
    }

    public int size() { return target.length; }
}
