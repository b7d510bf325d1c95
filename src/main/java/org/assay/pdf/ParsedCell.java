package org.assay.pdf;

import java.util.List;

/**
 * What one table cell says, as {@link CellText#parse} read it.
 *
 * @param kind       number, missing mark, other text, or nothing
 * @param value      for a number: the number exactly as printed ("94.10", ".943", "1,234", "+1.5"), with an
 *                   ASCII '-' for any minus glyph; null for the other kinds
 * @param pm         the printed uncertainty number ("0.3" of "94.1 ± 0.3"), or null
 * @param pmStyle    how the uncertainty was printed, or null when there is none
 * @param percent    a percent sign was printed after the value or after the uncertainty
 * @param markers    footnote marks found around the value, in the order printed ("†", "*", "a"...)
 * @param text       the cell text after spacing and compatibility normalisation
 * @param confidence how sure the reading is, in [0, 1]: 1 for clean cases, lower for guesses
 */
public record ParsedCell(Kind kind, String value, String pm, UncertaintyStyle pmStyle, boolean percent,
        List<String> markers, String text, double confidence) {

    public enum Kind { NUMBER, MISSING, TEXT, EMPTY }

    /** "94.1 ± 0.3" (also "+-", "+/-") or "94.1 (0.3)". */
    public enum UncertaintyStyle { PLUS_MINUS, PARENTHESES }

    public ParsedCell {
        markers = List.copyOf(markers);
    }

    /**
     * The value in the plain form {@link org.assay.claims.PrintedValue#parse} accepts: ".943" becomes "0.943",
     * "1,234" becomes "1234", a decimal comma "94,1" becomes "94.1". The digits after the point are kept as
     * printed. Null unless this is a number.
     */
    public String plainValue() { return kind == Kind.NUMBER ? CellText.plain(value) : null; }

    /** The uncertainty in the same plain form, or null when none was printed. */
    public String plainPm() { return pm == null ? null : CellText.plain(pm); }
}
