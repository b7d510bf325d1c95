package org.assay.claims;

import java.nio.file.Path;

/**
 * Where something was read from: a file and a line (YAML, CSV) or a JSON pointer (JSON).
 * {@code line} is 1-based or 0 when unknown; {@code pointer} is null when not applicable.
 */
public record SourceLocation(Path file, int line, String pointer) {
    public String describe() {
        if (line > 0) return "line " + line;
        if (pointer != null) return pointer;
        return null;
    }
}
