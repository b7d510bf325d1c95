package org.assay.report;

import org.assay.audit.Finding;
import org.assay.audit.Histogram;
import org.assay.claims.Claim;

/**
 * A small inline SVG of one claim's bootstrap distribution: the resampled values in their bins, on
 * the claim's printed scale, with the claim's rounding interval and the reproduced value marked, so
 * a reader sees where the printed value falls among the resamples.
 */
final class BootstrapHistogram {
    static final double WIDTH = 420;
    static final double HEIGHT = 122;
    static final double PLOT_LEFT = 14;
    static final double PLOT_RIGHT = 406;
    static final double BARS_TOP = 8;
    static final double BARS_BOTTOM = 68;
    static final int TICKS = 5;
    static final String BAR_FILL = "#56B4E9";   // Okabe–Ito sky blue
    /** A bin of zero width (every resample equal) is drawn this wide, so it can be seen. */
    static final double MIN_BAR = 2;

    private BootstrapHistogram() {}

    /** The histogram of {@code f}'s resamples; {@code f} must carry a histogram with at least one bin. */
    static String render(Finding f) {
        Histogram h = f.histogram();
        if (h == null || h.counts().length == 0) throw new IllegalArgumentException("no histogram for " + f.claim().label());
        Claim c = f.claim();
        double factor = c.scale().factor();
        NiceAxis axis = axisFor(f);
        Svg svg = new Svg();
        svg.open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "bootstrap-histogram", "role", "img",
                "viewBox", "0 0 " + Svg.num(WIDTH) + " " + Svg.num(HEIGHT), "width", Svg.num(WIDTH),
                "height", Svg.num(HEIGHT), "font-family", "sans-serif", "font-size", "10").newline();
        svg.element("title", "Bootstrap distribution: " + c.label() + " (" + ReportModel.metricLabel(c) + ")").newline();
        svg.element("desc", "Histogram of " + h.total() + " bootstrap resamples of the reproduced value, from "
                + Display.value(c, h.lower()) + " to " + Display.value(c, h.upper()) + " on the claim's printed scale; "
                + "the claim's rounding interval " + Display.range(c, f.claimLower(), f.claimUpper())
                + " is marked in purple and the reproduced value " + Display.value(c, f.estimate())
                + " by a dashed line.").newline();

        int max = 0;
        for (int n : h.counts()) max = Math.max(max, n);
        for (int i = 0; i < h.counts().length; i++) {
            double x0 = x(axis, (h.lower() + i * h.width()) * factor);
            double x1 = x(axis, (h.lower() + (i + 1) * h.width()) * factor);
            if (x1 - x0 < MIN_BAR) {
                double mid = (x0 + x1) / 2;
                x0 = mid - MIN_BAR / 2;
                x1 = mid + MIN_BAR / 2;
            }
            double height = max == 0 ? 0 : (BARS_BOTTOM - BARS_TOP) * h.counts()[i] / max;
            svg.leaf("rect", "class", "bin", "data-count", String.valueOf(h.counts()[i]), "x", Svg.num(x0),
                    "y", Svg.num(BARS_BOTTOM - height), "width", Svg.num(x1 - x0), "height", Svg.num(height),
                    "fill", BAR_FILL, "stroke", "#FFFFFF", "stroke-width", "0.5");
        }
        svg.newline();
        double roundLo = x(axis, f.claimLower() * factor);
        double roundHi = x(axis, f.claimUpper() * factor);
        svg.leaf("rect", "class", "rounding-interval", "x", Svg.num(roundLo), "y", Svg.num(BARS_TOP - 4),
                "width", Svg.num(roundHi - roundLo), "height", Svg.num(BARS_BOTTOM - BARS_TOP + 4),
                "fill", ForestPlot.ROUNDING_FILL, "fill-opacity", "0.45", "stroke", ForestPlot.ROUNDING_FILL,
                "stroke-width", "1.5");
        double est = x(axis, f.estimate() * factor);
        svg.leaf("line", "class", "estimate-line", "x1", Svg.num(est), "x2", Svg.num(est), "y1", Svg.num(BARS_TOP - 4),
                "y2", Svg.num(BARS_BOTTOM), "stroke", "#000000", "stroke-width", "1.5", "stroke-dasharray", "4 2");
        svg.newline();

        double axisY = BARS_BOTTOM + 2;
        svg.leaf("line", "class", "axis", "x1", Svg.num(PLOT_LEFT), "x2", Svg.num(PLOT_RIGHT), "y1", Svg.num(axisY),
                "y2", Svg.num(axisY), "stroke", "#444444", "stroke-width", "1");
        for (double t : axis.ticks()) {
            double x = x(axis, t);
            svg.leaf("line", "class", "tick", "x1", Svg.num(x), "x2", Svg.num(x), "y1", Svg.num(axisY),
                    "y2", Svg.num(axisY + 4), "stroke", "#444444", "stroke-width", "1");
            svg.element("text", axis.label(t), "class", "tick-label", "x", Svg.num(x), "y", Svg.num(axisY + 14),
                    "text-anchor", "middle");
        }
        svg.newline();
        svg.element("text", h.total() + " bootstrap resamples of the reproduced value", "class", "histogram-key",
                "x", Svg.num(PLOT_LEFT - 6), "y", Svg.num(HEIGHT - 20));
        svg.element("text", "purple: rounding interval of the printed value · dashed line: reproduced value",
                "class", "histogram-key", "x", Svg.num(PLOT_LEFT - 6), "y", Svg.num(HEIGHT - 6));
        svg.newline().close("svg");
        return svg.toString();
    }

    /** The axis on the printed scale, covering the bins, the rounding interval and the estimate. */
    static NiceAxis axisFor(Finding f) {
        Histogram h = f.histogram();
        double lo = Math.min(Math.min(h.lower(), f.claimLower()), f.estimate());
        double hi = Math.max(Math.max(h.upper(), f.claimUpper()), f.estimate());
        double factor = f.claim().scale().factor();
        return NiceAxis.covering(lo * factor, hi * factor, TICKS);
    }

    private static double x(NiceAxis axis, double value) { return axis.position(value, PLOT_LEFT, PLOT_RIGHT); }
}
