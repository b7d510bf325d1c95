package org.assay.claims;

import java.util.regex.Pattern;

/**
 * Keeps a CSV cell from being run as a spreadsheet formula ("CSV injection"). A spreadsheet program
 * opening a CSV file treats a cell that starts with {@code =}, {@code +}, {@code -} or {@code @} (and,
 * in some programs, a tab or carriage return before one) as a formula, so a table label copied out of
 * someone's PDF such as {@code =HYPERLINK(...)} could run when a co-author opens the claims draft. As the
 * OWASP page on CSV injection advises (common practice), such a text cell is written with a leading
 * single quote, which spreadsheets show as text and do not evaluate.
 *
 * <p>A plain number ({@code -0.5}, {@code +1.5e-3}) is left as it is: it cannot be a formula, and a
 * numeric column must stay numeric. To keep the change reversible, a cell that already starts with
 * quotes followed by one of those characters gets one more quote; {@link #unguard} removes exactly one,
 * so {@code unguard(guard(s)) == s} for every string s, and hand-written files that quote a formula
 * ({@code '=SUM(A1)}) read as the text after the quote.
 */
public final class CsvFormulaGuard {
    /** Quotes, then a character that starts a formula: what {@link #guard} prefixes. */
    private static final Pattern NEEDS_GUARD = Pattern.compile("'*[=+\\-@\t\r].*", Pattern.DOTALL);
    /** What {@link #unguard} strips one quote from: at least one quote, then a formula character. */
    private static final Pattern GUARDED = Pattern.compile("'+[=+\\-@\t\r].*", Pattern.DOTALL);
    /** A plain decimal number, optionally signed, with an optional exponent. */
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    private CsvFormulaGuard() {}

    /** The cell as it is written to a CSV file. */
    public static String guard(String cell) {
        if (cell == null || cell.isEmpty() || NUMBER.matcher(cell).matches()) return cell;
        return NEEDS_GUARD.matcher(cell).matches() ? "'" + cell : cell;
    }

    /** The cell as it was before {@link #guard}: one leading quote removed before a formula character. */
    public static String unguard(String cell) {
        if (cell == null || !GUARDED.matcher(cell).matches()) return cell;
        return cell.substring(1);
    }
}
