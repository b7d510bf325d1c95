package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

/**
 * The windowed hypergeometric table and the exact interval built on it, against scipy 1.10.1
 * {@code scipy.stats.hypergeom} and a brute-force interval (hypergeom_reference.py), and against
 * {@link FinitePopulation}, which computes the same from Commons Math.
 */
class HypergeometricWindowTest {
    private static final JsonNode REFERENCE = ReferenceData.load("hypergeom_reference");

    /** scipy.stats.hypergeom pmf, cdf and sf (sf(k) = P(X &gt; k)), relative 1e-10 above 1e-280. */
    @Test
    void probabilitiesMatchScipy() {
        for (JsonNode c : REFERENCE.get("distribution")) {
            long N = c.get("N").asLong();
            long K = c.get("K").asLong();
            long n = c.get("n").asLong();
            long k = c.get("k").asLong();
            HypergeometricWindow w = HypergeometricWindow.of(n, N, K);
            String label = c.toString();
            // the window leaves out terms below 1e-22 of the mode's; scipy's smaller values are not compared
            if (c.get("pmf").asDouble() > 1e-18) {
                assertThat(ReferenceData.close(c.get("pmf").asDouble(), w.between(k, k), 1e-10, 0)).as(label).isTrue();
            }
            assertThat(ReferenceData.close(c.get("cdf").asDouble(), w.atMost(k), 1e-10, 1e-18)).as(label).isTrue();
            assertThat(ReferenceData.close(c.get("sf").asDouble(), w.atLeast(k + 1), 1e-10, 1e-18)).as(label).isTrue();
        }
    }

    /** The exact intervals of hypergeom_reference.py (a brute-force scan over K with scipy), count for count. */
    @Test
    void exactIntervalMatchesTheBruteForceScan() {
        for (JsonNode c : REFERENCE.get("exact_intervals")) {
            long N = c.get("N").asLong();
            Interval i = ExactCountPlan.interval(c.get("k").asLong(), c.get("n").asLong(), N, c.get("confidence").asDouble());
            assertThat(Math.round(i.lower() * N)).as(c.toString()).isEqualTo(c.get("K_lower").asLong());
            assertThat(Math.round(i.upper() * N)).as(c.toString()).isEqualTo(c.get("K_upper").asLong());
        }
    }

    /** The same interval as FinitePopulation.exactInterval for every count of several samples (confidences 0.95, 0.9, 0.99). */
    @Test
    void exactIntervalEqualsFinitePopulationsForEveryCount() {
        long[][] cases = {{4000, 400}, {4000, 3999}, {250, 20}, {600, 500}, {1500, 1}, {20, 20}};
        for (long[] c : cases) {
            long N = c[0];
            long n = c[1];
            for (double confidence : new double[] {0.95, 0.9, 0.99}) {
                for (long k = 0; k <= n; k += Math.max(1, n / 97)) {
                    Interval ours = ExactCountPlan.interval(k, n, N, confidence);
                    Interval theirs = FinitePopulation.exactInterval(k, n, N, confidence);
                    String label = "N=" + N + " n=" + n + " k=" + k + " conf=" + confidence;
                    assertThat(ours.lower()).as(label).isEqualTo(theirs.lower());
                    assertThat(ours.upper()).as(label).isEqualTo(theirs.upper());
                }
            }
        }
    }

    /** The table's tails: cumulative sums from each end that meet at 1 (common practice: P(X &lt;= k) + P(X &gt; k) = 1). */
    @Test
    void tailsAreComplementaryAndCoverTheSupportEnds() {
        HypergeometricWindow w = HypergeometricWindow.of(2888, 4000, 3496);
        for (long k = w.first(); k <= w.last(); k++) {
            assertThat(w.atMost(k) + w.atLeast(k + 1)).isCloseTo(1.0, org.assertj.core.api.Assertions.within(1e-14));
        }
        assertThat(w.first()).isGreaterThan(0);    // the far tail is left out, not tabulated
        HypergeometricWindow whole = HypergeometricWindow.of(20, 20, 7);
        assertThat(whole.first()).isEqualTo(7);
        assertThat(whole.last()).isEqualTo(7);
        assertThat(whole.between(7, 7)).isEqualTo(1.0);
    }
}
