package org.assay.data;

import java.io.Reader;
import java.nio.file.Path;

/**
 * A public door to this package's strict UTF-8 decoding for readers in other packages (the
 * generation readers, say), so every reader rejects bad bytes the same way, with the line.
 */
public final class TextFiles {
    private TextFiles() {}

    /**
     * Opens {@code file} as UTF-8: a malformed byte is a {@link org.assay.common.UserInputException}
     * naming its line, a leading byte-order mark is dropped, and a missing file or a directory is an
     * error naming {@code what} ("hypotheses file").
     */
    public static Reader openUtf8(Path file, String what) {
        return StrictUtf8Reader.open(file, what);
    }
}
