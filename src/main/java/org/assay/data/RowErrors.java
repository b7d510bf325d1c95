package org.assay.data;

import com.fasterxml.jackson.core.JsonProcessingException;
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

    /** A syntax error reported by Jackson, at the line Jackson reports. */
    static UserInputException syntax(Path file, long fallbackLine, JsonProcessingException e, String fix) {
        long line = e.getLocation() != null && e.getLocation().getLineNr() > 0
                ? e.getLocation().getLineNr() : fallbackLine;
        return new UserInputException(file, line(line), "cannot parse: " + e.getOriginalMessage(), fix, e);
    }
}
