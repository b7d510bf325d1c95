package org.assay.data;

import org.assay.common.UserInputException;

import java.util.List;

/** Finding named columns in a header, with errors that list what the header does hold. */
final class Columns {
    static final int ABSENT = -1;

    private Columns() {}

    static int find(RowSource rows, String name) {
        return name == null ? ABSENT : rows.columns().indexOf(name);
    }

    /** The index of {@code name}, or an error naming the option that chooses the column. */
    static int require(RowSource rows, String name, String purpose, String fix) {
        int at = find(rows, name);
        if (at == ABSENT) throw missing(rows, "no column '" + name + "' holding " + purpose, fix);
        return at;
    }

    static UserInputException missing(RowSource rows, String problem, String fix) {
        return new UserInputException(rows.file(), RowErrors.line(rows.headerLine()),
                problem + " (columns found: " + list(rows.columns()) + ")", fix);
    }

    /** Moves to the first row, or fails when the file has a header and nothing else. */
    static void requireFirstRow(RowSource rows) {
        if (!rows.next()) {
            throw new UserInputException(rows.file(), RowErrors.line(rows.headerLine()),
                    "the file has a header but no rows",
                    "check that this is the right file and that it was written completely");
        }
    }

    private static String list(List<String> columns) {
        return String.join(", ", columns);
    }
}
