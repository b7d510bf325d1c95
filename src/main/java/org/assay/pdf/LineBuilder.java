package org.assay.pdf;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Groups glyphs into lines by baseline and lines into phrases by horizontal gaps. Raised or
 * lowered small glyphs (footnote marks, superscript letters) join the line they decorate.
 */
final class LineBuilder {
    /** A gap wider than this many font sizes separates two words. */
    static final double WORD_GAP = 0.12;
    /** A gap wider than this many font sizes separates two cells. */
    static final double CELL_GAP = 0.45;

    private LineBuilder() {}

    static List<TextLine> lines(List<Glyph> glyphs) {
        List<Glyph> sorted = new ArrayList<>(glyphs.stream().filter(g -> !g.isSpace()).toList());
        sorted.sort(Comparator.comparingDouble(Glyph::baseline).thenComparingDouble(Glyph::x0));
        List<List<Glyph>> groups = new ArrayList<>();
        List<Double> baselines = new ArrayList<>();
        for (Glyph g : sorted) {
            int last = groups.size() - 1;
            if (last >= 0 && Math.abs(g.baseline() - baselines.get(last)) <= 0.2 * g.size()) {
                groups.get(last).add(g);
            } else {
                groups.add(new ArrayList<>(List.of(g)));
                baselines.add(g.baseline());
            }
        }
        attachScripts(groups);
        List<TextLine> lines = new ArrayList<>();
        for (List<Glyph> group : groups) if (!group.isEmpty()) lines.add(line(group));
        lines.sort(Comparator.comparingDouble(TextLine::baseline));
        return lines;
    }

    /**
     * A group made only of small glyphs that sits just above or below a group of larger ones,
     * each glyph touching a larger glyph's side, is a set of superscripts or subscripts.
     */
    private static void attachScripts(List<List<Glyph>> groups) {
        for (int i = 0; i < groups.size(); i++) {
            List<Glyph> small = groups.get(i);
            if (small.isEmpty()) continue;
            double size = small.stream().mapToDouble(Glyph::size).max().orElse(0);
            for (int d : new int[] {1, -1}) {
                int j = i + d;
                if (j < 0 || j >= groups.size() || groups.get(j).isEmpty()) continue;
                List<Glyph> main = groups.get(j);
                double mainSize = median(main.stream().mapToDouble(Glyph::size).toArray());
                double shift = Math.abs(small.get(0).baseline() - main.get(0).baseline());
                if (size > 0.85 * mainSize || shift > 0.7 * mainSize) continue;
                boolean allTouch = runs(small).stream().allMatch(run -> main.stream().anyMatch(m ->
                        touches(run.get(0), m, mainSize) || touches(run.get(run.size() - 1), m, mainSize)));
                if (allTouch) {
                    main.addAll(small);
                    small.clear();
                    break;
                }
            }
        }
    }

    private static boolean touches(Glyph s, Glyph m, double mainSize) {
        return s.x0() - m.x1() < 0.35 * mainSize && m.x0() - s.x1() < 0.35 * mainSize;
    }

    /** Small glyphs split where they stop touching each other ("a,b" stays one run). */
    private static List<List<Glyph>> runs(List<Glyph> small) {
        List<Glyph> sorted = new ArrayList<>(small);
        sorted.sort(Comparator.comparingDouble(Glyph::x0));
        List<List<Glyph>> runs = new ArrayList<>();
        for (Glyph g : sorted) {
            List<Glyph> last = runs.isEmpty() ? null : runs.get(runs.size() - 1);
            if (last != null && g.x0() - last.get(last.size() - 1).x1() < 0.3 * g.size()) last.add(g);
            else runs.add(new ArrayList<>(List.of(g)));
        }
        return runs;
    }

    static TextLine line(List<Glyph> group) {
        List<Glyph> g = new ArrayList<>(group);
        g.sort(Comparator.comparingDouble(Glyph::x0));
        double size = median(g.stream().mapToDouble(Glyph::size).toArray());
        List<Phrase> phrases = new ArrayList<>();
        List<Glyph> run = new ArrayList<>();
        double runEnd = Double.NEGATIVE_INFINITY;
        for (Glyph x : g) {
            // A ± binds the numbers on both sides however wide the typesetter spaced it.
            boolean plusMinus = !run.isEmpty() && (run.get(run.size() - 1).text().equals("±") || x.text().equals("±"));
            if (!run.isEmpty() && x.x0() - runEnd > CELL_GAP * size && !(plusMinus && x.x0() - runEnd < 1.2 * size)) {
                phrases.add(phrase(run, size));
                run = new ArrayList<>();
            }
            run.add(x);
            runEnd = Math.max(runEnd, x.x1());
        }
        if (!run.isEmpty()) phrases.add(phrase(run, size));
        double top = g.stream().mapToDouble(Glyph::top).min().orElse(0);
        double bottom = g.stream().mapToDouble(Glyph::bottom).max().orElse(0);
        return new TextLine(median(g.stream().filter(x -> x.size() >= 0.85 * size).mapToDouble(Glyph::baseline)
                .toArray()), top, bottom, size, phrases);
    }

    static Phrase phrase(List<Glyph> run, double lineSize) {
        StringBuilder sb = new StringBuilder();
        double prevEnd = Double.NaN;
        for (Glyph x : run) {
            if (!Double.isNaN(prevEnd) && x.x0() - prevEnd > WORD_GAP * lineSize) sb.append(' ');
            sb.append(x.text());
            prevEnd = Math.max(Double.isNaN(prevEnd) ? x.x1() : prevEnd, x.x1());
        }
        double x0 = run.stream().mapToDouble(Glyph::x0).min().orElse(0);
        double x1 = run.stream().mapToDouble(Glyph::x1).max().orElse(0);
        double top = run.stream().mapToDouble(Glyph::top).min().orElse(0);
        double bottom = run.stream().mapToDouble(Glyph::bottom).max().orElse(0);
        double base = median(run.stream().filter(x -> x.size() >= 0.85 * lineSize).mapToDouble(Glyph::baseline)
                .toArray());
        if (Double.isNaN(base)) base = run.get(0).baseline();
        return new Phrase(sb.toString(), run, x0, x1, top, bottom, base, lineSize);
    }

    static double median(double[] v) {
        if (v.length == 0) return Double.NaN;
        double[] s = v.clone();
        java.util.Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
    }
}
