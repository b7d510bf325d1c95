package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;

/**
 * The full ground truth: an id column and a label column, in any of the table formats. Labels are
 * coded in the shared {@link LabelTable}; every label here becomes a class.
 */
final class TruthFile {
    private final IdRegistry ids;
    private final int[] labels;

    private TruthFile(IdRegistry ids, int[] labels) {
        this.ids = ids;
        this.labels = labels;
    }

    static TruthFile read(Path file, ReadOptions options, LabelTable table) {
        try (RowSource rows = Format.of(file).open(file, "truth file", options)) {
            int id = Columns.require(rows, options.idColumn(), "the example ids",
                    "set --id-column to the truth file's id column (the same name as in the predictions file)");
            int label = Columns.require(rows, options.labelColumn(), "the true labels",
                    "set --label-column to the truth file's label column");
            Columns.requireFirstRow(rows);
            IdRegistry registry = new IdRegistry(file);
            IntColumn codes = new IntColumn();
            do {
                registry.add(rows.value(id), rows.line());
                String text = rows.value(label);
                if (text.isBlank()) {
                    throw new UserInputException(file, RowErrors.line(rows.line()),
                            "the label '" + options.labelColumn() + "' is empty",
                            "give every example its true label");
                }
                codes.add(table.code(text, file, rows.line()));
            } while (rows.next());
            return new TruthFile(registry, codes.toArray());
        }
    }

    IdRegistry ids() { return ids; }

    /** Provisional code of the label of the truth row at {@code index}. */
    int label(int index) { return labels[index]; }

    int size() { return labels.length; }
}
