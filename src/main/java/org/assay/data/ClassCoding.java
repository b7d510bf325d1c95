package org.assay.data;

import org.assay.common.UserInputException;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The final class codes 0..K-1. Classes sort numerically when every class is a decimal number
 * (so "2" precedes "10"), otherwise by {@link String#compareTo} (UTF-16 code units, so upper case
 * precedes lower case).
 *
 * <p>Two classes that differ only by surrounding whitespace, or that are the same number written
 * differently ("1" and "1.0"), are rejected: they are almost always one class formatted by two
 * different tools.
 */
final class ClassCoding {
    private final List<String> classes;
    private final int[] finalCode;   // provisional code -> class code, or -1 when not a class

    private ClassCoding(List<String> classes, int[] finalCode) {
        this.classes = classes;
        this.finalCode = finalCode;
    }

    /** Codes the labels flagged in {@code isClass} (indexed by provisional code). */
    static ClassCoding of(LabelTable labels, boolean[] isClass) {
        List<Integer> members = new ArrayList<>();
        for (int code = 0; code < labels.size(); code++) if (isClass[code]) members.add(code);
        boolean numeric = members.stream().allMatch(c -> NumberField.isDecimal(labels.label(c)));
        Comparator<Integer> byText = Comparator.comparing(labels::label);
        Comparator<Integer> order = numeric
                ? Comparator.<Integer, BigDecimal>comparing(c -> new BigDecimal(labels.label(c))).thenComparing(byText)
                : byText;
        members.sort(order);
        rejectLookalikes(labels, members, numeric);
        int[] finalCode = new int[labels.size()];
        Arrays.fill(finalCode, -1);
        List<String> classes = new ArrayList<>();
        for (int c : members) {
            finalCode[c] = classes.size();
            classes.add(labels.label(c));
        }
        return new ClassCoding(List.copyOf(classes), finalCode);
    }

    private static void rejectLookalikes(LabelTable labels, List<Integer> members, boolean numeric) {
        Map<String, Integer> seen = new HashMap<>();
        for (int c : members) {
            String label = labels.label(c);
            String key = numeric ? new BigDecimal(label.strip()).stripTrailingZeros().toPlainString() : label.strip();
            Integer other = seen.putIfAbsent(key, c);
            if (other != null) {
                int later = labels.firstLine(c) >= labels.firstLine(other) ? c : other;
                int earlier = later == c ? other : c;
                throw new UserInputException(labels.firstFile(later), RowErrors.line(labels.firstLine(later)),
                        "class '" + labels.label(later) + "' and class '" + labels.label(earlier) + "' (first seen in "
                                + labels.firstFile(earlier).getFileName() + " line " + labels.firstLine(earlier)
                                + ") differ only in " + (numeric ? "how the number is written" : "surrounding whitespace")
                                + ", likely a formatting mismatch",
                        "write each class label the same way in every file");
            }
        }
    }

    List<String> classes() { return classes; }

    int size() { return classes.size(); }

    /** Class code of a provisional label code, or -1 when that label is not a class. */
    int code(int provisional) { return finalCode[provisional]; }
}
