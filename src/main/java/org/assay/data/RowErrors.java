package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;

/** Builds the {@link UserInputException}s shared by the row sources. */
final class RowErrors {
    private RowErrors() {}

    static String line(long line) {
        return "line " + line;
    }

    static UserInputException empty(Path file, String what) {
        return new UserInputException(file, null, "the " + what + " is empty",
                "check that this is the right file and that it was written completely");
    }

    static UserInputException unreadable(Path file, java.io.IOException e) {
        return new UserInputException(file, null, "cannot read the file: " + e.getMessage(),
                "check that the file exists and is readable", e);
    }

    /** The {@link UserInputException} a library wrapped, if any (our reader throws it mid-parse). */
    static UserInputException userErrorCause(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof UserInputException) return (UserInputException) t;
        }
        return null;
    }
}
