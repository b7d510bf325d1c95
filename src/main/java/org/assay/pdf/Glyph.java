package org.assay.pdf;

/**
 * One character drawn on a page, in page coordinates with the origin at the top left and y
 * growing downwards (points). {@code baseline} is the y of the text baseline; {@code top} and
 * {@code bottom} bound the glyph's box.
 *
 * @param text     the Unicode text PDFBox maps the glyph to (may be several characters for a ligature)
 * @param size     font size in points as drawn (after any scaling of the table)
 * @param font     the font's PostScript name, without a subset prefix
 * @param bold     the font is a bold face (from its name or descriptor)
 * @param italic   the font is an italic or slanted text face (math italic excluded)
 */
public record Glyph(String text, double x0, double x1, double top, double bottom, double baseline,
                    double size, String font, boolean bold, boolean italic) {

    public double width() { return x1 - x0; }

    public double centerX() { return (x0 + x1) / 2; }

    public boolean isSpace() { return text.isBlank(); }
}
