package org.assay.claims;

import java.nio.file.Path;
import java.util.Locale;
import org.assay.common.UserInputException;

/** The three spellings of a claims file, chosen by file extension. */
enum ClaimsFormat {
    YAML, JSON, CSV;

    static ClaimsFormat of(Path file) {
        Path name = file.getFileName();
        String n = name == null ? "" : name.toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".yaml") || n.endsWith(".yml")) return YAML;
        if (n.endsWith(".json")) return JSON;
        if (n.endsWith(".csv")) return CSV;
        throw new UserInputException(file, null, "unknown claims file type",
                "name the file with the extension .yaml, .yml, .json or .csv");
    }
}
