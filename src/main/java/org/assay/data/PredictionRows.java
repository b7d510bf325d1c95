package org.assay.data;

import org.apache.commons.math3.util.ResizableDoubleArray;
import org.assay.common.UserInputException;

import java.nio.file.Path;

/**
 * The rows of a predictions file, read into primitive arrays. Labels carry provisional codes from
 * the shared {@link LabelTable}; probabilities are row-major in the file's column order.
 *
 * @param ids                 ids in file order, with their lines
 * @param truth               provisional code of each row's true label
 * @param predicted           provisional code of each row's predicted label, or null
 * @param scores              score per row, or null
 * @param probabilities       row-major rows x probabilityClasses.length, or null
 * @param probabilityClasses  provisional code of each probability column's class
 */
record PredictionRows(IdRegistry ids, int[] truth, int[] predicted, double[] scores,
                      double[] probabilities, int[] probabilityClasses) {

    int size() { return truth.length; }

    int line(int row) { return ids.line(row); }

    static PredictionRows read(Path file, ReadOptions options, TruthFile truthFile, LabelTable labels) {
        try (RowSource rows = Format.of(file).open(file, "predictions file", options)) {
            PredictionColumns columns = PredictionColumns.resolve(rows, options, truthFile != null);
            int[] probabilityClasses = new int[columns.probability().length];
            for (int c = 0; c < probabilityClasses.length; c++) {
                probabilityClasses[c] = labels.code(columns.probabilityClasses().get(c), file, rows.headerLine());
            }
            Columns.requireFirstRow(rows);
            return new Reading(file, options, truthFile, labels, columns).readAll(rows, probabilityClasses);
        }
    }

    /** The state of one pass over the rows. */
    private static final class Reading {
        private final Path file;
        private final ReadOptions options;
        private final TruthFile truthFile;
        private final LabelTable labels;
        private final PredictionColumns columns;
        private final IdRegistry ids;
        private final IntColumn truth = new IntColumn();
        private final IntColumn predicted = new IntColumn();
        private final ResizableDoubleArray scores = new ResizableDoubleArray();
        private final ResizableDoubleArray probabilities = new ResizableDoubleArray();
        private int missingFromTruth;
        private String firstMissingId;
        private int firstMissingLine;

        Reading(Path file, ReadOptions options, TruthFile truthFile, LabelTable labels, PredictionColumns columns) {
            this.file = file;
            this.options = options;
            this.truthFile = truthFile;
            this.labels = labels;
            this.columns = columns;
            this.ids = new IdRegistry(file);
        }

        PredictionRows readAll(RowSource rows, int[] probabilityClasses) {
            do {
                readRow(rows);
            } while (rows.next());
            if (missingFromTruth > 0) {
                throw new UserInputException(file, RowErrors.line(firstMissingLine),
                        "id '" + firstMissingId + "' is not in the truth file " + options.truth()
                                + (missingFromTruth > 1 ? " (and " + (missingFromTruth - 1) + " more ids)" : "")
                                + truthFile.ids().similarHint(firstMissingId),
                        "give a truth file that covers every example, or check that both files use the same ids");
            }
            return new PredictionRows(ids, truth.toArray(),
                    columns.hasPrediction() ? predicted.toArray() : null,
                    columns.hasScore() ? scores.getElements() : null,
                    columns.hasProbabilities() ? probabilities.getElements() : null,
                    probabilityClasses);
        }

        private void readRow(RowSource rows) {
            int line = rows.line();
            String id = rows.value(columns.id());
            ids.add(id, line);
            truth.add(trueLabel(rows, id, line));
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
                scores.addElement(NumberField.parse(rows.value(columns.score()), options.scoreColumn(), file, line));
            }
            for (int c = 0; c < columns.probability().length; c++) {
                String name = rows.columns().get(columns.probability()[c]);
                double p = NumberField.parse(rows.value(columns.probability()[c]), name, file, line);
                if (p < 0 || p > 1) {
                    throw new UserInputException(file, RowErrors.line(line),
                            "probability '" + name + "' is " + p + ", outside [0, 1]",
                            "give probabilities, not logits or percentages (apply softmax, or divide by 100)");
                }
                probabilities.addElement(p);
            }
        }

        /** The true label from the label column, the truth file, or both when they agree. */
        private int trueLabel(RowSource rows, String id, int line) {
            String fromColumn = null;
            if (columns.hasLabel()) {
                fromColumn = rows.value(columns.label());
                if (fromColumn.isBlank()) {
                    throw new UserInputException(file, RowErrors.line(line),
                            "the label '" + options.labelColumn() + "' is empty",
                            "give every example its true label");
                }
            }
            if (truthFile == null) return labels.code(fromColumn, file, line);
            int at = truthFile.ids().indexOf(id);
            if (at < 0) {
                if (missingFromTruth++ == 0) {
                    firstMissingId = id;
                    firstMissingLine = line;
                }
                return fromColumn == null ? -1 : labels.code(fromColumn, file, line);
            }
            int fromTruth = truthFile.label(at);
            if (fromColumn != null && !fromColumn.equals(labels.label(fromTruth))) {
                throw new UserInputException(file, RowErrors.line(line),
                        "id '" + id + "' has label '" + fromColumn + "' here but '" + labels.label(fromTruth)
                                + "' in the truth file " + options.truth() + " (line " + truthFile.ids().line(at) + ")",
                        "check which file is right; drop the label column or the truth file if one is stale");
            }
            return fromTruth;
        }
    }
}
