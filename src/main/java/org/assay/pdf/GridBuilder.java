package org.assay.pdf;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;

/**
 * Rebuilds a table's grid from the glyphs and rules of its region: rows from baselines, columns
 * from the horizontal gaps that persist across the data rows, header paths from spanning headers
 * (bounded by the {@code \cmidrule} or vertical rules under or beside them), and row paths from
 * group labels ({@code \multirow}-style labels centred on their rows, or section rows).
 */
final class GridBuilder {
    private static final Pattern MISSING = Pattern.compile("(-|−|–|—|--|---|––|n/?a\\.?|N/?A|n\\.a\\.|NA)");
    private static final Pattern NUMBER_START = Pattern.compile("^[-+−–]?\\s?\\(?(\\d|\\.\\d).*");
    private static final Pattern MARKS = Pattern.compile("[†‡*§¶‖#]");

    private final TableRegion region;
    private final List<Rule> horizontal;
    private final List<Rule> vertical;

    private GridBuilder(TableRegion region) {
        this.region = region;
        double inside = 0.5;
        this.horizontal = region.rules().stream().filter(Rule::horizontal)
                .filter(r -> r.top() > region.top() + inside && r.bottom() < region.bottom() - inside).toList();
        this.vertical = region.rules().stream().filter(Rule::vertical).toList();
    }

    static TableGrid build(TableRegion region) {
        return new GridBuilder(region).build();
    }

    /** A data cell: a number, with or without its marks, or a printed "missing" sign. */
    static boolean valueLike(String text) {
        String s = MARKS.matcher(text).replaceAll("").strip();
        if (s.isEmpty()) return false;
        if (MISSING.matcher(s).matches()) return true;
        return NUMBER_START.matcher(s).matches() && !s.matches(".*\\p{L}{2,}.*");
    }

    private TableGrid build() {
        List<TextLine> lines = LineBuilder.lines(region.glyphs());
        if (lines.isEmpty()) return new TableGrid(List.of(), List.of(), List.of());
        double split = headerSplit(lines);
        List<TextLine> header = lines.stream().filter(l -> l.baseline() < split).toList();
        List<TextLine> body = lines.stream().filter(l -> l.baseline() > split).toList();
        List<TextLine> dataLines = body.stream().filter(this::hasValue).toList();
        if (dataLines.isEmpty()) return new TableGrid(List.of(), List.of(), List.of());
        List<TextLine> layoutLines = body.stream().filter(l -> hasValue(l) || isLabelOnly(l)).toList();
        List<double[]> columns = columns(layoutLines);
        List<List<GridCell>> cells = new ArrayList<>();
        for (TextLine l : dataLines) cells.add(cellsOf(l, columns));
        mergeUncertaintyColumns(columns, cells, header);
        int labels = labelColumnCount(cells, columns.size());
        List<List<String>> paths = headerPaths(header, columns, split);
        List<String> labelHeaders = new ArrayList<>();
        for (int c = 0; c < labels; c++) labelHeaders.add(String.join(" ", paths.get(c)));
        List<GridRow> rows = rows(body, dataLines, cells, columns, labels);
        return new TableGrid(paths.subList(labels, paths.size()), labelHeaders, rows);
    }

    /** A body line without values that is not wide: a group label set between rows, or a short section row. */
    private boolean isLabelOnly(TextLine l) {
        return !hasValue(l) && l.phrases().stream().allMatch(p -> p.width() < 0.3 * region.width());
    }

    private boolean hasValue(TextLine l) {
        return l.phrases().stream().anyMatch(p -> valueLike(p.text()));
    }

