package org.assay.report;

import java.util.List;
import org.assay.audit.Finding;
import org.assay.audit.Verdict;
import org.assay.claims.Claim;
import org.assay.claims.Scale;

/**
 * The forest plot of one table as inline SVG: one row per claim, in the order of the findings.
 * Claims of one table can differ in metric and scale (a percent accuracy next to an AUC on 0–1), so
 * each row is a small multiple with its own axis, labelled on the claim's printed scale. A row shows
 * the equivalence margin (the claim's rounding interval widened by the margin on each side) shaded,
 * the rounding interval marked, the reproduced interval with the narrower interval of the two
 * one-sided tests inside it, the estimate as a marker whose shape gives the verdict, and the verdict
 * word beside it. A claim that could not be computed is a row that says so and why.
 */
final class ForestPlot {
    static final double WIDTH = 760;
    static final double PLOT_LEFT = 14;
    static final double PLOT_RIGHT = 540;
    static final double VERDICT_X = 566;
    static final double BAND_HEIGHT = 20;
    /** Roughly how many ticks an axis gets (Heckbert's target; the result has 3 to 7 or so). */
    static final int TICKS = 6;
    static final String MARGIN_FILL = "#D9D9D9";
    static final String ROUNDING_FILL = "#CC79A7";   // Okabe–Ito reddish purple
    static final String EQUIVALENCE_STROKE = "#8C8C8C";
    private static final double LEGEND_HEIGHT = 52;
    private static final double LINE = 15;
    private static final int LABEL_CHARS = 105;
    private static final int REASON_CHARS = 88;

    private ForestPlot() {}

