package org.assay.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A plot axis whose ends and ticks are round numbers, and the map from values to pixels along it.
 * The ticks follow Heckbert's "loose labeling" (P. S. Heckbert, "Nice numbers for graph labels",
 * Graphics Gems, 1990): the tick step is 1, 2 or 5 times a power of ten, and the axis runs from the
 * last tick at or below the data to the first tick at or above it, so both ends are labelled.
 *
 * @param min      the axis's lower end (a tick)
 * @param max      the axis's upper end (a tick)
 * @param step     the distance between ticks
 * @param decimals decimals a tick label needs to show the step exactly
 */
record NiceAxis(double min, double max, double step, int decimals) {

    /** An axis covering [lo, hi] with about {@code ticks} ticks; a point gets a small range around it. */
    static NiceAxis covering(double lo, double hi, int ticks) {
        if (!Double.isFinite(lo) || !Double.isFinite(hi) || lo > hi) {
            throw new IllegalArgumentException("axis range [" + lo + ", " + hi + "]");
        }
        if (hi - lo < 1e-12 * Math.max(1, Math.abs(lo))) {
            double pad = lo == 0 ? 1 : Math.abs(lo) * 0.01;   // a single value: show 1% either side
            lo -= pad;
            hi += pad;
        }
        double range = niceNumber(hi - lo, false);
        double step = niceNumber(range / (ticks - 1), true);
        double min = Math.floor(lo / step) * step;
        double max = Math.ceil(hi / step) * step;
        int decimals = (int) Math.max(-Math.floor(Math.log10(step)), 0);
        return new NiceAxis(min, max, step, decimals);
    }

    /**
     * Heckbert's nice number near x: 1, 2, 5 or 10 times a power of ten, rounded to the nearest
     * ({@code round}) or the next at or above x.
     */
    static double niceNumber(double x, boolean round) {
        double exponent = Math.floor(Math.log10(x));
        double fraction = x / Math.pow(10, exponent);
        double nice;
        if (round) nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
        else nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
        return nice * Math.pow(10, exponent);
    }

    /** The tick values from min to max. */
    List<Double> ticks() {
        List<Double> out = new ArrayList<>();
        long count = Math.round((max - min) / step);
        for (long i = 0; i <= count; i++) out.add(min + i * step);
        return out;
    }

    /** A tick label: the value with as many decimals as the step needs. */
    String label(double value) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", value);
        return s.matches("-0(\\.0*)?") ? s.substring(1) : s;
    }

    /** The pixel position of {@code value} when the axis runs from pixel {@code from} to pixel {@code to}. */
    double position(double value, double from, double to) {
        return from + (value - min) / (max - min) * (to - from);
    }
}
