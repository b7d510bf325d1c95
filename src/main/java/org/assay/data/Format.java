package org.assay.data;

import org.assay.common.Progress;
import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.Locale;

/** Layout of a table file, chosen by its extension (case-insensitive). */
enum Format {
    CSV, TSV, JSON_LINES;

    static Format of(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        int dot = name.lastIndexOf('.');
        String extension = dot < 0 ? "" : name.substring(dot + 1);
        switch (extension) {
            case "csv": return CSV;
            case "tsv": case "tab": return TSV;
            case "jsonl": case "ndjson": return JSON_LINES;
            default:
                throw new UserInputException(file, null,
                        "cannot tell the file format from the extension '" + extension + "'",
                        "name the file .csv (comma-separated), .tsv or .tab (tab-separated), "
                                + ".jsonl or .ndjson (one JSON object per line)");
        }
    }

    /**
     * Opens {@code file} as rows; {@code what} names the file's role in messages. The options say
     * how a nested probabilities object's fields are named.
     */
    RowSource open(Path file, String what, ReadOptions options) {
        return open(file, what, options, Progress.Task.NONE);
    }

    /** As above, reporting the bytes read to {@code progress}. */
    RowSource open(Path file, String what, ReadOptions options, Progress.Task progress) {
        StrictUtf8Reader reader = StrictUtf8Reader.open(file, what, progress);
        switch (this) {
            case CSV: return new DelimitedRowSource(file, reader, ',');
            case TSV: return new DelimitedRowSource(file, reader, '\t');
            default: return new JsonLinesRowSource(file, reader, options);
        }
    }
}
