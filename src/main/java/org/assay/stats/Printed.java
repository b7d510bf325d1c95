package org.assay.stats;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Objects;

/**
 * A number as printed in a results table: its value, the number of decimals it was printed
 * with, and the factor between the printed scale and the fraction scale (100 for percent,
 * 1 for a fraction). A printed value stands for its rounding interval, not a point: "94.1"
 * percent is every fraction whose value times 100 rounds to 94.1.
 *
 * <p>All rounding here is exact: the fraction {@code num/den} is divided with
 * {@link BigDecimal#divide(BigDecimal, int, java.math.RoundingMode)}, which rounds the exact
 * quotient, so no binary floating point is involved.
 */
public record Printed(BigDecimal value, int decimals, int scaleFactor) {
    public Printed {
        Objects.requireNonNull(value, "value");
        if (decimals < 0) throw new IllegalArgumentException("decimals must be >= 0, got " + decimals);
        if (scaleFactor < 1) throw new IllegalArgumentException("scaleFactor must be >= 1, got " + scaleFactor);
        try {
            value = value.setScale(decimals);
        } catch (ArithmeticException e) {
            throw new IllegalArgumentException(value.toPlainString() + " has more than " + decimals + " decimals", e);
        }
    }

    /**
     * Reads a printed number, keeping its decimals ("94.10" has two). Plain decimal notation
     * only: an exponent ("1e-3") does not say how many decimals were printed.
     */
    public static Printed of(String text, int scaleFactor) {
        Objects.requireNonNull(text, "text");
        String t = text.strip();
        if (t.isEmpty() || t.indexOf('e') >= 0 || t.indexOf('E') >= 0) {
            throw new IllegalArgumentException("not a plain decimal number: '" + text + "'");
        }
        BigDecimal v;
        try {
            v = new BigDecimal(t);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("not a plain decimal number: '" + text + "'", e);
        }
        return new Printed(v, Math.max(0, v.scale()), scaleFactor);
    }

    /** True when the fraction-scale value num/den, times scaleFactor and rounded by rule, prints as value. */
    public boolean printsAs(long num, long den, RoundingRule rule) {
        return round(num, den, rule).compareTo(value) == 0;
    }

    /** How num/den (fraction scale) prints on this number's scale with the same decimals under rule. */
    public String format(long num, long den, RoundingRule rule) {
        return round(num, den, rule).toPlainString();
    }

    /** The printed value in units of its last digit: "94.13" gives 9413. */
    BigInteger units() {
        return value.unscaledValue();
    }

    private BigDecimal round(long num, long den, RoundingRule rule) {
        Objects.requireNonNull(rule, "rule");
        if (den == 0) throw new IllegalArgumentException("denominator is 0");
        BigDecimal scaled = new BigDecimal(BigInteger.valueOf(num).multiply(BigInteger.valueOf(scaleFactor)));
        return scaled.divide(BigDecimal.valueOf(den), decimals, rule.mode());
    }
}
