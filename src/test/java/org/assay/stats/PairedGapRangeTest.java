package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;

class PairedGapRangeTest {
    private static final JsonNode REFERENCE = ReferenceData.load("power_reference");

    /**
     * power_reference.py "paired_gap_range": the two ends of each table worked out from the 2x2
     * table in the script, statsmodels 0.13.5 mcnemar(exact=True) at both ends, Connor's (1987)
     * formula with scipy 1.10.1 norm, and statsmodels proportions_ztest / NormalIndPower unpaired.
     */
    @Test
    void bothEndsAndTheUnpairedViewMatchTheReference() {
        for (JsonNode c : REFERENCE.get("paired_gap_range")) {
            PairedGapRange r = PairedGapRange.of(c.get("p1").asDouble(), c.get("p2").asDouble(), c.get("n").asLong(),
                    c.get("alpha").asDouble());
            String label = c.toString();
            assertThat(r.correct1()).as(label).isEqualTo(c.get("correct1").asLong());
            assertThat(r.correct2()).as(label).isEqualTo(c.get("correct2").asLong());
            assertEnd(r.mostFavourable(), c.get("most_favourable"), label);
            assertEnd(r.leastFavourable(), c.get("least_favourable"), label);
            assertThat(ReferenceData.close(c.get("unpaired_p_value").asDouble(), r.unpairedPValue(), 1e-9, 1e-300))
                    .as(label + " unpaired p " + r.unpairedPValue()).isTrue();
            assertThat(ReferenceData.close(c.get("unpaired_power").asDouble(), r.unpairedPower(), 1e-9, 1e-300))
                    .as(label + " unpaired power " + r.unpairedPower()).isTrue();
        }
    }

    private static void assertEnd(PairedGapRange.End end, JsonNode expected, String label) {
        assertThat(end.b()).as(label).isEqualTo(expected.get("b").asLong());
        assertThat(end.c()).as(label).isEqualTo(expected.get("c").asLong());
        assertThat(end.disagreement()).as(label).isEqualTo(expected.get("disagreement").asDouble());
        assertThat(ReferenceData.close(expected.get("exact_p_value").asDouble(), end.exactPValue(), 1e-9, 1e-300))
                .as(label + " exact p " + end.exactPValue()).isTrue();
        assertThat(ReferenceData.close(expected.get("power").asDouble(), end.power(), 1e-9, 1e-300))
                .as(label + " power " + end.power()).isTrue();
    }

    /**
     * The example of the task: 91.2% vs 90.8% on 2,000 items. Counted by hand: 1824 and 1816
     * correct, a gap of 8 items; at best 8 discordant items all one way (exact p = 2/2^8 &lt; 0.05),
     * at worst 360 (every item right for at least one system: b = 2000 &minus; 1816, c = 2000 &minus; 1824).
     */
    @Test
    void theBoldBestAndTheRunnerUpOnTwoThousandItems() {
        PairedGapRange r = PairedGapRange.of(0.912, 0.908, 2000, 0.05);
        assertThat(r.mostFavourable().b()).isEqualTo(8);
        assertThat(r.mostFavourable().c()).isZero();
        assertThat(r.mostFavourable().exactPValue()).isLessThan(0.05);
        assertThat(r.leastFavourable().b()).isEqualTo(184);
        assertThat(r.leastFavourable().c()).isEqualTo(176);
        assertThat(r.leastFavourable().exactPValue()).isGreaterThan(0.5);
        assertThat(r.unpairedPValue()).isGreaterThan(0.5);
    }

    /** Swapping the systems swaps b and c and changes no p-value or power. */
    @Test
    void swappingTheSystemsSwapsTheDiscordantCounts() {
        PairedGapRange ab = PairedGapRange.of(0.8764, 0.8712, 3700, 0.05);
        PairedGapRange ba = PairedGapRange.of(0.8712, 0.8764, 3700, 0.05);
        for (PairedGapRange.End[] pair : new PairedGapRange.End[][] {{ab.mostFavourable(), ba.mostFavourable()},
                {ab.leastFavourable(), ba.leastFavourable()}}) {
            assertThat(pair[0].b()).isEqualTo(pair[1].c());
            assertThat(pair[0].c()).isEqualTo(pair[1].b());
            assertThat(pair[0].exactPValue()).isEqualTo(pair[1].exactPValue());
            assertThat(pair[0].power()).isEqualTo(pair[1].power());
        }
        assertThat(ab.unpairedPValue()).isEqualTo(ba.unpairedPValue());
    }

    /** b - c is the gap in correct counts at both ends, and no cell of the 2x2 table is negative. */
    @Test
    void everyEndIsAPossibleTable() {
        double[][] cases = {{0.912, 0.908, 2000}, {0.0, 1.0, 7}, {0.333, 0.667, 3}, {0.55, 0.45, 101}, {0.97, 0.96, 1}};
        for (double[] c : cases) {
            long n = (long) c[2];
            PairedGapRange r = PairedGapRange.of(c[0], c[1], n, 0.05);
            for (PairedGapRange.End end : new PairedGapRange.End[] {r.mostFavourable(), r.leastFavourable()}) {
                assertThat(end.b() - end.c()).isEqualTo(r.correct1() - r.correct2());
                long bothRight = r.correct1() - end.b();
                long bothWrong = n - bothRight - end.b() - end.c();
                for (long cell : new long[] {end.b(), end.c(), bothRight, bothWrong}) {
                    assertThat(cell).as(java.util.Arrays.toString(c)).isNotNegative();
                }
            }
            assertThat(r.mostFavourable().disagreement()).isLessThanOrEqualTo(r.leastFavourable().disagreement());
        }
    }

    @Test
    void badInputIsAUsageError() {
        assertThatThrownBy(() -> PairedGapRange.of(-0.1, 0.5, 100, 0.05)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("first accuracy");
        assertThatThrownBy(() -> PairedGapRange.of(0.5, 91.2, 100, 0.05)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("second accuracy").hasMessageContaining("0.912 for 91.2%");
        assertThatThrownBy(() -> PairedGapRange.of(0.5, Double.NaN, 100, 0.05)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> PairedGapRange.of(0.5, 0.4, 0, 0.05)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("number of test items");
        assertThatThrownBy(() -> PairedGapRange.of(0.5, 0.4, 10, 0)).isInstanceOf(UserInputException.class);
    }
}
