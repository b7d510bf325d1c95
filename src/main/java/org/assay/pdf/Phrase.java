package org.assay.pdf;

import java.util.List;

/**
 * A run of glyphs on one line with no gap wide enough to separate table cells: a cell's text,
 * a header, or a stretch of body text. Superscript glyphs stay in {@code glyphs} with their own
 * raised baseline; {@link #text()} joins words with single spaces.
 */
public record Phrase(String text, List<Glyph> glyphs, double x0, double x1, double top, double bottom,
                     double baseline, double size) {
    public Phrase {
        glyphs = List.copyOf(glyphs);
    }

    public double centerX() { return (x0 + x1) / 2; }

    public double width() { return x1 - x0; }

    /** Horizontal overlap with [a, b] in points (negative when apart). */
    public double overlapX(double a, double b) { return Math.min(x1, b) - Math.max(x0, a); }
}
