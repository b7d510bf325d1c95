package org.assay.pdf;

import java.util.List;

/**
 * One value cell of an extracted table with its provenance.
 *
 * @param printed    the cell's text as printed, superscripts included
 * @param markers    footnote marks, from the text and from superscript glyphs, in printed order
 * @param confidence how sure the reading of this cell is, in [0, 1]
 */
public record ExtractedCell(List<String> rowPath, List<String> columnPath, String printed, ParsedCell parsed, boolean bold,
                            boolean underline, List<String> markers, int page, double x0, double top, double x1,
                            double bottom, double confidence) {
    public ExtractedCell {
        rowPath = List.copyOf(rowPath);
        columnPath = List.copyOf(columnPath);
        markers = List.copyOf(markers);
    }
}
