package org.assay.data.generation;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.common.UserInputException;
import org.assay.data.TextFiles;

/**
 * The lines of a UTF-8 text file. A line ends at LF; a CR right before the LF is dropped, so CRLF
 * files read like LF files; a final line ending does not start an extra empty line.
 *
 * <p>Written by hand rather than with {@link BufferedReader#readLine}, which also ends a line at a
 * lone CR: in parallel files one stray CR would then shift every later hypothesis against its
 * references. Here a CR not followed by LF is an error naming its line.
 */
final class TextLines {
    private TextLines() {}

    static List<String> read(Path file, String what) {
        List<String> lines = new ArrayList<>();
        forEach(file, what, lines::add);
        return lines;
    }

    /** Receives each line of a file in turn. */
    interface LineConsumer { void accept(String line); }

    /**
     * Passes the lines to {@code each} one at a time, as {@link #read} would list them, so a
     * reader that keeps only what it extracts never holds the whole file.
     */
    static void forEach(Path file, String what, LineConsumer each) {
        int count = 0;
        StringBuilder line = new StringBuilder();
        boolean carriageReturn = false;
        try (Reader in = new BufferedReader(TextFiles.openUtf8(file, what))) {
            int c;
            while ((c = in.read()) != -1) {
                if (carriageReturn && c != '\n') throw loneCarriageReturn(file, count + 1);
                carriageReturn = c == '\r';
                if (c == '\r') continue;
                if (c == '\n') {
                    count++;
                    each.accept(line.toString());
                    line.setLength(0);
                } else {
                    line.append((char) c);
                }
            }
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the " + what + ": " + e.getMessage(),
                    "check that the file exists and is readable", e);
        }
        if (carriageReturn) throw loneCarriageReturn(file, count + 1);
        if (line.length() > 0) each.accept(line.toString());
    }

    private static UserInputException loneCarriageReturn(Path file, int line) {
        return new UserInputException(file, "line " + line, "a carriage return (CR) not followed by a line feed",
                "save the file with LF or CRLF line endings; a lone CR would split a line in two");
    }
}
