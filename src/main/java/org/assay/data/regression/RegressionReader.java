package org.assay.data.regression;

import java.nio.file.Path;
import java.util.List;
import org.assay.common.Progress;
import org.assay.data.DoubleColumn;
import org.assay.data.TableRows;

/**
 * Reads regression predictions: CSV, TSV or JSON Lines (chosen by extension), one example per
 * row with an id, the true value and the predicted value. Parsing, number checks and id checks
 * are the ones the classification reader uses (through {@link TableRows}); every problem is a
 * {@link org.assay.common.UserInputException} naming the file and line.
 */
public final class RegressionReader {
    private RegressionReader() {}

    public static RegressionData read(Path file, RegressionColumns columns) {
        return read(file, columns, Progress.NONE);
    }

    /** As {@link #read(Path, RegressionColumns)}, reporting the bytes read to {@code progress}. */
    public static RegressionData read(Path file, RegressionColumns columns, Progress progress) {
        long size;
        try {
            size = java.nio.file.Files.size(file);
        } catch (java.io.IOException | RuntimeException e) {
            size = 0;   // the reader reports a missing file
        }
        try (Progress.Task reading = progress.start("reading " + file.getFileName(), size);
             TableRows rows = TableRows.open(file, "predictions file", reading)) {
            int id = rows.requireColumn(columns.id(), "the example ids",
                    "set --id-column to the column that holds the example ids");
            int target = rows.requireColumn(columns.target(), "the true values",
                    "set --target-column to the column that holds the true values");
            int prediction = rows.requireColumn(columns.prediction(), "the predicted values",
                    "set --prediction-column to the column that holds the predicted values");
            rows.requireFirstRow();
            DoubleColumn truth = new DoubleColumn();
            DoubleColumn predicted = new DoubleColumn();
            do {
                rows.uniqueId(id);
                truth.add(rows.number(target));
                predicted.add(rows.number(prediction));
            } while (rows.next());
            return new RegressionData(file, rows.ids(), truth.toArray(), predicted.toArray(),
                    rows.caseWarning().map(List::of).orElse(List.of()));
        }
    }
}
