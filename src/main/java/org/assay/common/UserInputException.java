package org.assay.common;

import java.nio.file.Path;

/**
 * A problem the user can fix: a malformed file, a missing column, a bad option value.
 * The CLI prints {@link #oneLine()} on stderr and exits with code 2, without a stack trace.
 *
 * <p>{@code where} is the file (may be null), {@code position} a line/row/JSON pointer
 * such as {@code "line 12"} or {@code "/tables/0/claims/3/value"} (may be null),
 * {@code problem} says what is wrong and {@code fix} what to do about it (may be null).
 */
public class UserInputException extends RuntimeException {
    private final transient Path where;
    private final String position;
    private final String problem;
    private final String fix;

    public UserInputException(Path where, String position, String problem, String fix) {
        super(compose(where, position, problem, fix));
        this.where = where;
        this.position = position;
        this.problem = problem;
        this.fix = fix;
    }

    public UserInputException(Path where, String position, String problem, String fix, Throwable cause) {
        this(where, position, problem, fix);
        initCause(cause);
    }

    /** A usage problem that is not tied to a file (an option value, say). */
    public static UserInputException usage(String problem, String fix) {
        return new UserInputException(null, null, problem, fix);
    }

    public Path where() { return where; }
    public String position() { return position; }
    public String problem() { return problem; }
    public String fix() { return fix; }

    /** The single line shown to the user: {@code file:position: problem; fix}. */
    public String oneLine() { return getMessage(); }

    private static String compose(Path where, String position, String problem, String fix) {
        StringBuilder sb = new StringBuilder();
        if (where != null) {
            sb.append(where);
            if (position != null) sb.append(", ").append(position);
            sb.append(": ");
        } else if (position != null) {
            sb.append(position).append(": ");
        }
        sb.append(oneLineOf(problem));
        if (fix != null && !fix.isBlank()) sb.append(" (").append(oneLineOf(fix)).append(')');
        return sb.toString();
    }

    /**
     * Text quoted from a file (a header, a field name) can hold any character. Line breaks of every kind
     * (\n, \r, NEL, U+2028, U+2029) become spaces so the message stays one line, and other control
     * characters (escape sequences a terminal would act on) become '?'; tabs stay.
     */
    private static String oneLineOf(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r' || c == '\u0085' || c == '\u2028' || c == '\u2029') out.append(' ');
            else if (c != '\t' && Character.isISOControl(c)) out.append('?');
            else out.append(c);
        }
        return out.toString();
    }
}
