package org.assay.data;

import java.nio.file.Path;

/**
 * A public door to this package's id checks for readers in other packages: the same errors for an
 * empty id, a repeated id, and an id that differs from an earlier one by surrounding whitespace as
 * every table reader gives, and the same warning for ids that differ only by case.
 */
public final class UniqueIds {
    private final IdRegistry ids;

    public UniqueIds(Path file) {
        this.ids = new IdRegistry(file);
    }

    /** Accepts the id of the item on {@code line}, or fails with a one-line error naming the line. */
    public void add(String id, int line) {
        ids.add(id, line);
    }

    /** The warning for ids that differ only by case, if any were added. */
    public java.util.Optional<String> caseWarning() {
        return ids.caseWarning();
    }
}
