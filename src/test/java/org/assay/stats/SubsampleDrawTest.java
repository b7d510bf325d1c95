package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;

/** Seeded subsample draws: reproducible, uniform over subsets, and proportional allocation by largest remainder. */
class SubsampleDrawTest {

    @Test
    void theSameSeedDrawsTheSameSubsampleAndAnotherSeedAnother() {
        int[] a = SubsampleDraw.simple(1000, 40, 7);
        assertThat(SubsampleDraw.simple(1000, 40, 7)).containsExactly(a);
        assertThat(SubsampleDraw.simple(1000, 40, 8)).isNotEqualTo(a);
        assertThat(a).hasSize(40).isSorted().doesNotHaveDuplicates();
        assertThat(Arrays.stream(a).allMatch(p -> p >= 0 && p < 1000)).isTrue();
    }

    @Test
    void everySubsetIsEquallyLikely() {
        // 2 of 5: 10 subsets; 20,000 seeded draws give each about 2,000 (binomial sd 42.4);
        // a simple random sample gives every subset probability 1/C(N, n) (common practice)
        Map<String, Integer> counts = new HashMap<>();
        for (long seed = 0; seed < 20_000; seed++) counts.merge(Arrays.toString(SubsampleDraw.simple(5, 2, seed)), 1, Integer::sum);
        assertThat(counts).hasSize(10);
        assertThat(counts.values()).allSatisfy(c -> assertThat(c).isBetween(2000 - 5 * 43, 2000 + 5 * 43));
    }

    @Test
    void proportionalAllocationFollowsTheLargestRemainderRule() {
        // hand-derived (largest remainder, Hamilton's method; common practice):
        // 50 x (485, 262, 253) / 1000 = 24.25, 13.10, 12.65 -> floors 24, 13, 12, the one left goes to 12.65
        assertThat(SubsampleDraw.proportional(new int[] {485, 262, 253}, 50)).containsExactly(24, 13, 13);
        // 10 x (1, 1, 1) / 3 = 3.33 each -> 3, 3, 3 and the one left to the earliest stratum on a tie
        assertThat(SubsampleDraw.proportional(new int[] {1, 1, 1}, 3)).containsExactly(1, 1, 1);
        assertThat(SubsampleDraw.proportional(new int[] {5, 5, 5}, 10)).containsExactly(4, 3, 3);
        // the whole population: every stratum in full
        assertThat(SubsampleDraw.proportional(new int[] {7, 2, 1}, 10)).containsExactly(7, 2, 1);
        // a stratum never gets more than it has: 4 x (1, 99)/100 = 0.04, 3.96 -> 0, 3, one left to 0.96
        assertThat(SubsampleDraw.proportional(new int[] {1, 99}, 4)).containsExactly(0, 4);
    }

    @Test
    void aStratifiedDrawTakesTheAllocationFromEachStratum() {
        int[] stratumOf = new int[300];
        for (int i = 0; i < 300; i++) stratumOf[i] = i % 3 == 0 ? 0 : i % 3 == 1 ? 1 : 2;
        int[] drawn = SubsampleDraw.stratified(stratumOf, new int[] {5, 10, 15}, 3);
        int[] per = new int[3];
        for (int p : drawn) per[stratumOf[p]]++;
        assertThat(per).containsExactly(5, 10, 15);
        assertThat(SubsampleDraw.stratified(stratumOf, new int[] {5, 10, 15}, 3)).containsExactly(drawn);
    }

    @Test
    void aSizeOutsideOneToNIsAUsageError() {
        assertThatThrownBy(() -> SubsampleDraw.simple(10, 11, 1)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("cannot draw 11 of 10");
        assertThatThrownBy(() -> SubsampleDraw.simple(10, 0, 1)).isInstanceOf(UserInputException.class);
    }
}
