package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

class FinitePopulationTest {
    private static final JsonNode REFERENCE = ReferenceData.load("hypergeom_reference");

    /** scipy.stats.hypergeom pmf/cdf/sf, grid up to N = 100000 (hypergeom_reference.py). */
    @Test
    void distributionMatchesScipy() {
        int checked = 0;
        for (JsonNode c : REFERENCE.get("distribution")) {
            long k = c.get("k").asLong(), n = c.get("n").asLong(), N = c.get("N").asLong(), K = c.get("K").asLong();
            String where = c.toString();
            assertClose(c.get("pmf").asDouble(), FinitePopulation.pmf(k, n, N, K), where + " pmf");
            assertClose(c.get("cdf").asDouble(), FinitePopulation.cdf(k, n, N, K), where + " cdf");
            assertClose(c.get("sf").asDouble(), FinitePopulation.sf(k, n, N, K), where + " sf");
            assertClose(c.get("two_sided_p_value").asDouble(), FinitePopulation.twoSidedPValue(k, n, N, K), where + " p");
            checked++;
        }
        assertThat(checked).isGreaterThan(50);
    }

    /** scipy.stats.hypergeom.ppf (hypergeom_reference.py). */
    @Test
    void quantilesMatchScipyPpf() {
        for (JsonNode c : REFERENCE.get("quantiles")) {
            long[] q = FinitePopulation.quantiles(c.get("n").asLong(), c.get("N").asLong(), c.get("K").asLong(),
                    c.get("lower_prob").asDouble(), c.get("upper_prob").asDouble());
            assertThat(q).as(c.toString()).containsExactly(c.get("lower").asLong(), c.get("upper").asLong());
        }
    }

    /** Brute-force inversion over K with scipy tails (hypergeom_reference.py), including n == N. */
    @Test
    void exactIntervalMatchesBruteForceInversionWithScipy() {
        for (JsonNode c : REFERENCE.get("exact_intervals")) {
            Interval ci = FinitePopulation.exactInterval(c.get("k").asLong(), c.get("n").asLong(), c.get("N").asLong(),
                    c.get("confidence").asDouble());
            assertThat(ci.lower()).as(c.toString()).isEqualTo(c.get("lower").asDouble());
            assertThat(ci.upper()).as(c.toString()).isEqualTo(c.get("upper").asDouble());
            assertThat(ci.method()).isEqualTo("exact hypergeometric (finite population)");
        }
    }

    /**
     * Common practice: at N = 10 million and n = 1000, sampling without replacement is nearly
     * binomial, so the interval is within 1e-3 of Clopper-Pearson (ours, checked against
     * statsmodels in ProportionIntervalTest). The bounds must also sit exactly where the two-sided
     * p-value crosses alpha (the definition of the interval).
     */
    @Test
    void largeTestSetIsCloseToClopperPearsonAndBoundsAreWhereThePValueCrossesAlpha() {
        long N = 10_000_000, n = 1000, k = 870;
        Interval ci = FinitePopulation.exactInterval(k, n, N, 0.95);
        Interval cp = ProportionMethod.CLOPPER_PEARSON.interval().compute(k, n, 0.95);
        assertThat(ci.lower()).isCloseTo(cp.lower(), within(1e-3));
        assertThat(ci.upper()).isCloseTo(cp.upper(), within(1e-3));
        long lowerK = Math.round(ci.lower() * N), upperK = Math.round(ci.upper() * N);
        assertThat(FinitePopulation.twoSidedPValue(k, n, N, lowerK)).isGreaterThan(0.05);
        assertThat(FinitePopulation.twoSidedPValue(k, n, N, lowerK - 1)).isLessThanOrEqualTo(0.05);
        assertThat(FinitePopulation.twoSidedPValue(k, n, N, upperK)).isGreaterThan(0.05);
        assertThat(FinitePopulation.twoSidedPValue(k, n, N, upperK + 1)).isLessThanOrEqualTo(0.05);
    }

    /** Cochran (1977), Sampling Techniques, 3rd ed., section 2.4: fpc = (N - n)/(N - 1). */
    @Test
    void correctionIsTheFinitePopulationFactor() {
        assertThat(FinitePopulation.correction(400, 4000)).isEqualTo(3600.0 / 3999.0);
        assertThat(FinitePopulation.correction(1, 4000)).isEqualTo(1.0);
        assertThat(FinitePopulation.correction(4000, 4000)).isEqualTo(0.0);
        assertThatThrownBy(() -> FinitePopulation.correction(5, 4)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void rejectsImpossibleSamples() {
        assertThatThrownBy(() -> FinitePopulation.exactInterval(5, 4, 100, 0.95)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> FinitePopulation.exactInterval(1, 200, 100, 0.95)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> FinitePopulation.exactInterval(1, 10, 100, 1.0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> FinitePopulation.quantiles(10, 100, 50, 0.0, 0.5)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> FinitePopulation.pmf(1, 10, 3_000_000_000L, 5)).isInstanceOf(IllegalArgumentException.class);
    }

    private static void assertClose(double expected, double actual, String what) {
        assertThat(ReferenceData.close(expected, actual, 1e-9, 1e-300)).as(what + ": expected " + expected + " got " + actual)
                .isTrue();
    }
}
