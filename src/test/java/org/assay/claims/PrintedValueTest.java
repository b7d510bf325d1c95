package org.assay.claims;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * Rounding intervals of printed values. The rule (a value printed with d decimals stands for
 * every number within half a unit of the last printed place) is common practice for
 * round-half-up and round-half-even alike; see DESIGN.md principle 2.
 */
class PrintedValueTest {
    private static final double EPS = 1e-12;

    @Test
    void percentWithOneDecimal() {
        double[] r = PrintedValue.parse("87.4").roundingInterval(Scale.PERCENT); // common practice
        assertThat(r[0]).isCloseTo(0.8735, within(EPS));
        assertThat(r[1]).isCloseTo(0.8745, within(EPS));
    }

    @Test
    void fractionWithThreeDecimals() {
        double[] r = PrintedValue.parse("0.912").roundingInterval(Scale.FRACTION); // common practice
        assertThat(r[0]).isCloseTo(0.9115, within(EPS));
        assertThat(r[1]).isCloseTo(0.9125, within(EPS));
    }

    @Test
    void wholePercent() {
        double[] r = PrintedValue.parse("94").roundingInterval(Scale.PERCENT); // common practice
        assertThat(r[0]).isCloseTo(0.935, within(EPS));
        assertThat(r[1]).isCloseTo(0.945, within(EPS));
    }

    @Test
    void trailingZeroNarrowsTheInterval() {
        // "87.40" claims two decimals: [87.395, 87.405] percent (common practice)
        PrintedValue v = PrintedValue.parse("87.40");
        assertThat(v.decimals()).isEqualTo(2);
        double[] r = v.roundingInterval(Scale.PERCENT);
        assertThat(r[0]).isCloseTo(0.87395, within(EPS));
        assertThat(r[1]).isCloseTo(0.87405, within(EPS));
    }
}
