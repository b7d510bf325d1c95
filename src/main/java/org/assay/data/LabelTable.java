package org.assay.data;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Provisional codes for label strings in order of first appearance, with where each was first
 * seen. Rows store these ints while reading; the final class order is known only at the end.
 *
 * <p>The truth file is joined after the predictions are read, but it counts as read first: a
 * label it holds is reported where it first appears there ({@link #codeFromFileReadFirst}), and
 * {@link #inOrderSeen()} lists its labels first, so messages are those of reading it first.
 */
final class LabelTable {
    private final Map<String, Integer> codes = new HashMap<>();
    private final List<String> labels = new ArrayList<>();
    private final List<Path> firstFile = new ArrayList<>();
    private final IntColumn firstLine = new IntColumn();
    private final List<Integer> readFirst = new ArrayList<>();   // codes seen in the file read first, in order
    private boolean[] isReadFirst = new boolean[0];

    int code(String label, Path file, int line) {
        Integer code = codes.get(label);
        if (code != null) return code;
        codes.put(label, labels.size());
        labels.add(label);
        firstFile.add(file);
        firstLine.add(line);
        return labels.size() - 1;
    }

    /**
     * The code of a label of the file that counts as read first (the truth file): the first time
     * the label appears there, that place becomes where it was first seen.
     */
    int codeFromFileReadFirst(String label, Path file, int line) {
        int code = code(label, file, line);
        if (code >= isReadFirst.length) isReadFirst = java.util.Arrays.copyOf(isReadFirst, Math.max(16, 2 * code + 1));
        if (!isReadFirst[code]) {
            isReadFirst[code] = true;
            readFirst.add(code);
            firstFile.set(code, file);
            firstLine.set(code, line);
        }
        return code;
    }

    /** Every code in order of first appearance, the labels of the file read first leading. */
    int[] inOrderSeen() {
        int[] order = new int[labels.size()];
        int at = 0;
        for (int code : readFirst) order[at++] = code;
        for (int code = 0; code < labels.size(); code++) {
            if (code >= isReadFirst.length || !isReadFirst[code]) order[at++] = code;
        }
        return order;
    }

    String label(int code) { return labels.get(code); }

    /** File where the label first appeared. */
    Path firstFile(int code) { return firstFile.get(code); }

    /** Line of {@link #firstFile} where the label first appeared. */
    int firstLine(int code) { return firstLine.get(code); }

    int size() { return labels.size(); }
}
