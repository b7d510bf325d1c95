package org.assay.pdf;

import java.util.List;

/**
 * A table rebuilt from its glyphs: the header path of every value column, the headers of the label
 * columns, and the data rows.
 */
public record TableGrid(List<List<String>> columns, List<String> labelHeaders, List<GridRow> rows) {
    public TableGrid {
        columns = columns.stream().map(List::copyOf).toList();
        labelHeaders = List.copyOf(labelHeaders);
        rows = List.copyOf(rows);
    }
}
