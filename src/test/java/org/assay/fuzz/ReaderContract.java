package org.assay.fuzz;

import java.nio.file.Path;
import org.assay.common.UserInputException;

/**
 * The property every fuzzed reader keeps (DESIGN.md principle 7, issue 9): given any bytes it either
 * returns normally or throws one {@link UserInputException} that names the file it was reading and reads
 * as one line. Any other exception or Error escapes from here, and Jazzer reports it as a finding.
 */
final class ReaderContract {
    private ReaderContract() {}

    static void returnsOrRejects(Path file, Runnable read) {
        try {
            read.run();
        } catch (UserInputException e) {
            if (!file.equals(e.where())) {
                throw new AssertionError("the error does not name the file " + file + ": " + e.oneLine(), e);
            }
            String line = e.oneLine();
            if (line.isBlank() || line.indexOf('\n') >= 0 || line.indexOf('\r') >= 0) {
                throw new AssertionError("the error is not one line: [" + line + "]", e);
            }
        }
    }

    /** The input without its first byte, which the harness used to choose a format. */
    static byte[] afterFirst(byte[] input) {
        return java.util.Arrays.copyOfRange(input, 1, input.length);
    }
}
