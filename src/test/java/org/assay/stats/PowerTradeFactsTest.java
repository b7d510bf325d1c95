package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Facts of the trade about how much a test set of n items can resolve. */
class PowerTradeFactsTest {

    /** With 100 items, 94% correct has a 95% Wilson interval of roughly 0.87 to 0.97 (common practice). */
    @Test
    void ninetyFourOfOneHundredHasAWilsonIntervalOfRoughlyEightySevenToNinetySeven() {
        Interval wilson = ProportionMethod.WILSON.interval().compute(94, 100, 0.95);
        assertThat(wilson.lower()).isBetween(0.865, 0.88);
        assertThat(wilson.upper()).isBetween(0.965, 0.975);
    }

    /**
     * The sign test behind the exact McNemar test needs at least six discordant items, all in one
     * direction, to reach p &lt; 0.05: 2/2^5 = 0.0625, 2/2^6 = 0.03125 (common practice). So a
     * printed gap of fewer than six items is never significant, whatever the systems' overlap.
     */
    @Test
    void aGapOfFewerThanSixItemsIsNeverSignificantAtFivePercent() {
        assertThat(McNemarTest.exactPValue(5, 0)).isGreaterThan(0.05);
        assertThat(McNemarTest.exactPValue(6, 0)).isLessThan(0.05);
        // 91.2% vs 91.0% on 2,000 items: 1824 vs 1820 correct, a gap of 4 items.
        PairedGapRange gap = PairedGapRange.of(0.912, 0.910, 2000, 0.05);
        assertThat(gap.mostFavourable().b()).isEqualTo(4);
        assertThat(gap.mostFavourable().exactPValue()).isGreaterThan(0.05);
    }

    /**
     * The 95% interval half-width for a proportion near 0.5 is about 1/&radic;n (1.96 &times; 0.5 /
     * &radic;n; common practice): 0.03 with about 1,100 items.
     */
    @Test
    void halfWidthNearOneHalfIsAboutOneOverRootN() {
        Interval wilson = ProportionMethod.WILSON.interval().compute(550, 1100, 0.95);
        assertThat(wilson.halfWidth()).isBetween(0.028, 0.031);
    }
}
