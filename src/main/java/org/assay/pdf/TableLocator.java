package org.assay.pdf;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * Finds the body of each table caption on a page. A ruled table (booktabs or {@code \hline}) is the
 * stack of same-width horizontal rules that starts just below the caption (caption above) or ends
 * just above it (caption below); an unruled one is the block of multi-cell lines next to the
 * caption, ended by a wide gap, another caption or a line of running text.
 */
final class TableLocator {
    /** Largest gap between a caption and its table's first rule, in font sizes. */
    private static final double CAPTION_TO_RULE = 3.5;

    private TableLocator() {}

    static List<TableRegion> locate(PageContent page) {
        List<TextLine> lines = LineBuilder.lines(page.glyphs());
        PageColumns columns = PageColumns.of(page, lines);
        List<Caption> captions = CaptionFinder.find(lines, columns, page.rules());
        List<Rule> horizontal = page.horizontalRules().stream().filter(r -> r.width() >= 20).toList();
        List<TableRegion> out = new ArrayList<>();
        for (Caption c : captions) {
            if (!c.isTable()) continue;
            Optional<TableRegion> region = ruled(page, c, captions, horizontal, lines);
            if (region.isEmpty()) region = unruled(page, c, captions, lines, columns);
            region.ifPresent(out::add);
        }
        return out;
    }

    private static Optional<TableRegion> ruled(PageContent page, Caption c, List<Caption> captions,
                                               List<Rule> horizontal, List<TextLine> lines) {
        double reach = CAPTION_TO_RULE * c.size();
        Optional<Rule> below = horizontal.stream()
                .filter(r -> r.top() > c.bottom() - 1 && r.top() - c.bottom() < reach && coversCaption(r, c))
                .min(Comparator.comparingDouble(r -> r.top() - c.bottom()));
        Optional<Rule> above = horizontal.stream()
                .filter(r -> r.bottom() < c.top() + 1 && c.top() - r.bottom() < reach && coversCaption(r, c))
                .max(Comparator.comparingDouble(Rule::bottom));
        boolean captionBelow;
        Rule first;
        if (below.isPresent() && (above.isEmpty() || below.get().top() - c.bottom() <= c.top() - above.get().bottom())) {
            first = below.get();
            captionBelow = false;
        } else if (above.isPresent()) {
            first = above.get();
            captionBelow = true;
        } else {
            return Optional.empty();
        }
        List<Rule> family = horizontal.stream().filter(r -> sameWidth(r, first))
                .sorted(Comparator.comparingDouble(Rule::y)).toList();
        int at = family.indexOf(first);
        int step = captionBelow ? -1 : 1;
        Rule last = first;
        for (int k = at + step; k >= 0 && k < family.size(); k += step) {
            Rule next = family.get(k);
            double lo = Math.min(last.y(), next.y()), hi = Math.max(last.y(), next.y());
            boolean blocked = captions.stream().anyMatch(o -> o != c && o.top() < hi && o.bottom() > lo
                    && o.x1() > first.x0() && o.x0() < first.x1())
                    || lines.stream().anyMatch(l -> l.baseline() > lo && l.baseline() < hi && isRunningText(l, first));
            if (blocked || hi - lo > 0.6 * page.height()) break;
            last = next;
        }
        double top = Math.min(first.top(), last.top()), bottom = Math.max(first.bottom(), last.bottom());
        if (bottom - top < c.size()) return Optional.empty(); // a lone rule (a figure frame, a footnote bar)
        double x0 = first.x0(), x1 = first.x1();
        return Optional.of(region(page, c, x0 - 1, x1 + 1, top, bottom, captionBelow, true));
    }

    private static boolean coversCaption(Rule r, Caption c) {
        return r.x0() <= c.centerX() + 2 && r.x1() >= c.centerX() - 2 || r.overlapX(c.x0(), c.x1()) > 0.5 * (c.x1() - c.x0());
    }

    private static boolean sameWidth(Rule a, Rule b) {
        return Math.abs(a.x0() - b.x0()) < 3 && Math.abs(a.x1() - b.x1()) < 3;
    }

    /** A line wider than the table that runs past both its edges: paragraph text, not a table row. */
    private static boolean isRunningText(TextLine l, Rule table) {
        return l.x0() < table.x0() - 8 && l.x1() > table.x1() + 8;
    }

    private static Optional<TableRegion> unruled(PageContent page, Caption c, List<Caption> captions,
                                                 List<TextLine> lines, PageColumns columns) {
        double[] column = columns.columnOf(c.x0(), c.x1());
        List<TextLine> inColumn = lines.stream()
                .map(l -> restrict(l, column)).filter(l -> l != null).toList();
        for (boolean downwards : new boolean[] {true, false}) {
            List<TextLine> block = new ArrayList<>();
            double edge = downwards ? c.bottom() : c.top();
            List<TextLine> ordered = new ArrayList<>(inColumn.stream()
                    .filter(l -> downwards ? l.top() >= c.bottom() - 0.5 : l.bottom() <= c.top() + 0.5).toList());
            if (!downwards) java.util.Collections.reverse(ordered);
            for (TextLine l : ordered) {
                double gap = downwards ? l.top() - edge : edge - l.bottom();
                if (gap > 2.0 * c.size()) break;
                boolean caption = captions.stream().anyMatch(o -> Math.abs(o.top() - l.top()) < 1 && o.x0() >= column[0]
                        && o.x1() <= column[1]);
                if (caption || l.phrases().size() == 1 && l.x1() - l.x0() > 0.85 * (column[1] - column[0])) break;
                block.add(l);
                edge = downwards ? l.bottom() : l.top();
            }
            if (block.stream().filter(l -> l.phrases().size() >= 2).count() >= 2) {
                double top = block.stream().mapToDouble(TextLine::top).min().orElseThrow();
                double bottom = block.stream().mapToDouble(TextLine::bottom).max().orElseThrow();
                double x0 = block.stream().mapToDouble(TextLine::x0).min().orElseThrow();
                double x1 = block.stream().mapToDouble(TextLine::x1).max().orElseThrow();
                return Optional.of(region(page, c, x0 - 1, x1 + 1, top - 0.5, bottom + 0.5, !downwards, false));
            }
        }
        return Optional.empty();
    }

    private static TextLine restrict(TextLine l, double[] column) {
        List<Phrase> kept = l.phrases().stream().filter(p -> p.x0() >= column[0] - 1 && p.x1() <= column[1] + 1).toList();
        return kept.isEmpty() ? null : new TextLine(l.baseline(), l.top(), l.bottom(), l.size(), kept);
    }

    private static TableRegion region(PageContent page, Caption c, double x0, double x1, double top, double bottom,
                                      boolean captionBelow, boolean ruled) {
        List<Glyph> glyphs = page.glyphs().stream().filter(g -> !g.isSpace() && g.centerX() >= x0 && g.centerX() <= x1
                && g.baseline() > top && g.top() < bottom).toList();
        List<Rule> rules = page.rules().stream().filter(r -> r.x() >= x0 - 2 && r.x() <= x1 + 2
                && r.y() >= top - 1 && r.y() <= bottom + 1).toList();
        return new TableRegion(page.number(), c, x0, x1, top, bottom, captionBelow, ruled, glyphs, rules);
    }
}
