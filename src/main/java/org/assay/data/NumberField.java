package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.regex.Pattern;

/**
 * Parses a score or probability strictly. {@link Double#parseDouble} alone would accept
 * {@code NaN}, {@code Infinity}, hexadecimal floats and Java suffixes such as {@code 0.5f}, and
 * turns {@code 1e309} into infinity; none of these is a usable score.
 */
final class NumberField {
    /** A plain decimal number, optionally with an exponent. */
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private NumberField() {}

    /** The finite value of {@code text} (surrounding spaces allowed), or an error naming the line. */
    static double parse(String text, String column, Path file, int line) {
        String trimmed = text.strip();
        if (trimmed.isEmpty()) {
            throw new UserInputException(file, RowErrors.line(line),
                    "'" + column + "' is empty", "give a number for every row");
        }
        if (!DECIMAL.matcher(trimmed).matches()) {
            String kind = isNonFinite(trimmed) ? "is NaN or infinite" : "is not a number";
            throw new UserInputException(file, RowErrors.line(line),
                    "'" + column + "' value '" + text + "' " + kind,
                    "write a finite decimal number such as 0.25 or 2.5e-3");
        }
        double value = Double.parseDouble(trimmed);
        if (Double.isInfinite(value)) {
            throw new UserInputException(file, RowErrors.line(line),
                    "'" + column + "' value '" + text + "' is too large for a double-precision number",
                    "write a finite number with magnitude below 1.8e308");
        }
        return value;
    }

    private static boolean isNonFinite(String text) {
        String t = text.replaceFirst("^[+-]", "").toLowerCase(java.util.Locale.ROOT);
        return t.equals("nan") || t.equals("inf") || t.equals("infinity");
    }

    /** Whether {@code text} is a plain decimal number (used to decide how classes sort). */
    static boolean isDecimal(String text) {
        return DECIMAL.matcher(text).matches();
    }
}
