package org.assay.report;

import java.util.Locale;
import org.assay.claims.Claim;
import org.assay.claims.Scale;

/** Formats values for people: on the claim's own printed scale, one decimal more than printed. */
final class Display {
    private Display() {}

    static int decimals(Claim c) { return Math.max(2, c.value().decimals() + 1); }

    static String value(Claim c, double fraction) {
        if (Double.isNaN(fraction)) return "n/a";
        return String.format(Locale.ROOT, "%." + decimals(c) + "f", fraction * c.scale().factor());
    }

    static String range(Claim c, double lo, double hi) { return "[" + value(c, lo) + ", " + value(c, hi) + "]"; }

    /** A difference in the claim's units: "points" for percent, plain for fractions. */
    static String difference(Claim c, double fraction) {
        String v = String.format(Locale.ROOT, "%." + decimals(c) + "f", Math.abs(fraction) * c.scale().factor());
        return c.scale() == Scale.PERCENT ? v + " points" : v;
    }

    static String p(double p) {
        if (Double.isNaN(p)) return "n/a";
        if (p >= 0.001) return String.format(Locale.ROOT, "%.3f", p);
        return String.format(Locale.ROOT, "%.1e", p);
    }

    static String percent(double confidence) {
        double v = Math.round(confidence * 100 * 1e6) / 1e6;   // 0.9 * 100 is 90.00000000000001
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f%%", v) : String.format(Locale.ROOT, "%.1f%%", v);
    }
}
