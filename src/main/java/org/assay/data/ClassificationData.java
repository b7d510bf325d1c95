package org.assay.data;

import java.nio.file.Path;
import java.util.List;

/**
 * Classification predictions joined with their ground truth, one entry per example, in the
 * order of the predictions file. Classes are coded 0..K-1 in the order of {@link #classes()}.
 *
 * @param source        the predictions file
 * @param ids           example ids, unique (a compact list, decoded on access)
 * @param classes       class labels as strings; index = class code
 * @param truth         true class code per example
 * @param predicted     predicted class code per example, or null when the file has no predicted
 *                      label and no per-class probabilities to take the arg-max of
 * @param scores        binary score of the positive class per example, or null
 * @param probabilities per-class probabilities, n rows x K classes, or null
 * @param positive      code of the positive class, or -1 when none is named (multiclass)
 * @param warnings      non-fatal findings, each one line naming the file and row
 * @param truthRows     rows of the separate truth file (the whole test set, say), or -1 when none was read
 */
public record ClassificationData(
        Path source,
        List<String> ids,
        List<String> classes,
        int[] truth,
        int[] predicted,
        double[] scores,
        ProbabilityTable probabilities,
        int positive,
        List<String> warnings,
        long truthRows) implements EvaluationData {

    /** Data whose labels came with the predictions (no separate truth file). */
    public ClassificationData(Path source, List<String> ids, List<String> classes, int[] truth, int[] predicted,
                              double[] scores, ProbabilityTable probabilities, int positive, List<String> warnings) {
        this(source, ids, classes, truth, predicted, scores, probabilities, positive, warnings, -1);
    }

    public int size() { return truth.length; }

    public int classCount() { return classes.size(); }

    public boolean isBinary() { return classes.size() == 2; }

    /** Score of the positive class: the score column, else the positive class's probability. */
    public double[] positiveScores() {
        if (scores != null) return scores;
        if (probabilities != null && positive >= 0) {
            double[] s = new double[size()];
            for (int i = 0; i < s.length; i++) s[i] = probabilities.get(i, positive);
            return s;
        }
        return null;
    }
}
