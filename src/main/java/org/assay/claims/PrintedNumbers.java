package org.assay.claims;

import java.math.BigDecimal;
import java.util.regex.Pattern;

/**
 * Turns the text of a printed number into a {@link PrintedValue}, or explains what is wrong
 * with it and how to write it instead. The common ways a number gets mangled when copied
 * from a paper (decimal comma, stray space, percent sign, typographic minus) each get their
 * own fix.
 */
final class PrintedNumbers {
    private static final Pattern DECIMAL_COMMA = Pattern.compile("[-+]?\\d+,\\d+");
    private static final Pattern EXPONENT = Pattern.compile("[-+]?\\d+(\\.\\d+)?[eE][-+]?\\d+");
    private static final Pattern LEADING_DOT = Pattern.compile("[-+]?\\.\\d+");
    private static final Pattern TRAILING_DOT = Pattern.compile("[-+]?\\d+\\.");
    private static final Pattern NOT_FINITE =
            Pattern.compile("[-+]?\\.?(nan|inf|infinity|∞)", Pattern.CASE_INSENSITIVE);

    /** What is wrong with a number's text and how to write it instead. */
    static final class NumberProblem extends RuntimeException {
        private final String fix;

        NumberProblem(String problem, String fix) {
            super(problem);
            this.fix = fix;
        }

        String problem() { return getMessage(); }
        String fix() { return fix; }
    }

    /** Most digits a claim's value may have: more than any table prints, few enough for exact arithmetic. */
    static final int MAX_DIGITS = 15;

    private PrintedNumbers() {}

    /**
     * @param what the field's name for the message, such as {@code "value"}
     * @throws NumberProblem when the text is not a plain decimal number
     */
    static PrintedValue parse(String what, String raw) {
        String t = raw == null ? "" : raw.strip();
        String quoted = "\"" + raw + "\"";
        if (t.isEmpty()) {
            throw new NumberProblem(what + " is empty", "write the number exactly as printed, for example \"87.4\"");
        }
        if (t.endsWith("%")) {
            String bare = t.substring(0, t.length() - 1).strip();
            throw new NumberProblem(what + " " + quoted + " contains a percent sign",
                    "drop the % and set scale: percent, writing " + bare);
        }
        if (t.contains("±") || t.contains("+-") || t.contains("+/-")) {
            throw new NumberProblem(what + " " + quoted + " contains a ± part",
                    "write only the number here and put the ± amount in pm (with pm_kind)");
        }
        if (DECIMAL_COMMA.matcher(t).matches()) {
            throw new NumberProblem(what + " " + quoted + " uses a decimal comma",
                    "use a decimal point: " + t.replace(',', '.'));
        }
        if (t.chars().anyMatch(Character::isWhitespace)) {
            throw new NumberProblem(what + " " + quoted + " contains a space inside the number",
                    "remove the space, writing " + t.replaceAll("\\s+", "") + ", or check the number against the paper");
        }
        if (t.startsWith("\u2212") || t.startsWith("\u2013")) {
            throw new NumberProblem(what + " " + quoted + " starts with a typographic minus or dash",
                    "use the ASCII minus sign: -" + t.substring(1));
        }
        if (NOT_FINITE.matcher(t).matches()) {
            throw new NumberProblem(what + " " + quoted + " is not a finite number",
                    "write the number as printed; a claim cannot be NaN or infinite");
        }
        if (EXPONENT.matcher(t).matches()) {
            throw new NumberProblem(what + " " + quoted + " is written with an exponent", exponentFix(t));
        }
        if (LEADING_DOT.matcher(t).matches()) {
            throw new NumberProblem(what + " " + quoted + " has no digit before the decimal point",
                    "write a leading zero: " + t.replace(".", "0."));
        }
        if (TRAILING_DOT.matcher(t).matches()) {
            throw new NumberProblem(what + " " + quoted + " ends with a decimal point",
                    "drop the point: " + t.substring(0, t.length() - 1));
        }
        long digits = t.chars().filter(Character::isDigit).count();
        if (what.equals("value") && digits > MAX_DIGITS) {
            // No table prints that many; the exact feasibility arithmetic is sized for printed values.
            // (pm and margin are kept as doubles, whose 17 significant digits the writer may spell out.)
            throw new NumberProblem(what + " " + quoted.substring(0, Math.min(quoted.length(), 40))
                    + (quoted.length() > 40 ? "...\"" : "") + " has " + digits + " digits, more than the limit of "
                    + MAX_DIGITS + " for a printed value", "write the number exactly as the paper prints it");
        }
        try {
            return PrintedValue.parse(t);
        } catch (NumberFormatException e) {
            throw new NumberProblem(what + " " + quoted + " is not a number",
                    "write a plain decimal number as printed, for example 87.4");
        }
    }

    /**
     * The fix for a number with an exponent: its plain digits when they are few. The exponent of an untrusted
     * file can exceed BigDecimal's range (1e2147483648) or ask for a billion zeros (1e999999999).
     */
    private static String exponentFix(String t) {
        try {
            BigDecimal n = new BigDecimal(t);
            if (Math.abs((long) n.scale()) <= 40) return "write the digits as printed, for example " + n.toPlainString();
        } catch (NumberFormatException e) {
            // beyond BigDecimal's exponent range: no example to give
        }
        return "write the digits as printed, without an exponent";
    }
}
