package org.assay.pdf;

import java.util.List;

/**
 * One data row of a table: its label path (group labels, then the row's own labels) and one cell
 * per value column, null where the row prints nothing.
 */
public record GridRow(List<String> path, List<String> labels, List<GridCell> cells, double baseline) {
    public GridRow {
        path = List.copyOf(path);
        labels = List.copyOf(labels);
        cells = java.util.Collections.unmodifiableList(new java.util.ArrayList<>(cells));
    }
}
