package org.assay.data;

import java.nio.file.Path;
import java.util.List;

/**
 * A public door to this package's row sources for readers in other packages (the regression
 * reader, say): the same CSV/TSV/JSON Lines parsing, strict UTF-8, strict numbers and id checks
 * that the classification reader uses, so every reader reports bad input the same way.
 *
 * <p>In JSON Lines files every field arrives as text; {@link #number} then parses it strictly,
 * so a number written as a JSON string (such as {@code "2.5"}) is accepted like {@code 2.5}.
 */
public final class TableRows implements AutoCloseable {
    /** A probability prefix no field name starts with: no field is flattened. */
    private static final ReadOptions PLAIN_JSON =
            new ReadOptions("id", "label", "prediction", null, "\u0000", null, null, null);

    private final RowSource rows;
    private final IdRegistry ids;

    private TableRows(RowSource rows) {
        this.rows = rows;
        this.ids = new IdRegistry(rows.file());
    }

    /**
     * Opens {@code file}, its format chosen by extension (.csv, .tsv/.tab, .jsonl/.ndjson);
     * {@code what} names the file's role in messages ("predictions file").
     */
    public static TableRows open(Path file, String what) {
        return open(file, what, org.assay.common.Progress.Task.NONE);
    }

    /** As {@link #open(Path, String)}, reporting the bytes read to {@code progress}. */
    public static TableRows open(Path file, String what, org.assay.common.Progress.Task progress) {
        return new TableRows(Format.of(file).open(file, what, PLAIN_JSON, progress));
    }

    public Path file() { return rows.file(); }

    public List<String> columns() { return rows.columns(); }

    /** Index of column {@code name}, or an error listing the columns the file has. */
    public int requireColumn(String name, String purpose, String fix) {
        return Columns.require(rows, name, purpose, fix);
    }

    /** Moves to the first row, or fails when the file has a header and nothing else. */
    public void requireFirstRow() { Columns.requireFirstRow(rows); }

    /** Advances to the next row; false at the end. */
    public boolean next() { return rows.next(); }

    /** File line the current row starts on (1-based). */
    public int line() { return rows.line(); }

    /** The text of a field of the current row ("" when empty). */
    public String text(int column) { return rows.value(column); }

    /** A field of the current row as a finite number, or an error naming file, line and column. */
    public double number(int column) {
        return NumberField.parse(rows.value(column), rows.columns().get(column), rows.file(), rows.line());
    }

    /**
     * The id in {@code column} of the current row; fails on an empty id, an id seen before, or
     * one that differs from an earlier id by surrounding whitespace (ids that differ only by case
     * are accepted, see {@link #caseWarning()}).
     */
    public String uniqueId(int column) {
        String id = rows.value(column);
        ids.add(id, rows.line());
        return id;
    }

    /** The warning for ids accepted by {@link #uniqueId} that differ only by case, if any. */
    public java.util.Optional<String> caseWarning() { return ids.caseWarning(); }

    /** The ids accepted by {@link #uniqueId} so far, in order (a compact list, decoded on access). */
    public List<String> ids() { return ids.ids(); }

    @Override
    public void close() { rows.close(); }
}
