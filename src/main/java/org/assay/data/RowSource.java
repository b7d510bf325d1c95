package org.assay.data;

import java.nio.file.Path;
import java.util.List;

/**
 * A table read one row at a time. Only the current row is held; callers copy what they need
 * into primitive arrays.
 */
interface RowSource extends AutoCloseable {

    Path file();

    /** Column names: the header of a delimited file, the keys of the first JSON object. */
    List<String> columns();

    /** Advances to the next row; false at the end. Throws on a ragged or malformed row. */
    boolean next();

    /** Text of a field of the current row, "" when empty (or JSON null). */
    String value(int column);

    /** File line the current row starts on (1-based). */
    int line();

    /** File line of the header (delimited files) or of the first object (JSON Lines). */
    int headerLine();

    @Override
    void close();
}
