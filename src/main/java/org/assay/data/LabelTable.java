package org.assay.data;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Provisional codes for label strings in order of first appearance, with where each was first
 * seen. Rows store these ints while reading; the final class order is known only at the end.
 */
final class LabelTable {
    private final Map<String, Integer> codes = new HashMap<>();
    private final List<String> labels = new ArrayList<>();
    private final List<Path> firstFile = new ArrayList<>();
    private final IntColumn firstLine = new IntColumn();

    int code(String label, Path file, int line) {
        Integer code = codes.get(label);
        if (code != null) return code;
        codes.put(label, labels.size());
        labels.add(label);
        firstFile.add(file);
        firstLine.add(line);
        return labels.size() - 1;
    }

    String label(int code) { return labels.get(code); }

    /** File where the label first appeared. */
    Path firstFile(int code) { return firstFile.get(code); }

    /** Line of {@link #firstFile} where the label first appeared. */
    int firstLine(int code) { return firstLine.get(code); }

    int size() { return labels.size(); }
}
