package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * The positive class: the one the user names, else the conventional one of a conventional pair
 * (common practice): 1 of {0, 1}, true of {false, true}, pos of {neg, pos} (names compared
 * ignoring case); else none (-1).
 */
final class PositiveClass {
    private PositiveClass() {}

    static int choose(List<String> classes, String requested, Path file) {
        if (requested != null) {
            int at = classes.indexOf(requested);
            if (at < 0) {
                throw new UserInputException(file, null,
                        "the positive class '" + requested + "' is not one of the classes " + classes,
                        "set --positive to one of: " + String.join(", ", classes));
            }
            return at;
        }
        if (classes.size() != 2) return -1;
        String first = classes.get(0).toLowerCase(Locale.ROOT);
        String second = classes.get(1).toLowerCase(Locale.ROOT);
        if (NumberField.isDecimal(first) && NumberField.isDecimal(second)
                && Double.parseDouble(first) == 0 && Double.parseDouble(second) == 1) return 1;
        int t = conventional(first, second, "false", "true");
        if (t >= 0) return t;
        return conventional(first, second, "neg", "pos");
    }

    private static int conventional(String first, String second, String negative, String positive) {
        if (first.equals(negative) && second.equals(positive)) return 1;
        if (first.equals(positive) && second.equals(negative)) return 0;
        return -1;
    }
}