    /**
     * The y between the header and the body: the first rule across the whole table with text on
     * both sides, or else the top of the first line that reads as a data row.
     */
    private double headerSplit(List<TextLine> lines) {
        double fullWidth = 0.9 * region.width();
        List<Rule> full = horizontal.stream().filter(r -> r.width() >= fullWidth)
                .sorted(Comparator.comparingDouble(Rule::y)).toList();
        for (Rule r : full) {
            boolean above = lines.stream().anyMatch(l -> l.baseline() < r.y());
            boolean belowWithValues = lines.stream().anyMatch(l -> l.baseline() > r.y() && hasValue(l));
            if (above && belowWithValues) return r.y();
        }
        for (TextLine l : lines) {
            long values = l.phrases().stream().skip(1).filter(p -> valueLike(p.text())).count();
            if (l.phrases().size() >= 2 && values * 2 >= l.phrases().size() - 1) return l.top() - 0.01;
        }
        return lines.get(0).top() - 0.01;
    }

    /** Column x-ranges: the union of the data rows' phrase extents, split where no row has text. */
    private List<double[]> columns(List<TextLine> dataLines) {
        List<double[]> spans = new ArrayList<>();
        for (TextLine l : dataLines) {
            List<Phrase> ps = l.phrases();
            // A lone phrase over most of the width is a spanning note, not a cell.
            if (ps.size() == 1 && ps.get(0).width() > 0.5 * region.width()) continue;
            for (Phrase p : ps) spans.add(new double[] {p.x0(), p.x1()});
        }
        spans.sort(Comparator.comparingDouble(s -> s[0]));
        List<double[]> merged = new ArrayList<>();
        for (double[] s : spans) {
            double[] last = merged.isEmpty() ? null : merged.get(merged.size() - 1);
            if (last != null && s[0] <= last[1] + 0.5 && !ruleBetween(last[1], s[0])) last[1] = Math.max(last[1], s[1]);
            else merged.add(new double[] {s[0], s[1]});
        }
        return merged;
    }

    private boolean ruleBetween(double a, double b) {
        return a < b && vertical.stream().anyMatch(v -> v.x() > a && v.x() < b);
    }

    private List<GridCell> cellsOf(TextLine l, List<double[]> columns) {
        List<List<Phrase>> byColumn = new ArrayList<>();
        for (int c = 0; c < columns.size(); c++) byColumn.add(new ArrayList<>());
        for (Phrase p : l.phrases()) byColumn.get(nearestColumn(p.x0(), p.x1(), columns)).add(p);
        List<GridCell> out = new ArrayList<>();
        for (List<Phrase> ps : byColumn) out.add(ps.isEmpty() ? null : cell(ps));
        return out;
    }

    static int nearestColumn(double x0, double x1, List<double[]> columns) {
        int best = 0;
        double bestScore = Double.NEGATIVE_INFINITY;
        for (int c = 0; c < columns.size(); c++) {
            double[] col = columns.get(c);
            double overlap = Math.min(x1, col[1]) - Math.max(x0, col[0]);
            if (overlap > bestScore) { bestScore = overlap; best = c; }
        }
        return best;
    }

    private GridCell cell(List<Phrase> ps) {
        List<Glyph> glyphs = new ArrayList<>();
        StringBuilder text = new StringBuilder();
        for (Phrase p : ps) {
            glyphs.addAll(p.glyphs());
            text.append(text.length() == 0 ? "" : " ").append(p.text());
        }
        double x0 = ps.get(0).x0(), x1 = ps.get(ps.size() - 1).x1();
        double top = ps.stream().mapToDouble(Phrase::top).min().orElseThrow();
        double bottom = ps.stream().mapToDouble(Phrase::bottom).max().orElseThrow();
        double baseline = ps.get(0).baseline(), size = ps.get(0).size();
        boolean underlined = horizontal.stream().anyMatch(r -> r.top() >= baseline - 0.5
                && r.top() <= baseline + 0.35 * size && r.overlapX(x0, x1) >= 0.6 * r.width()
                && r.width() <= (x1 - x0) + 2 && r.width() >= 0.4 * (x1 - x0));
        return new GridCell(text.toString(), glyphs, x0, x1, top, bottom, baseline, size, underlined);
    }

