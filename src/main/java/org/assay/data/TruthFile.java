package org.assay.data;

import org.assay.common.Progress;
import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.BitSet;

/**
 * The full ground truth: an id column and a label column, in any of the table formats. Labels are
 * coded in the shared {@link LabelTable}; every label here becomes a class.
 *
 * <p>The file is opened and its header checked before the predictions are read, then joined to
 * them row by row ({@link #join}): each truth id is looked up among the prediction ids and its
 * label stored in that row, so the truth file's ids are never held a second time (only those the
 * predictions lack are registered, to check them and to suggest near matches). Errors are those
 * of reading the truth file first: a label is reported where it first appears here, a label
 * column that disagrees at the earliest prediction row, an id the truth file lacks after that.
 */
final class TruthFile implements AutoCloseable {
    private final Path file;
    private final ReadOptions options;
    private final RowSource rows;
    private long rowsRead;
    private final int id;
    private final int label;

    private TruthFile(Path file, ReadOptions options, RowSource rows, int id, int label) {
        this.file = file;
        this.options = options;
        this.rows = rows;
        this.id = id;
        this.label = label;
    }

    /** Opens the truth file and checks its header and that it has a row; read it with {@link #join}. */
    static TruthFile open(Path file, ReadOptions options, Progress.Task progress) {
        RowSource rows = Format.of(file).open(file, "truth file", options, progress);
        try {
            int id = Columns.require(rows, options.idColumn(), "the example ids",
                    "set --id-column to the truth file's id column (the same name as in the predictions file)");
            int label = Columns.require(rows, options.labelColumn(), "the true labels",
                    "set --label-column to the truth file's label column");
            Columns.requireFirstRow(rows);
            return new TruthFile(file, options, rows, id, label);
        } catch (RuntimeException e) {
            rows.close();
            throw e;
        }
    }

    /**
     * Reads every truth row, puts its label into the prediction row with the same id, and checks
     * that a label column of the predictions agrees and that every prediction id has a truth row.
     *
     * @return the provisional codes of every label of the truth file (all of them are classes)
     */
    BitSet join(PredictionRows predictions, LabelTable labels) {
        JoinedIds joined = new JoinedIds(file, predictions.ids());
        IntColumn truth = predictions.truth();
        BitSet classes = new BitSet();
        int disagreeing = -1;       // earliest prediction row whose label column disagrees
        int disagreeingLine = 0;    // the truth line of that id
        int disagreeingCode = 0;
        do {
            int line = rows.line();
            int at = joined.add(rows.value(id), line);
            String text = rows.value(label);
            if (text.isBlank()) {
                throw new UserInputException(file, RowErrors.line(line),
                        "the label '" + options.labelColumn() + "' is empty",
                        "give every example its true label");
            }
            int code = labels.codeFromFileReadFirst(text, file, line);
            classes.set(code);
            if (at < 0) continue;
            int fromColumn = truth.get(at);
            if (fromColumn < 0 || fromColumn == code) {
                truth.set(at, code);
            } else if (disagreeing < 0 || at < disagreeing) {
                disagreeing = at;
                disagreeingLine = line;
                disagreeingCode = code;
            }
        } while (rows.next());
        if (disagreeing >= 0) {
            throw new UserInputException(predictions.ids().file(), RowErrors.line(predictions.line(disagreeing)),
                    "id '" + predictions.ids().id(disagreeing) + "' has label '"
                            + labels.label(truth.get(disagreeing)) + "' here but '" + labels.label(disagreeingCode)
                            + "' in the truth file " + options.truth() + " (line " + disagreeingLine + ")",
                    "check which file is right; drop the label column or the truth file if one is stale");
        }
        requireEveryPrediction(predictions, joined);
        rowsRead = joined.size();
        return classes;
    }

    private void requireEveryPrediction(PredictionRows predictions, JoinedIds joined) {
        int missing = 0;
        int first = -1;
        for (int row = 0; row < predictions.size(); row++) {
            if (joined.lineOf(row) == 0 && missing++ == 0) first = row;
        }
        if (missing == 0) return;
        String firstId = predictions.ids().id(first);
        throw new UserInputException(predictions.ids().file(), RowErrors.line(predictions.line(first)),
                "id '" + firstId + "' is not in the truth file " + options.truth()
                        + (missing > 1 ? " (and " + (missing - 1) + " more ids)" : "")
                        + joined.similarHint(firstId),
                "give a truth file that covers every example, or check that both files use the same ids");
    }

    /** Rows of the truth file, once {@link #join} has read them all. */
    long rowsRead() { return rowsRead; }

    @Override
    public void close() {
        rows.close();
    }
}
