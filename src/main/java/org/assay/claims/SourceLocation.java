package org.assay.claims;

import java.nio.file.Path;

/**
 * Where something was read from: a file and a line (YAML, CSV) or a JSON pointer (JSON).
 * {@code line} is 1-based or 0 when unknown; {@code pointer} is null when not applicable.
 */
public record SourceLocation(Path file, int line, String pointer) {
    /**
     * {@code "line 12"}, {@code "/tables/0/claims/3/value"}, or both as
     * {@code "/tables/0/claims/3/value (line 12)"} when both are known; null when neither is.
     */
    public String describe() {
        boolean hasPointer = pointer != null && !pointer.isEmpty();
        if (hasPointer && line > 0) return pointer + " (line " + line + ")";
        if (hasPointer) return pointer;
        if (line > 0) return "line " + line;
        return null;
    }
}