    /**
     * Uncertainties set apart from their value ("94.1" and "± 0.3" far enough apart to look like two
     * columns) are joined back when the right-hand column has no header of its own.
     */
    private void mergeUncertaintyColumns(List<double[]> columns, List<List<GridCell>> cells, List<TextLine> header) {
        for (int c = columns.size() - 1; c >= 1; c--) {
            final int col = c;
            boolean allUncertain = true, any = false;
            for (List<GridCell> row : cells) {
                GridCell g = row.get(col);
                if (g == null) continue;
                any = true;
                String t = g.text().strip();
                if (!(t.startsWith("±") || t.startsWith("(") || t.startsWith("+-") || t.equals("±"))) allUncertain = false;
            }
            double[] span = columns.get(col);
            boolean ownHeader = header.stream().flatMap(l -> l.phrases().stream())
                    .anyMatch(p -> p.overlapX(span[0], span[1]) > 0 && p.overlapX(columns.get(col - 1)[0],
                            columns.get(col - 1)[1]) <= 0);
            if (!any || !allUncertain || ownHeader) continue;
            for (List<GridCell> row : cells) {
                GridCell left = row.get(col - 1), right = row.get(col);
                if (right != null) row.set(col - 1, left == null ? right : join(left, right));
                row.remove(col);
            }
            columns.get(col - 1)[1] = span[1];
            columns.remove(col);
        }
    }

    private static GridCell join(GridCell a, GridCell b) {
        List<Glyph> g = new ArrayList<>(a.glyphs());
        g.addAll(b.glyphs());
        return new GridCell(a.text() + " " + b.text(), g, a.x0(), b.x1(), Math.min(a.top(), b.top()),
                Math.max(a.bottom(), b.bottom()), a.baseline(), a.size(), a.underlined());
    }

    /** Leading columns whose cells are mostly words, not values: the row labels. */
    private static int labelColumnCount(List<List<GridCell>> cells, int columns) {
        int labels = 0;
        for (int c = 0; c < columns - 1; c++) {
            int words = 0, values = 0;
            for (List<GridCell> row : cells) {
                GridCell g = row.get(c);
                if (g == null) continue;
                if (valueLike(g.text())) values++;
                else words++;
            }
            // The first column holds the row labels even when they are numbers (ensemble sizes, years).
            if (c == 0 || values == 0 || words > values) labels++;
            else break;
        }
        return labels;
    }

    /** Header path of every column (label columns included), top to bottom. */
    private List<List<String>> headerPaths(List<TextLine> header, List<double[]> columns, double split) {
        List<List<String>> paths = new ArrayList<>();
        List<Boolean> lastSingle = new ArrayList<>();
        List<Double> lastBaseline = new ArrayList<>();
        for (int c = 0; c < columns.size(); c++) {
            paths.add(new ArrayList<>());
            lastSingle.add(false);
            lastBaseline.add(Double.NaN);
        }
        for (int i = 0; i < header.size(); i++) {
            TextLine line = header.get(i);
            double nextTop = i + 1 < header.size() ? header.get(i + 1).top() : split;
            for (Phrase p : line.phrases()) {
                Set<Integer> span = spannedColumns(p, columns, nextTop);
                boolean level = span.size() > 1 || ruleUnder(p, nextTop) != null;
                String text = CellText.normaliseLabel(p.text());
                for (int c : span) {
                    List<String> path = paths.get(c);
                    boolean continues = !level && lastSingle.get(c) && !path.isEmpty()
                            && p.baseline() - lastBaseline.get(c) <= 1.6 * line.size();
                    if (continues) path.set(path.size() - 1, path.get(path.size() - 1) + " " + text);
                    else path.add(text);
                    lastSingle.set(c, !level);
                    lastBaseline.set(c, p.baseline());
                }
            }
        }
        return paths;
    }

