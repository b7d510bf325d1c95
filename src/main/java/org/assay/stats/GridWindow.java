package org.assay.stats;

import java.math.BigInteger;

/**
 * The rounding interval of a printed value on the fraction scale, as exact rationals
 * [lo, hi] = [low/q, high/q] with each end open or closed, and the integer ranges of a grid
 * that fall inside it. Arithmetic is in long with {@link Math#multiplyExact}; a product that
 * would overflow is redone in BigInteger.
 *
 * <p>With x the printed value in units of its last digit (X), unit u and half h = u/2, on the
 * printed scale: half-up is [x-h, x+h) for x &gt; 0 (mirrored for x &lt; 0, since halves go away
 * from zero), half-even is closed at both ends when X is even and open when odd, truncation is
 * [x, x+u) for x &gt; 0 (mirrored below zero; (-u, u) for x = 0). The common denominator is
 * q = 2 * scaleFactor * 10^decimals.
 */
final class GridWindow {
    private static final long LIMIT = 1L << 62;

    final long low;
    final long high;
    final long q;
    final boolean lowClosed;
    final boolean highClosed;

    private GridWindow(long low, boolean lowClosed, long high, boolean highClosed, long q) {
        this.low = low;
        this.high = high;
        this.q = q;
        this.lowClosed = lowClosed;
        this.highClosed = highClosed;
    }

    static GridWindow of(Printed p, RoundingRule rule) {
        BigInteger x = p.units();
        int sign = x.signum();
        BigInteger twoX = x.shiftLeft(1);
        BigInteger q = BigInteger.valueOf(2L * p.scaleFactor()).multiply(BigInteger.TEN.pow(p.decimals()));
        return switch (rule) {
            case HALF_UP -> make(twoX.subtract(BigInteger.ONE), sign > 0, twoX.add(BigInteger.ONE), sign < 0, q);
            case HALF_EVEN -> {
                boolean even = !x.testBit(0);
                yield make(twoX.subtract(BigInteger.ONE), even, twoX.add(BigInteger.ONE), even, q);
            }
            case TRUNCATE -> sign > 0 ? make(twoX, true, twoX.add(BigInteger.TWO), false, q)
                    : sign < 0 ? make(twoX.subtract(BigInteger.TWO), false, twoX, true, q)
                    : make(BigInteger.TWO.negate(), false, BigInteger.TWO, false, q);
        };
    }

    /** The union of the half-up and half-even intervals: same ends, closed where either is. */
    static GridWindow rounded(Printed p) {
        GridWindow up = of(p, RoundingRule.HALF_UP);
        GridWindow even = of(p, RoundingRule.HALF_EVEN);
        return new GridWindow(up.low, up.lowClosed || even.lowClosed, up.high, up.highClosed || even.highClosed, up.q);
    }

    private static GridWindow make(BigInteger low, boolean lowClosed, BigInteger high, boolean highClosed, BigInteger q) {
        if (low.abs().bitLength() > 61 || high.abs().bitLength() > 61 || q.bitLength() > 61) {
            throw new IllegalArgumentException("printed value has too many digits for an exact check");
        }
        return new GridWindow(low.longValue(), lowClosed, high.longValue(), highClosed, q.longValue());
    }

    /** Smallest integer k with k/den on or above the lower end (den &gt; 0). */
    long firstK(long den) {
        // k/den >= low/q  <=>  k >= low*den/q
        return lowClosed ? ceilMulDiv(low, den, q) : floorMulDiv(low, den, q) + 1;
    }

    /** Largest integer k with k/den on or below the upper end (den &gt; 0). */
    long lastK(long den) {
        return highClosed ? floorMulDiv(high, den, q) : ceilMulDiv(high, den, q) - 1;
    }

    /** Smallest denominator d &gt; 0 with a/d on or below the upper end (a &gt; 0); LIMIT when none. */
    long minDen(long a) {
        if (high <= 0) return LIMIT;                    // a/d > 0 >= hi for every d
        // a/d <= high/q  <=>  d >= a*q/high
        long d = highClosed ? ceilMulDiv(a, q, high) : floorMulDiv(a, q, high) + 1;
        return Math.max(d, 1);
    }

    /** Largest denominator d with a/d on or above the lower end (a &gt; 0); LIMIT when unbounded. */
    long maxDen(long a) {
        if (low <= 0) return LIMIT;                     // a/d > 0 >= lo for every d
        // a/d >= low/q  <=>  d <= a*q/low
        return lowClosed ? floorMulDiv(a, q, low) : ceilMulDiv(a, q, low) - 1;
    }

    static long floorMulDiv(long a, long b, long c) {
        try {
            return Math.floorDiv(Math.multiplyExact(a, b), c);
        } catch (ArithmeticException overflow) {
            BigInteger[] qr = BigInteger.valueOf(a).multiply(BigInteger.valueOf(b)).divideAndRemainder(BigInteger.valueOf(c));
            BigInteger f = qr[1].signum() != 0 && (qr[1].signum() != BigInteger.valueOf(c).signum()) ? qr[0].subtract(BigInteger.ONE) : qr[0];
            return clamp(f);
        }
    }

    static long ceilMulDiv(long a, long b, long c) {
        return -floorMulDiv(-a, b, c);
    }

    private static long clamp(BigInteger v) {
        if (v.compareTo(BigInteger.valueOf(LIMIT)) > 0) return LIMIT;
        if (v.compareTo(BigInteger.valueOf(-LIMIT)) < 0) return -LIMIT;
        return v.longValue();
    }

    /** Sign of a/b - c/d for b, d &gt; 0, exact. */
    static int compare(long a, long b, long c, long d) {
        try {
            return Long.compare(Math.multiplyExact(a, d), Math.multiplyExact(c, b));
        } catch (ArithmeticException overflow) {
            return BigInteger.valueOf(a).multiply(BigInteger.valueOf(d))
                    .compareTo(BigInteger.valueOf(c).multiply(BigInteger.valueOf(b)));
        }
    }
}
