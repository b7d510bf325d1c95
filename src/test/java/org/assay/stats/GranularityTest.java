package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class GranularityTest {
    private static Printed percent(String s) { return Printed.of(s, 100); }
    private static Printed fraction(String s) { return Printed.of(s, 1); }

    // Common practice: an accuracy on N items is k/N; k/1000 printed with two percent decimals
    // always ends in 0 (94.10, 94.20, ...), so 94.13 cannot arise (the case in the project issue).
    @Test
    void accuracyOnAThousandItemsCannotEndInThree() {
        Feasibility f = Granularity.ofCount(percent("94.13"), 1000);
        assertThat(f.roundedFeasible()).isFalse();
        assertThat(f.halfUpFeasible()).isFalse();
        assertThat(f.halfEvenFeasible()).isFalse();
        assertThat(f.truncatedFeasible()).isFalse();
        assertThat(f.provenInfeasible()).isTrue();
        assertThat(f.witness()).isNull();
        assertThat(f.nearestBelow()).isEqualTo("94.10");
        assertThat(f.nearestAbove()).isEqualTo("94.20");
    }

    @Test
    void oneDecimalOnAThousandItemsIsFeasible() {
        Feasibility f = Granularity.ofCount(percent("94.1"), 1000);
        assertThat(f.roundedFeasible()).isTrue();
        assertThat(f.halfUpFeasible()).isTrue();
        assertThat(f.halfEvenFeasible()).isTrue();
        assertThat(f.truncatedFeasible()).isTrue();
        assertThat(f.witness()).isEqualTo("k = 941 of 1000");
        assertThat(f.nearestBelow()).isEqualTo("94.0");
        assertThat(f.nearestAbove()).isEqualTo("94.2");
        assertThat(f.note()).isNull();
    }

    // GRIM rule (Brown & Heathers 2017, SPPS 8(4):363-369): the mean of N integer responses is
    // a multiple of 1/N. Only the fractional part matters (an integer part m adds m*N to the
    // sum), so a mean is GRIM-consistent exactly when its fractional part is some k/N.
    // The worked values below are not from the paper's text (not available to us) but from the
    // Wikipedia article "GRIM test" (mean 3.48 of 20 die rolls is impossible: k/20 printed with
    // two decimals ends in 0 or 5) and the vignette of the R package scrutiny ("5.27" with n = 43
    // is GRIM-inconsistent).
    @Test
    void grimExamplesFromSecondarySources() {
        Feasibility dice = Granularity.ofCount(fraction("0.48"), 20);          // mean 3.48, N = 20
        assertThat(dice.provenInfeasible()).isTrue();
        assertThat(dice.nearestBelow()).isEqualTo("0.45");
        assertThat(dice.nearestAbove()).isEqualTo("0.50");
        assertThat(Granularity.ofCount(fraction("0.45"), 20).witness()).isEqualTo("k = 9 of 20");

        Feasibility scrutiny = Granularity.ofCount(fraction("0.27"), 43);      // mean 5.27, n = 43
        assertThat(scrutiny.roundedFeasible()).isFalse();
        assertThat(scrutiny.truncatedFeasible()).isTrue();                     // 12/43 = 0.279... drops to 0.27
        assertThat(scrutiny.witness()).isEqualTo("k = 12 of 43");
        assertThat(scrutiny.nearestBelow()).isEqualTo("0.26");                 // 11/43 = 0.2558...
        assertThat(scrutiny.nearestAbove()).isEqualTo("0.28");                 // 12/43 = 0.2790...
        assertThat(Granularity.ofCount(fraction("0.26"), 43).witness()).isEqualTo("k = 11 of 43");
    }

    // Wikipedia "GRIM test": a mean of 1.125 may be reported as 1.12 or 1.13 depending on the
    // rounding used. 1.125 = 9/8: half-even gives 1.12 (2 is even), half-up gives 1.13.
    @Test
    void exactHalfIsSplitBetweenTheRules() {
        Feasibility lower = Granularity.ofCount(fraction("0.12"), 8);          // 1/8 = 0.125
        assertThat(lower.halfEvenFeasible()).isTrue();
        assertThat(lower.halfUpFeasible()).isFalse();
        assertThat(lower.roundedFeasible()).isTrue();
        assertThat(lower.truncatedFeasible()).isTrue();
        assertThat(lower.witness()).isEqualTo("k = 1 of 8");
        assertThat(lower.note()).contains("round-half-to-even");

        Feasibility upper = Granularity.ofCount(fraction("0.13"), 8);
        assertThat(upper.halfUpFeasible()).isTrue();                           // half-up keeps its lower end
        assertThat(upper.halfEvenFeasible()).isFalse();                        // 3 is odd
        assertThat(upper.truncatedFeasible()).isFalse();
        assertThat(upper.nearestBelow()).isEqualTo("0.00");                    // 0/8
        assertThat(upper.nearestAbove()).isEqualTo("0.25");                    // 2/8
    }

    // Common practice: 3/8 = 0.375 rounds to 0.38 under both rules (8 is even); "0.37" can only
    // come from dropping the last digit, which is reported separately.
    @Test
    void truncationIsReportedSeparately() {
        Feasibility both = Granularity.ofCount(fraction("0.38"), 8);
        assertThat(both.halfUpFeasible()).isTrue();
        assertThat(both.halfEvenFeasible()).isTrue();
        assertThat(both.truncatedFeasible()).isFalse();

        Feasibility truncated = Granularity.ofCount(fraction("0.37"), 8);
        assertThat(truncated.roundedFeasible()).isFalse();
        assertThat(truncated.truncatedFeasible()).isTrue();
        assertThat(truncated.provenInfeasible()).isFalse();
        assertThat(truncated.witness()).isEqualTo("k = 3 of 8");
        assertThat(truncated.note()).contains("truncation");
        assertThat(truncated.nearestBelow()).isEqualTo("0.25");                // 2/8, outside [0.365, 0.375)
        assertThat(truncated.nearestAbove()).isEqualTo("0.38");                // 3/8 sits on the upper end
    }

    // Common practice: the mean of r runs of a proportion on N items is k/(N*r).
    // 2824/3000 = 0.94133... prints 94.13, which no single run on 1000 items can.
    @Test
    void averagingRunsRefinesTheGrid() {
        assertThat(Granularity.ofCount(percent("94.13"), 1000, 1).provenInfeasible()).isTrue();
        Feasibility threeRuns = Granularity.ofCount(percent("94.13"), 1000, 3);
        assertThat(threeRuns.roundedFeasible()).isTrue();
        assertThat(threeRuns.witness()).isEqualTo("k = 2824 of 3000 (1000 items x 3 runs)");
        assertThat(Granularity.ofCount(percent("94.13"), 3000)).isEqualTo(
                new Feasibility(true, true, true, true, "k = 2824 of 3000", "94.10", "94.17", true, null));
    }

    @Test
    void valuesOutsideTheUnitIntervalHaveOneNeighbour() {
        Feasibility over = Granularity.ofCount(percent("100.1"), 1000);
        assertThat(over.provenInfeasible()).isTrue();
        assertThat(over.nearestBelow()).isEqualTo("100.0");
        assertThat(over.nearestAbove()).isNull();
        Feasibility zero = Granularity.ofCount(fraction("0.000"), 7);
        assertThat(zero.witness()).isEqualTo("k = 0 of 7");
        assertThat(zero.nearestBelow()).isNull();
        assertThat(zero.nearestAbove()).isEqualTo("0.143");
    }

    @Test
    void printedKeepsItsDecimals() {
        Printed p = Printed.of("94.10", 100);
        assertThat(p.decimals()).isEqualTo(2);
        assertThat(p.printsAs(941, 1000, RoundingRule.HALF_UP)).isTrue();
        // 18821/20000 = 94.105% exactly: half-even keeps the even 0, half-up goes to 94.11
        assertThat(p.printsAs(18821, 20000, RoundingRule.HALF_EVEN)).isTrue();
        assertThat(p.printsAs(18821, 20000, RoundingRule.HALF_UP)).isFalse();
        assertThat(p.printsAs(18821, 20000, RoundingRule.TRUNCATE)).isTrue();
        // 18819/20000 = 94.095%: both rules go up to 94.10 (9 is odd), truncation gives 94.09
        assertThat(p.printsAs(18819, 20000, RoundingRule.HALF_UP)).isTrue();
        assertThat(p.printsAs(18819, 20000, RoundingRule.HALF_EVEN)).isTrue();
        assertThat(p.printsAs(18819, 20000, RoundingRule.TRUNCATE)).isFalse();
        assertThat(p.format(2, 3, RoundingRule.HALF_UP)).isEqualTo("66.67");
        assertThat(p.format(2, 3, RoundingRule.TRUNCATE)).isEqualTo("66.66");
        assertThatThrownBy(() -> Printed.of("1e-3", 1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new Printed(new java.math.BigDecimal("0.125"), 2, 1))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Granularity.ofCount(p, 0)).isInstanceOf(IllegalArgumentException.class);
    }
}