    private Set<Integer> spannedColumns(Phrase p, List<double[]> columns, double nextTop) {
        Set<Integer> span = new TreeSet<>();
        for (int c = 0; c < columns.size(); c++) {
            if (p.overlapX(columns.get(c)[0], columns.get(c)[1]) > 0) span.add(c);
        }
        if (span.isEmpty()) span.add(nearestByCenter(p.centerX(), columns));
        Rule under = ruleUnder(p, nextTop);
        if (under != null) span.addAll(columnsWithin(under.x0() - 1, under.x1() + 1, columns));
        double left = vertical.stream().filter(v -> v.x() < p.x0() && covers(v, p.baseline()))
                .mapToDouble(Rule::x).max().orElse(Double.NaN);
        double right = vertical.stream().filter(v -> v.x() > p.x1() && covers(v, p.baseline()))
                .mapToDouble(Rule::x).min().orElse(Double.NaN);
        if (!Double.isNaN(left) && !Double.isNaN(right)) span.addAll(columnsWithin(left, right, columns));
        return span;
    }

    private static boolean covers(Rule v, double y) { return v.top() <= y && v.bottom() >= y - 2; }

    /** A partial rule ({@code \cmidrule}, {@code \cline}) under the phrase, above the next header line. */
    private Rule ruleUnder(Phrase p, double nextTop) {
        return horizontal.stream()
                .filter(r -> r.top() > p.baseline() + 0.3 * p.size() && r.top() < p.baseline() + 1.3 * p.size()
                        && r.width() < 0.9 * region.width() && r.x0() <= p.centerX() && r.x1() >= p.centerX())
                .findFirst().orElse(null);
    }

    private static Set<Integer> columnsWithin(double a, double b, List<double[]> columns) {
        Set<Integer> out = new LinkedHashSet<>();
        for (int c = 0; c < columns.size(); c++) {
            double center = (columns.get(c)[0] + columns.get(c)[1]) / 2;
            if (center > a && center < b) out.add(c);
        }
        return out;
    }

    private static int nearestByCenter(double x, List<double[]> columns) {
        int best = 0;
        for (int c = 1; c < columns.size(); c++) {
            double d = Math.abs((columns.get(c)[0] + columns.get(c)[1]) / 2 - x);
            double bd = Math.abs((columns.get(best)[0] + columns.get(best)[1]) / 2 - x);
            if (d < bd) best = c;
        }
        return best;
    }

    /** Data rows with their label paths, filled in from group labels and section rows. */
    private List<GridRow> rows(List<TextLine> body, List<TextLine> dataLines, List<List<GridCell>> cells,
                               List<double[]> columns, int labels) {
        double pitch = pitch(dataLines);
        List<String[]> labelTexts = new ArrayList<>();
        for (List<GridCell> row : cells) {
            String[] t = new String[labels];
            for (int c = 0; c < labels; c++) t[c] = row.get(c) == null ? null : CellText.normaliseLabel(row.get(c).text());
            labelTexts.add(t);
        }
        // Lines without values: group labels set between rows, or section rows above their rows.
        List<double[]> floating = new ArrayList<>(); // {baseline, column}
        List<String> floatingText = new ArrayList<>();
        List<Double> sectionAt = new ArrayList<>();
        List<String> sectionText = new ArrayList<>();
        for (TextLine l : body) {
            if (hasValue(l)) continue;
            int above = nearestData(dataLines, l.baseline(), -1), below = nearestData(dataLines, l.baseline(), 1);
            boolean between = above >= 0 && below >= 0
                    && l.baseline() - dataLines.get(above).baseline() < 0.9 * pitch
                    && dataLines.get(below).baseline() - l.baseline() < 0.9 * pitch;
            boolean inLabels = l.phrases().stream().allMatch(p -> nearestColumn(p.x0(), p.x1(), columns) < labels);
            if (between && inLabels) {
                for (Phrase p : l.phrases()) {
                    floating.add(new double[] {l.baseline(), nearestColumn(p.x0(), p.x1(), columns)});
                    floatingText.add(CellText.normaliseLabel(p.text()));
                }
            } else {
                sectionAt.add(l.baseline());
                sectionText.add(CellText.normaliseLabel(l.text().replaceAll("\\s{2,}", " ")));
            }
        }
        List<GridRow> rows = new ArrayList<>();
        for (int r = 0; r < dataLines.size(); r++) {
            double y = dataLines.get(r).baseline();
            List<String> path = new ArrayList<>();
            String section = section(y, sectionAt, sectionText);
            if (section != null) path.add(section);
            List<String> own = new ArrayList<>();
            for (int c = 0; c < labels; c++) {
                String t = labelTexts.get(r)[c];
                if (t == null) t = nearestLabel(r, c, dataLines, labelTexts, floating, floatingText, columns.get(c));
                if (t != null) path.add(t);
                own.add(t == null ? "" : t);
            }
            rows.add(new GridRow(path, own, cells.get(r).subList(labels, columns.size()), y));
        }
        return rows;
    }

