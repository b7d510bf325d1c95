package org.assay.pdf;

import java.util.List;

/**
 * A results table read from a PDF: caption, page and box, the header path of each value column
 * with its metric and scale guesses, the row paths, and every value cell.
 */
public record ExtractedTable(String number, String caption, int page, double x0, double top, double x1, double bottom,
                             List<List<String>> columns, List<MetricGuess> metrics, List<ScaleGuess> scales,
                             List<String> labelHeaders, List<List<String>> rows, List<ExtractedCell> cells) {
    public ExtractedTable {
        columns = columns.stream().map(List::copyOf).toList();
        metrics = List.copyOf(metrics);
        scales = List.copyOf(scales);
        labelHeaders = List.copyOf(labelHeaders);
        rows = rows.stream().map(List::copyOf).toList();
        cells = List.copyOf(cells);
    }

    /** The cell at (row, column) of the grid, or null. */
    public ExtractedCell cell(int row, int column) {
        List<String> r = rows.get(row), c = columns.get(column);
        for (ExtractedCell x : cells) if (x.rowPath().equals(r) && x.columnPath().equals(c)) return x;
        return null;
    }
}
