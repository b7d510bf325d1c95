package org.assay.data;

import org.assay.common.UserInputException;

import java.util.ArrayList;
import java.util.List;

/**
 * Where each field of a predictions file is: the id (required), the true label (unless a truth
 * file gives it), the predicted label, the score and the per-class probabilities
 * ({@code <prefix><class>}); at least one of the last three.
 */
record PredictionColumns(int id, int label, int prediction, int score,
                         int[] probability, List<String> probabilityClasses) {

    boolean hasLabel() { return label != Columns.ABSENT; }
    boolean hasPrediction() { return prediction != Columns.ABSENT; }
    boolean hasScore() { return score != Columns.ABSENT; }
    boolean hasProbabilities() { return probability.length > 0; }

    static PredictionColumns resolve(RowSource rows, ReadOptions options, boolean truthGiven) {
        int id = Columns.require(rows, options.idColumn(), "the example ids",
                "set --id-column to the column that holds the example ids");
        int label = Columns.find(rows, options.labelColumn());
        if (label == Columns.ABSENT && !truthGiven) {
            throw Columns.missing(rows, "no column '" + options.labelColumn() + "' holding the true labels",
                    "set --label-column to the column with the true labels, or give the ground truth with --truth");
        }
        int prediction = Columns.find(rows, options.predictionColumn());
        int score = Columns.find(rows, options.scoreColumn());
        List<Integer> probability = new ArrayList<>();
        List<String> classes = new ArrayList<>();
        String prefix = options.probabilityPrefix();
        for (int i = 0; prefix != null && !prefix.isEmpty() && i < rows.columns().size(); i++) {
            String name = rows.columns().get(i);
            if (!name.startsWith(prefix) || i == id || i == label || i == prediction || i == score) continue;
            if (name.length() == prefix.length()) {
                throw new UserInputException(rows.file(), RowErrors.line(rows.headerLine()),
                        "probability column '" + name + "' names no class",
                        "name probability columns " + prefix + "<class>, such as " + prefix + "cat");
            }
            probability.add(i);
            classes.add(name.substring(prefix.length()));
        }
        if (prediction == Columns.ABSENT && score == Columns.ABSENT && probability.isEmpty()) {
            throw Columns.missing(rows, "no predictions: none of the columns '" + options.predictionColumn()
                            + "' (predicted label), '" + options.scoreColumn() + "' (score) or '" + prefix
                            + "<class>' (probabilities)",
                    "set --prediction-column, --score-column or --probability-prefix to the columns the file has");
        }
        return new PredictionColumns(id, label, prediction, score,
                probability.stream().mapToInt(Integer::intValue).toArray(), List.copyOf(classes));
    }
}
