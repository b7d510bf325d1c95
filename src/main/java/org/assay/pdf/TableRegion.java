package org.assay.pdf;

import java.util.List;

/**
 * Where one table's body lies on a page, with its caption and the rules drawn inside it.
 *
 * @param ruled whether the body was bounded by ruling lines (otherwise by whitespace)
 */
public record TableRegion(int page, Caption caption, double x0, double x1, double top, double bottom,
                          boolean captionBelow, boolean ruled, List<Glyph> glyphs, List<Rule> rules) {
    public TableRegion {
        glyphs = List.copyOf(glyphs);
        rules = List.copyOf(rules);
    }

    public double width() { return x1 - x0; }
}
