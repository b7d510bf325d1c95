package org.assay.claims;

import java.math.BigDecimal;

/**
 * A number exactly as printed in the paper. The string keeps its decimals, because
 * "94.10" and "94.1" are different claims (DESIGN.md principle 2).
 *
 * @param text     the printed text, trimmed (for example {@code "94.10"})
 * @param number   its exact decimal value
 * @param decimals digits after the decimal point as printed (0 for "94")
 */
public record PrintedValue(String text, BigDecimal number, int decimals) {

    /** Parses a plain decimal such as "87.4", "0.912", "-3", "100". */
    public static PrintedValue parse(String text) {
        String t = text.trim();
        if (!t.matches("[-+]?\\d+(\\.\\d+)?")) {
            throw new NumberFormatException("not a plain decimal number: \"" + text + "\"");
        }
        BigDecimal n = new BigDecimal(t);
        int dot = t.indexOf('.');
        int decimals = dot < 0 ? 0 : t.length() - dot - 1;
        return new PrintedValue(t, n, decimals);
    }

    /** Half a unit in the last printed place, on the printed scale (0.05 for "94.1"). */
    public BigDecimal halfUnit() {
        return BigDecimal.ONE.movePointLeft(decimals).divide(BigDecimal.valueOf(2));
    }

    /**
     * The values that round to this text under round-half-up or round-half-even, on the
     * metric's fraction scale: [v - h, v + h] with h half a unit in the last place. The
     * endpoints are included because one of the two rounding rules maps each endpoint to
     * this text, so a check that uses the closed interval accepts both rules.
     */
    public double[] roundingInterval(Scale scale) {
        BigDecimal h = halfUnit();
        return new double[] {
            number.subtract(h).doubleValue() / scale.factor(),
            number.add(h).doubleValue() / scale.factor()
        };
    }

    /** The printed value on the metric's fraction scale. */
    public double fraction(Scale scale) { return number.doubleValue() / scale.factor(); }
}
