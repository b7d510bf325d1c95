package org.assay.pdf;

import java.util.List;

/** The text of one grid cell with its glyphs and box; {@code underlined} when a rule runs under it. */
public record GridCell(String text, List<Glyph> glyphs, double x0, double x1, double top, double bottom,
                       double baseline, double size, boolean underlined) {
    public GridCell {
        glyphs = List.copyOf(glyphs);
    }
}
