package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

class BinomialTestTest {
    private static final JsonNode REFERENCE = ReferenceData.load("proportion_reference");

    /** scipy.stats.binom cdf/sf, p = min(1, 2 min(P(X<=k), P(X>=k))) (proportion_reference.py). */
    @Test
    void twoSidedPValueMatchesScipy() {
        for (JsonNode c : REFERENCE.get("binomial_tests")) {
            double expected = c.get("two_sided_p_value").asDouble();
            double actual = BinomialTest.twoSidedPValue(c.get("successes").asLong(), c.get("trials").asLong(),
                    c.get("p").asDouble());
            assertThat(ReferenceData.close(expected, actual, 1e-9, 1e-300)).as(c.toString() + " got " + actual).isTrue();
        }
    }

    /** scipy.stats.binom.ppf (proportion_reference.py). */
    @Test
    void quantilesMatchScipyPpf() {
        for (JsonNode c : REFERENCE.get("binomial_quantiles")) {
            long[] q = BinomialTest.quantiles(c.get("trials").asLong(), c.get("p").asDouble(),
                    c.get("lower_prob").asDouble(), c.get("upper_prob").asDouble());
            assertThat(q).as(c.toString()).containsExactly(c.get("lower").asLong(), c.get("upper").asLong());
        }
    }

    /**
     * The p-value is the test Clopper-Pearson inverts: at the statsmodels "beta" bounds
     * (proportion_reference.json) it equals alpha, except where the bound is 0 or 1 by convention.
     */
    @Test
    void pValueEqualsAlphaAtStatsmodelsClopperPearsonBounds() {
        int checked = 0;
        for (JsonNode c : REFERENCE.get("intervals")) {
            if (!c.get("method").asText().equals("clopper-pearson")) continue;
            long k = c.get("successes").asLong();
            long n = c.get("trials").asLong();
            double alpha = 1 - c.get("confidence").asDouble();
            if (k > 0) {
                assertThat(BinomialTest.twoSidedPValue(k, n, c.get("lower").asDouble())).isCloseTo(alpha, within(1e-8));
                checked++;
            }
            if (k < n) {
                assertThat(BinomialTest.twoSidedPValue(k, n, c.get("upper").asDouble())).isCloseTo(alpha, within(1e-8));
                checked++;
            }
        }
        assertThat(checked).isEqualTo(20);
    }
}
