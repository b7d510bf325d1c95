package org.assay.data;

import org.assay.common.Progress;
import org.assay.common.UserInputException;

import java.nio.file.Path;

/**
 * The rows of a predictions file, read once into compact columns: no object is kept per row.
 * Labels carry provisional codes from the shared {@link LabelTable}; probabilities are row-major
 * in the file's column order. With a truth file, {@code truth} holds the label column's codes
 * (-1 without one) until {@link TruthFile#join} puts the truth file's labels there.
 *
 * @param ids                 ids in file order, with their lines
 * @param truth               provisional code of each row's true label
 * @param predicted           provisional code of each row's predicted label, or null
 * @param scores              score per row, or null
 * @param probabilities       rows x probabilityClasses.length, or null
 * @param probabilityClasses  provisional code of each probability column's class
 */
record PredictionRows(IdRegistry ids, IntColumn truth, IntColumn predicted, DoubleColumn scores,
                      ProbabilityTable probabilities, int[] probabilityClasses) {

    int size() { return truth.size(); }

    int line(int row) { return ids.line(row); }

    /** Reads every row; {@code truthGiven} says the true labels may come from a truth file instead. */
    static PredictionRows read(Path file, ReadOptions options, boolean truthGiven, LabelTable labels,
                               Progress.Task progress) {
        try (RowSource rows = Format.of(file).open(file, "predictions file", options, progress)) {
            PredictionColumns columns = PredictionColumns.resolve(rows, options, truthGiven);
            int[] probabilityClasses = new int[columns.probability().length];
            for (int c = 0; c < probabilityClasses.length; c++) {
                probabilityClasses[c] = labels.code(columns.probabilityClasses().get(c), file, rows.headerLine());
            }
            Columns.requireFirstRow(rows);
            return new Reading(file, options, labels, columns).readAll(rows, probabilityClasses);
        }
    }

    /** The state of one pass over the rows. */
    private static final class Reading {
        private final Path file;
        private final ReadOptions options;
        private final LabelTable labels;
        private final PredictionColumns columns;
        private final IdRegistry ids;
        private final IntColumn truth = new IntColumn();
        private final IntColumn predicted;
        private final DoubleColumn scores;
        private final ProbabilityTable probabilities;

        Reading(Path file, ReadOptions options, LabelTable labels, PredictionColumns columns) {
            this.file = file;
            this.options = options;
            this.labels = labels;
            this.columns = columns;
            this.ids = new IdRegistry(file);
            this.predicted = columns.hasPrediction() ? new IntColumn() : null;
            this.scores = columns.hasScore() ? new DoubleColumn() : null;
            this.probabilities = columns.hasProbabilities() ? new ProbabilityTable(columns.probability().length) : null;
        }

        PredictionRows readAll(RowSource rows, int[] probabilityClasses) {
            do {
                readRow(rows);
            } while (rows.next());
            return new PredictionRows(ids, truth, predicted, scores, probabilities, probabilityClasses);
        }

        private void readRow(RowSource rows) {
            int line = rows.line();
            ids.add(rows.value(columns.id()), line);
            truth.add(trueLabel(rows, line));
            if (columns.hasPrediction()) {
                String text = rows.value(columns.prediction());
                if (text.isBlank()) {
                    throw new UserInputException(file, RowErrors.line(line),
                            "the predicted label '" + options.predictionColumn() + "' is empty",
                            "give a predicted label for every row");
                }
                predicted.add(labels.code(text, file, line));
            }
            if (columns.hasScore()) {
                scores.add(NumberField.parse(rows.value(columns.score()), options.scoreColumn(), file, line));
            }
            for (int c = 0; c < columns.probability().length; c++) {
                String name = rows.columns().get(columns.probability()[c]);
                double p = NumberField.parse(rows.value(columns.probability()[c]), name, file, line);
                if (p < 0 || p > 1) {
                    throw new UserInputException(file, RowErrors.line(line),
                            "probability '" + name + "' is " + p + ", outside [0, 1]",
                            "give probabilities, not logits or percentages (apply softmax, or divide by 100)");
                }
                probabilities.add(p);
            }
        }

        /** The label column's code; -1 when there is none (a truth file gives the labels). */
        private int trueLabel(RowSource rows, int line) {
            if (!columns.hasLabel()) return -1;
            String text = rows.value(columns.label());
            if (text.isBlank()) {
                throw new UserInputException(file, RowErrors.line(line),
                        "the label '" + options.labelColumn() + "' is empty",
                        "give every example its true label");
            }
            return labels.code(text, file, line);
        }
    }
}
