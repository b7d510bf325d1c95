package org.assay.stats;

import java.math.RoundingMode;

/**
 * How a printed number was rounded from the exact value to its printed decimals.
 * Halves go away from zero under {@link #HALF_UP} (what {@code printf} and most spreadsheets do
 * for exact halves) and to the even last digit under {@link #HALF_EVEN}; {@link #TRUNCATE}
 * drops the extra digits (toward zero).
 */
public enum RoundingRule {
    HALF_UP(RoundingMode.HALF_UP),
    HALF_EVEN(RoundingMode.HALF_EVEN),
    TRUNCATE(RoundingMode.DOWN);

    private final RoundingMode mode;

    RoundingRule(RoundingMode mode) { this.mode = mode; }

    RoundingMode mode() { return mode; }
}