    /** The plot of {@code findings} (one table's, in report order); {@code title} names the table. */
    static String render(String title, List<Finding> findings) {
        Finding first = findings.stream().filter(f -> f.verdict() != Verdict.NOT_COMPUTABLE).findFirst().orElse(null);
        Svg rows = new Svg();
        double y = first == null ? 8 : LEGEND_HEIGHT;
        StringBuilder description = new StringBuilder("Forest plot, one row per claim. ");
        if (first != null) description.append(legendText(first)).append(' ');
        for (int i = 0; i < findings.size(); i++) {
            Finding f = findings.get(i);
            description.append(rowSummary(f)).append(' ');
            y = row(rows, f, i + 1, y);
        }
        double height = Math.ceil(y + 4);

        Svg svg = new Svg();
        svg.open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "forest-plot", "role", "img",
                "viewBox", "0 0 " + Svg.num(WIDTH) + " " + Svg.num(height), "width", Svg.num(WIDTH),
                "height", Svg.num(height), "font-family", "sans-serif", "font-size", "12").newline();
        svg.element("title", "Forest plot: " + title).newline();
        svg.element("desc", description.toString().strip()).newline();
        if (first != null) legend(svg, first);
        return svg + rows.toString() + "</svg>";
    }

    /** One claim's row from {@code top}; returns the top of the next row. */
    private static double row(Svg svg, Finding f, int number, double top) {
        Claim c = f.claim();
        VerdictMarker marker = VerdictMarker.of(f.verdict());
        svg.open("g", "class", "forest-row", "data-claim", String.valueOf(number), "data-verdict", f.verdict().word())
                .newline();
        svg.element("title", rowSummary(f)).newline();
        List<String> label = Svg.wrap(c.label() + " — " + ReportModel.metricLabel(c) + ", printed " + printed(c), LABEL_CHARS);
        double y = top;
        for (String line : label) {
            y += LINE;
            svg.element("text", line, "class", "claim-label", "x", Svg.num(PLOT_LEFT - 6), "y", Svg.num(y),
                    "font-weight", "bold");
        }
        svg.newline();
        double bandTop = y + 5;
        double centre = bandTop + BAND_HEIGHT / 2;
        double bottom;
        if (f.verdict() == Verdict.NOT_COMPUTABLE) {
            double ty = bandTop;
            for (String line : Svg.wrap(f.reason(), REASON_CHARS)) {
                ty += 14;
                svg.element("text", line, "class", "not-computable-reason", "x", Svg.num(PLOT_LEFT), "y", Svg.num(ty),
                        "font-size", "11", "font-style", "italic");
            }
            centre = bandTop + 10;
            bottom = ty + 8;
        } else {
            marks(svg, f, bandTop, centre);
            bottom = bandTop + BAND_HEIGHT + 4 + 24;
        }
        marker.draw(svg, "verdict-key", VERDICT_X + 6, centre);
        svg.element("text", f.verdict().word(), "class", "verdict-label", "x", Svg.num(VERDICT_X + 18),
                "y", Svg.num(centre + 4), "font-weight", "bold");
        if (f.verdict() != Verdict.NOT_COMPUTABLE) {
            svg.element("text", Display.value(c, f.estimate()) + " " + Display.range(c, f.interval().lower(), f.interval().upper()),
                    "class", "verdict-numbers", "x", Svg.num(VERDICT_X + 18), "y", Svg.num(centre + 19), "font-size", "11");
        }
        svg.newline();
        svg.leaf("line", "class", "row-separator", "x1", "0", "x2", Svg.num(WIDTH), "y1", Svg.num(bottom),
                "y2", Svg.num(bottom), "stroke", "#E0E0E0", "stroke-width", "1");
        svg.close("g").newline();
        return bottom;
    }

    /** The marks of a computed claim: margin, rounding interval, intervals, estimate, and the axis. */
    private static void marks(Svg svg, Finding f, double bandTop, double centre) {
        NiceAxis axis = axisFor(f);
        double factor = f.claim().scale().factor();
        double marginLo = x(axis, (f.claimLower() - f.margin()) * factor);
        double marginHi = x(axis, (f.claimUpper() + f.margin()) * factor);
        svg.leaf("rect", "class", "margin-band", "x", Svg.num(marginLo), "y", Svg.num(bandTop),
                "width", Svg.num(marginHi - marginLo), "height", Svg.num(BAND_HEIGHT), "fill", MARGIN_FILL);
        double roundLo = x(axis, f.claimLower() * factor);
        double roundHi = x(axis, f.claimUpper() * factor);
        // the stroke keeps a rounding interval visible when it is narrower than a pixel
        svg.leaf("rect", "class", "rounding-interval", "x", Svg.num(roundLo), "y", Svg.num(bandTop),
                "width", Svg.num(roundHi - roundLo), "height", Svg.num(BAND_HEIGHT), "fill", ROUNDING_FILL,
                "stroke", ROUNDING_FILL, "stroke-width", "1.5");
        svg.newline();
        if (f.equivalence() != null) {
            svg.leaf("line", "class", "equivalence-interval", "x1", Svg.num(x(axis, f.equivalence().lower() * factor)),
                    "x2", Svg.num(x(axis, f.equivalence().upper() * factor)), "y1", Svg.num(centre), "y2", Svg.num(centre),
                    "stroke", EQUIVALENCE_STROKE, "stroke-width", "5");
        }
        double lo = x(axis, f.interval().lower() * factor);
        double hi = x(axis, f.interval().upper() * factor);
        svg.leaf("line", "class", "reproduced-interval", "x1", Svg.num(lo), "x2", Svg.num(hi), "y1", Svg.num(centre),
                "y2", Svg.num(centre), "stroke", "#000000", "stroke-width", "1.5");
        for (double end : new double[] {lo, hi}) {
            svg.leaf("line", "class", "interval-end", "x1", Svg.num(end), "x2", Svg.num(end), "y1", Svg.num(centre - 6),
                    "y2", Svg.num(centre + 6), "stroke", "#000000", "stroke-width", "1.5");
        }
        VerdictMarker.of(f.verdict()).draw(svg, "estimate-marker", x(axis, f.estimate() * factor), centre);
        svg.newline();
        axisLine(svg, axis, bandTop + BAND_HEIGHT + 4);
    }

    /** The claim's axis on its printed scale, wide enough for every mark of the row. */
    static NiceAxis axisFor(Finding f) {
        double lo = Math.min(Math.min(f.interval().lower(), f.estimate()), f.claimLower() - f.margin());
        double hi = Math.max(Math.max(f.interval().upper(), f.estimate()), f.claimUpper() + f.margin());
        if (f.equivalence() != null) {
            lo = Math.min(lo, f.equivalence().lower());
            hi = Math.max(hi, f.equivalence().upper());
        }
        double factor = f.claim().scale().factor();
        return NiceAxis.covering(lo * factor, hi * factor, TICKS);
    }

    private static void axisLine(Svg svg, NiceAxis axis, double y) {
        svg.leaf("line", "class", "axis", "x1", Svg.num(PLOT_LEFT), "x2", Svg.num(PLOT_RIGHT), "y1", Svg.num(y),
                "y2", Svg.num(y), "stroke", "#444444", "stroke-width", "1");
        for (double t : axis.ticks()) {
            double x = x(axis, t);
            svg.leaf("line", "class", "tick", "x1", Svg.num(x), "x2", Svg.num(x), "y1", Svg.num(y), "y2", Svg.num(y + 4),
                    "stroke", "#444444", "stroke-width", "1");
            svg.element("text", axis.label(t), "class", "tick-label", "x", Svg.num(x), "y", Svg.num(y + 15),
                    "font-size", "10", "text-anchor", "middle");
        }
        svg.newline();
    }

    private static double x(NiceAxis axis, double value) { return axis.position(value, PLOT_LEFT, PLOT_RIGHT); }

    private static void legend(Svg svg, Finding f) {
        svg.open("g", "class", "legend", "font-size", "11").newline();
        svg.leaf("rect", "x", Svg.num(PLOT_LEFT), "y", "6", "width", "22", "height", "12", "fill", MARGIN_FILL);
        svg.element("text", "equivalence margin: rounding interval ± margin", "x", Svg.num(PLOT_LEFT + 28), "y", "16");
        svg.leaf("rect", "x", "340", "y", "6", "width", "5", "height", "12", "fill", ROUNDING_FILL);
        svg.element("text", "rounding interval of the printed value", "x", "352", "y", "16").newline();
        svg.leaf("line", "x1", Svg.num(PLOT_LEFT), "x2", Svg.num(PLOT_LEFT + 22), "y1", "32", "y2", "32",
                "stroke", EQUIVALENCE_STROKE, "stroke-width", "5");
        svg.element("text", Display.percent(f.equivalence().confidence()) + " interval (two one-sided tests)",
                "x", Svg.num(PLOT_LEFT + 28), "y", "36");
        svg.leaf("line", "x1", "262", "x2", "284", "y1", "32", "y2", "32", "stroke", "#000000", "stroke-width", "1.5");
        svg.element("text", Display.percent(f.interval().confidence()) + " interval", "x", "290", "y", "36").newline();
        double x = 392;
        for (VerdictMarker m : List.of(VerdictMarker.CONSISTENT, VerdictMarker.INCONCLUSIVE, VerdictMarker.DISCREPANT)) {
            m.draw(svg, "legend-marker", x, 32);
            String word = Verdict.valueOf(m.name()).word();
            svg.element("text", word, "x", Svg.num(x + 10), "y", "36");
            x += 28 + word.length() * 6.6;
        }
        svg.newline().close("g").newline();
    }

    private static String legendText(Finding f) {
        return "Each row has its own axis on the claim's printed scale. The grey band is the equivalence margin "
                + "(the rounding interval of the printed value widened by the margin on each side); the purple bar is "
                + "the rounding interval; the thin black line is the reproduction's "
                + Display.percent(f.interval().confidence()) + " interval and the thick grey line inside it the "
                + Display.percent(f.equivalence().confidence()) + " interval of the two one-sided tests; the marker "
                + "is the reproduced value, a circle when consistent, a diamond when inconclusive and a square when "
                + "discrepant.";
    }

    /** The row in words, for the tooltip and the description read by screen readers. */
    static String rowSummary(Finding f) {
        Claim c = f.claim();
        String head = c.label() + " (" + ReportModel.metricLabel(c) + "): printed " + printed(c)
                + ", rounding interval " + Display.range(c, f.claimLower(), f.claimUpper());
        if (f.verdict() == Verdict.NOT_COMPUTABLE) return head + "; not computable: " + f.reason() + ".";
        return head + "; reproduced " + Display.value(c, f.estimate()) + ", "
                + Display.percent(f.interval().confidence()) + " interval "
                + Display.range(c, f.interval().lower(), f.interval().upper()) + "; margin "
                + Display.range(c, f.claimLower() - f.margin(), f.claimUpper() + f.margin()) + "; " + f.verdict().word() + ".";
    }

    private static String printed(Claim c) { return c.value().text() + (c.scale() == Scale.PERCENT ? "%" : ""); }
}
