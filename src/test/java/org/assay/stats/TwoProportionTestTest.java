package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;

class TwoProportionTestTest {
    private static final JsonNode REFERENCE = ReferenceData.load("power_reference");

    /** statsmodels 0.13.5 proportions_ztest([k1, k2], [n1, n2]), two-sided (power_reference.py). */
    @Test
    void pValueMatchesStatsmodelsProportionsZtest() {
        int checked = 0;
        for (JsonNode c : REFERENCE.get("proportions_ztest")) {
            long n1 = c.get("n1").asLong();
            long n2 = c.get("n2").asLong();
            double actual = TwoProportionTest.pValue((double) c.get("k1").asLong() / n1,
                    (double) c.get("k2").asLong() / n2, n1, n2);
            if (c.get("p_value").isNull()) {
                // statsmodels: 0/0 when both proportions are 0 (or 1); ours: no difference, p = 1.
                assertThat(c.get("k1").asLong()).as(c.toString()).isEqualTo(c.get("k2").asLong());
                assertThat(actual).isEqualTo(1.0);
            } else {
                double expected = c.get("p_value").asDouble();
                assertThat(ReferenceData.close(expected, actual, 1e-9, 1e-300)).as(c + " got " + actual).isTrue();
                checked++;
            }
        }
        assertThat(checked).isEqualTo(11);
    }

    /**
     * statsmodels 0.13.5 NormalIndPower().power(effect_size=proportion_effectsize(p1, p2), nobs1=n1,
     * alpha, ratio=n2/n1, alternative="two-sided"), and proportion_effectsize itself (power_reference.py).
     */
    @Test
    void powerAndCohensHMatchStatsmodels() {
        for (JsonNode c : REFERENCE.get("normal_ind_power")) {
            double p1 = c.get("p1").asDouble();
            double p2 = c.get("p2").asDouble();
            double h = TwoProportionTest.cohensH(p1, p2);
            assertThat(h).as(c.toString()).isCloseTo(c.get("cohens_h").asDouble(), within(1e-12));
            double actual = TwoProportionTest.power(p1, p2, c.get("n1").asLong(), c.get("n2").asLong(),
                    c.get("alpha").asDouble());
            assertThat(ReferenceData.close(c.get("power").asDouble(), actual, 1e-9, 1e-300))
                    .as(c + " got " + actual).isTrue();
        }
    }

    /**
     * The p2 &gt; p whose statsmodels NormalIndPower power equals the target, found by scipy 1.10.1
     * brentq (power_reference.py); null there means no p2 &lt;= 1 reaches the power.
     */
    @Test
    void minimalDetectableDifferenceMatchesRootOfStatsmodelsPower() {
        int finite = 0;
        for (JsonNode c : REFERENCE.get("minimal_detectable_difference")) {
            double actual = TwoProportionTest.minimalDetectableDifference(c.get("p").asDouble(),
                    c.get("n").asLong(), c.get("alpha").asDouble(), c.get("power").asDouble());
            if (c.get("difference").isNull()) {
                assertThat(actual).as(c.toString()).isInfinite();
            } else {
                assertThat(ReferenceData.close(c.get("difference").asDouble(), actual, 1e-9, 1e-15))
                        .as(c + " got " + actual).isTrue();
                finite++;
            }
        }
        assertThat(finite).isEqualTo(7);
    }

    /** A two-sided test's power at no difference is its level, both tails counted (common practice). */
    @Test
    void powerAtNoDifferenceIsTheLevel() {
        assertThat(TwoProportionTest.power(0.9, 0.9, 2000, 500, 0.05)).isCloseTo(0.05, within(1e-12));
        assertThat(TwoProportionTest.power(0.3, 0.3, 40, 40, 0.01)).isCloseTo(0.01, within(1e-12));
    }

    /**
     * The textbook sample-size rule for two proportions at alpha = 0.05 and power 0.8,
     * n = (1.96 + 0.84)^2 &middot; 2 p(1 &minus; p) / d^2 items per group (common practice), gives
     * about 392 per group for 0.5 vs 0.6; the arcsine version agrees within a few items, so the
     * minimal detectable difference at n = 392 is close to 0.1.
     */
    @Test
    void minimalDetectableDifferenceAgreesWithTheTextbookSampleSizeRule() {
        assertThat(TwoProportionTest.minimalDetectableDifference(0.5, 392, 0.05, 0.8)).isCloseTo(0.1, within(0.003));
    }

    @Test
    void badInputIsAUsageError() {
        assertThatThrownBy(() -> TwoProportionTest.pValue(1.2, 0.5, 10, 10)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("between 0 and 1");
        assertThatThrownBy(() -> TwoProportionTest.pValue(Double.NaN, 0.5, 10, 10))
                .isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> TwoProportionTest.power(0.5, 0.4, 0, 10, 0.05)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("at least 1");
        assertThatThrownBy(() -> TwoProportionTest.power(0.5, 0.4, 10, 10, 1.0)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> TwoProportionTest.minimalDetectableDifference(0.5, 100, 0.05, 0.05))
                .isInstanceOf(UserInputException.class).hasMessageContaining("target power");
    }
}
