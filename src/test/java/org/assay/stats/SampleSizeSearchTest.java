package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The two searches on hand-made targets (expected answers derived by hand). Exact power zigzags with
 * n (Chernick &amp; Liu 2002), so a size where it first reaches the target can be followed by one that
 * misses it; the plan reports the size from which the target holds at every larger size.
 */
class SampleSizeSearchTest {
    @Test
    void fromThenOnSkipsSizesThatAreFollowedByAMiss() {
        Set<Long> misses = Set.of(1L, 2L, 3L, 4L, 7L, 8L, 11L);      // met at 5, 6, 9, 10, then from 12 on
        assertThat(SampleSizeSearch.fromThenOn(n -> !misses.contains(n), 1, 40)).isEqualTo(12);
        assertThat(SampleSizeSearch.fromThenOn(n -> !misses.contains(n), 1, 10)).isEqualTo(9);
        assertThat(SampleSizeSearch.fromThenOn(n -> true, 1, 40)).isEqualTo(1);
        assertThat(SampleSizeSearch.fromThenOn(n -> n < 40, 1, 40)).isEqualTo(SampleSizeSearch.NONE);
    }

    @Test
    void monotoneFindsTheFirstSizeThatMeetsATargetThatStaysMet() {
        assertThat(SampleSizeSearch.monotone(n -> n * n >= 2_000_000L, 1, 100_000)).isEqualTo(1415);   // 1414^2 < 2e6 <= 1415^2
        assertThat(SampleSizeSearch.monotone(n -> true, 7, 9)).isEqualTo(7);
        assertThat(SampleSizeSearch.monotone(n -> false, 1, 9)).isEqualTo(SampleSizeSearch.NONE);
    }
}
