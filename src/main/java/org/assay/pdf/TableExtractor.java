package org.assay.pdf;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The whole extraction: pages to glyphs and rules, captions to table regions, regions to grids,
 * cells to parsed values with provenance, column headers to metric and scale guesses.
 */
public final class TableExtractor {
    private final PdfDocumentReader reader;

    public TableExtractor(PdfLimits limits) { this.reader = new PdfDocumentReader(limits); }

    public TableExtractor() { this(PdfLimits.current()); }

    /**
     * @param onlyTable the table number to keep ("3"), or null for every table
     */
    public Extraction extract(Path file, String password, PageSelection pages, String onlyTable) {
        return extract(file, password, pages, onlyTable, org.assay.common.Progress.NONE);
    }

    /** As above, reporting the pages read to {@code progress}. */
    public Extraction extract(Path file, String password, PageSelection pages, String onlyTable,
                              org.assay.common.Progress progress) {
        List<PageContent> content = reader.read(file, password, pages, progress);
        List<ExtractedTable> tables = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        for (PageContent page : content) {
            for (TableRegion region : TableLocator.locate(page)) {
                if (onlyTable != null && !region.caption().number().equals(onlyTable)) continue;
                TableGrid grid = GridBuilder.build(region);
                if (grid.rows().isEmpty() || grid.columns().isEmpty()) {
                    notes.add("Table " + region.caption().number() + " on page " + page.number()
                            + ": no rows of values found under its caption; type its claims in");
                    continue;
                }
                tables.add(table(region, grid));
            }
        }
        return new Extraction(file, reader.lastTitle(), content.size(), tables, notes);
    }

    static ExtractedTable table(TableRegion region, TableGrid grid) {
        List<ExtractedCell> cells = new ArrayList<>();
        List<List<String>> rows = new ArrayList<>();
        List<List<String>> seen = new ArrayList<>();
        for (GridRow row : grid.rows()) {
            List<String> path = unique(row.path(), seen);
            rows.add(path);
            for (int c = 0; c < grid.columns().size(); c++) {
                GridCell g = row.cells().get(c);
                if (g == null) continue;
                cells.add(CellReader.read(g, path, grid.columns().get(c), region.page()));
            }
        }
        String caption = region.caption().text();
        List<MetricGuess> metrics = new ArrayList<>();
        List<ScaleGuess> scales = new ArrayList<>();
        for (List<String> column : grid.columns()) {
            MetricGuess m = MetricGuesser.guess(column, caption);
            List<ParsedCell> parsed = cells.stream().filter(x -> x.columnPath().equals(column)).map(ExtractedCell::parsed)
                    .toList();
            metrics.add(m);
            scales.add(ScaleGuesser.guess(column, caption, parsed));
        }
        return new ExtractedTable(region.caption().number(), caption, region.page(), region.x0(), region.top(),
                region.x1(), region.bottom(), grid.columns(), metrics, scales, grid.labelHeaders(), rows, cells);
    }

    /** Two rows printed with the same labels get " (2)", " (3)"... so every claim stays addressable. */
    private static List<String> unique(List<String> path, List<List<String>> seen) {
        List<String> p = path.isEmpty() ? List.of("row " + (seen.size() + 1)) : path;
        int copies = (int) seen.stream().filter(s -> s.equals(p)).count();
        seen.add(p);
        if (copies == 0) return p;
        List<String> q = new ArrayList<>(p);
        q.set(q.size() - 1, q.get(q.size() - 1) + " (" + (copies + 1) + ")");
        return q;
    }
}