    private static double pitch(List<TextLine> dataLines) {
        if (dataLines.size() < 2) return dataLines.isEmpty() ? 12 : 1.2 * dataLines.get(0).size() + 2;
        double[] d = new double[dataLines.size() - 1];
        for (int i = 1; i < dataLines.size(); i++) d[i - 1] = dataLines.get(i).baseline() - dataLines.get(i - 1).baseline();
        return LineBuilder.median(d);
    }

    private static int nearestData(List<TextLine> dataLines, double y, int direction) {
        int best = -1;
        for (int i = 0; i < dataLines.size(); i++) {
            double b = dataLines.get(i).baseline();
            if (direction < 0 && b < y) best = i;
            if (direction > 0 && b > y) return i;
        }
        return best;
    }

    /** The section row above y, unless a full-width rule separates them. */
    private String section(double y, List<Double> at, List<String> text) {
        for (int i = at.size() - 1; i >= 0; i--) {
            double s = at.get(i);
            if (s >= y) continue;
            boolean cut = horizontal.stream().anyMatch(r -> r.width() >= 0.9 * region.width() && r.y() > s && r.y() < y);
            return cut ? null : text.get(i);
        }
        return null;
    }

    /** The nearest label printed in column c, above or below, not across a rule that covers that column. */
    private String nearestLabel(int r, int c, List<TextLine> dataLines, List<String[]> labelTexts,
                                List<double[]> floating, List<String> floatingText, double[] column) {
        double y = dataLines.get(r).baseline();
        String best = null;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int o = 0; o < dataLines.size(); o++) {
            String t = labelTexts.get(o)[c];
            if (t == null) continue;
            double d = dataLines.get(o).baseline() - y;
            if (Math.abs(d) < bestDistance - 0.01 || Math.abs(d) <= bestDistance + 0.01 && d < 0 && best != null) {
                if (!ruleAcross(y, dataLines.get(o).baseline(), column)) {
                    bestDistance = Math.abs(d);
                    best = t;
                }
            }
        }
        for (int f = 0; f < floating.size(); f++) {
            if ((int) floating.get(f)[1] != c) continue;
            double d = Math.abs(floating.get(f)[0] - y);
            if (d < bestDistance && !ruleAcross(y, floating.get(f)[0], column)) {
                bestDistance = d;
                best = floatingText.get(f);
            }
        }
        return best;
    }

    private boolean ruleAcross(double y1, double y2, double[] column) {
        double lo = Math.min(y1, y2), hi = Math.max(y1, y2), x = (column[0] + column[1]) / 2;
        // A rule across the label column (a full rule, a cmidrule or cline under it) closes a group.
        return horizontal.stream().anyMatch(r -> r.y() > lo && r.y() < hi && r.x0() <= x && r.x1() >= x);
    }
}
