package org.assay.pdf;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text picture of each extracted table, laid out as a grid, so the user can hold it next
 * to the paper: bold values as {@code **87.4**}, underlined ones as {@code _80.1_}, marks kept,
 * followed by each column's metric and scale guess and the cells read with low confidence.
 */
public final class TablePreview {
    /** Cells and guesses below this confidence are listed for the user to check. */
    public static final double LOW_CONFIDENCE = 0.8;

    private TablePreview() {}

    public static String render(Extraction x) {
        StringBuilder out = new StringBuilder();
        for (ExtractedTable t : x.tables()) render(t, out);
        if (!x.notes().isEmpty()) {
            out.append("Not extracted:\n");
            for (String n : x.notes()) out.append("  - ").append(n).append('\n');
        }
        return out.toString();
    }

    static void render(ExtractedTable t, StringBuilder out) {
        String caption = t.caption().replaceFirst("^(Table|TABLE|Tab\\.|Tbl\\.)\\s*\\S+?[:.|]?\\s+", "");
        out.append("Table ").append(t.number()).append(" (page ").append(t.page()).append("): ")
                .append(shorten(caption, 100)).append('\n');
        List<List<String>> grid = new ArrayList<>();
        List<String> head = new ArrayList<>();
        head.add(String.join(" / ", t.labelHeaders().stream().filter(h -> !h.isBlank()).toList()));
        for (List<String> c : t.columns()) head.add(String.join(" / ", c));
        grid.add(head);
        for (List<String> row : t.rows()) {
            List<String> line = new ArrayList<>();
            line.add(String.join(" / ", row));
            for (List<String> col : t.columns()) {
                ExtractedCell cell = find(t, row, col);
                line.add(cell == null ? "" : shown(cell));
            }
            grid.add(line);
        }
        int[] widths = new int[head.size()];
        for (List<String> line : grid) {
            for (int i = 0; i < line.size(); i++) widths[i] = Math.max(widths[i], line.get(i).codePointCount(0, line.get(i).length()));
        }
        for (int r = 0; r < grid.size(); r++) {
            out.append("  |");
            for (int i = 0; i < widths.length; i++) out.append(' ').append(pad(grid.get(r).get(i), widths[i])).append(" |");
            out.append('\n');
            if (r == 0) {
                out.append("  |");
                for (int w : widths) out.append("-".repeat(w + 2)).append('|');
                out.append('\n');
            }
        }
        out.append("  guesses:");
        for (int c = 0; c < t.columns().size(); c++) {
            MetricGuess m = t.metrics().get(c);
            out.append(c == 0 ? " " : "; ").append(String.join(" / ", t.columns().get(c))).append(" = ").append(m.metric());
            if (!m.params().isEmpty()) out.append(m.params());
            ScaleGuess s = t.scales().get(c);
            out.append(' ').append(s.scale() == null ? "scale?" : s.scale().id());
        }
        out.append('\n');
        // Columns with the same doubtful guess are listed once, so a ten-column table stays readable.
        java.util.Map<String, List<String>> doubtful = new java.util.LinkedHashMap<>();
        for (int c = 0; c < t.columns().size(); c++) {
            String name = String.join(" / ", t.columns().get(c));
            MetricGuess m = t.metrics().get(c);
            if (m.confidence() < LOW_CONFIDENCE) {
                doubtful.computeIfAbsent("metric " + m.metric() + " (" + percent(m.confidence()) + ", " + m.reason() + ")",
                        k -> new ArrayList<>()).add(name);
            }
            ScaleGuess s = t.scales().get(c);
            if (s.confidence() < LOW_CONFIDENCE) {
                doubtful.computeIfAbsent("scale " + (s.scale() == null ? "unknown" : s.scale().id()) + " ("
                        + percent(s.confidence()) + ", " + s.reason() + ")", k -> new ArrayList<>()).add(name);
            }
        }
        List<String> low = new ArrayList<>();
        doubtful.forEach((what, cols) -> low.add((cols.size() == 1 ? "column " : "columns ") + String.join(", ", cols)
                + ": " + what));
        for (ExtractedCell cell : t.cells()) {
            if (cell.confidence() < LOW_CONFIDENCE) {
                low.add(String.join(" / ", cell.rowPath()) + " | " + String.join(" / ", cell.columnPath()) + ": \""
                        + cell.parsed().text() + "\" read as " + describe(cell) + " (" + percent(cell.confidence()) + ")");
            }
        }
        if (!low.isEmpty()) {
            out.append("  check these (low confidence):\n");
            for (String l : low) out.append("    - ").append(l).append('\n');
        }
        out.append('\n');
    }

    private static ExtractedCell find(ExtractedTable t, List<String> row, List<String> col) {
        for (ExtractedCell c : t.cells()) if (c.rowPath().equals(row) && c.columnPath().equals(col)) return c;
        return null;
    }

    private static String shown(ExtractedCell c) {
        ParsedCell p = c.parsed();
        String v = switch (p.kind()) {
            case NUMBER -> p.value() + (p.pm() == null ? "" : " ± " + p.pm()) + (p.percent() ? "%" : "");
            case MISSING -> "–";
            default -> p.text();
        };
        if (c.bold()) v = "**" + v + "**";
        if (c.underline()) v = "_" + v + "_";
        return v + String.join("", c.markers());
    }

    private static String describe(ExtractedCell c) {
        ParsedCell p = c.parsed();
        return switch (p.kind()) {
            case NUMBER -> "value " + p.value() + (p.pm() == null ? "" : " ± " + p.pm());
            case MISSING -> "missing";
            case TEXT -> "text";
            case EMPTY -> "empty";
        };
    }

    private static String percent(double confidence) { return Math.round(100 * confidence) + "% sure"; }

    private static String pad(String s, int width) {
        return s + " ".repeat(Math.max(0, width - s.codePointCount(0, s.length())));
    }

    private static String shorten(String s, int max) {
        return s.length() <= max ? s : s.substring(0, max - 3) + "...";
    }
}
