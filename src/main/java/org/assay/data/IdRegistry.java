package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The ids of one file, in file order, with the line each came from. Rejects empty ids, repeated
 * ids, and ids that differ from an earlier one only by case or surrounding whitespace: such
 * pairs almost always come from two tools formatting the same id differently, and matching them
 * exactly would silently treat them as different examples.
 */
final class IdRegistry {
    private final Path file;
    private final List<String> ids = new ArrayList<>();
    private final IntColumn lines = new IntColumn();
    private final Map<String, Integer> exact = new HashMap<>();
    private final Map<String, Integer> normalized = new HashMap<>();

    IdRegistry(Path file) {
        this.file = file;
    }

    /** Adds the id of the row on {@code line}; returns its index. */
    int add(String id, int line) {
        if (id.isBlank()) {
            throw new UserInputException(file, RowErrors.line(line), "the id is empty",
                    "give every row an id");
        }
        Integer earlier = exact.putIfAbsent(id, ids.size());
        if (earlier != null) {
            throw new UserInputException(file, RowErrors.line(line),
                    "duplicate id '" + id + "' (also on line " + lines.get(earlier) + ")",
                    "give every example a distinct id, or remove the repeated row");
        }
        Integer similar = normalized.putIfAbsent(normalize(id), ids.size());
        if (similar != null) {
            throw new UserInputException(file, RowErrors.line(line),
                    "id '" + id + "' differs from id '" + ids.get(similar) + "' on line "
                            + lines.get(similar) + " only by case or surrounding whitespace,"
                            + " likely a formatting mismatch",
                    "write each id the same way everywhere; ids are compared exactly");
        }
        ids.add(id);
        lines.add(line);
        return ids.size() - 1;
    }

    /** Index of {@code id}, or -1. */
    int indexOf(String id) {
        Integer at = exact.get(id);
        return at == null ? -1 : at;
    }

    /** Index of an id that equals {@code id} up to case and surrounding whitespace, or -1. */
    int indexOfSimilar(String id) {
        Integer at = normalized.get(normalize(id));
        return at == null ? -1 : at;
    }

    /** A hint for an id that was not found: the near match, if there is one. */
    String similarHint(String id) {
        int at = indexOfSimilar(id);
        return at < 0 ? "" : "; '" + ids.get(at) + "' on line " + lines.get(at)
                + " differs only by case or whitespace, likely a formatting mismatch";
    }

    String id(int index) { return ids.get(index); }

    int line(int index) { return lines.get(index); }

    int size() { return ids.size(); }

    Path file() { return file; }

    String[] toArray() { return ids.toArray(new String[0]); }

    private static String normalize(String id) {
        return id.strip().toLowerCase(Locale.ROOT);
    }
}
