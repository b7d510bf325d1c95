package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;

class McNemarTestTest {
    private static final JsonNode REFERENCE = ReferenceData.load("power_reference");

    /** statsmodels 0.13.5 mcnemar(table, exact=True).pvalue (power_reference.py). */
    @Test
    void exactPValueMatchesStatsmodels() {
        for (JsonNode c : REFERENCE.get("mcnemar")) {
            double actual = McNemarTest.exactPValue(c.get("b").asLong(), c.get("c").asLong());
            assertThat(ReferenceData.close(c.get("exact_p_value").asDouble(), actual, 1e-9, 1e-300))
                    .as(c + " got " + actual).isTrue();
        }
    }

    /**
     * statsmodels 0.13.5 mcnemar(table, exact=False, correction=True / False).pvalue
     * (power_reference.py). With no discordant pair statsmodels divides by zero (0 with the
     * correction, NaN without); we return 1 there, as documented.
     */
    @Test
    void chiSquarePValueMatchesStatsmodels() {
        int checked = 0;
        for (JsonNode c : REFERENCE.get("mcnemar")) {
            long b = c.get("b").asLong();
            long cc = c.get("c").asLong();
            for (boolean continuity : new boolean[] {true, false}) {
                JsonNode expected = c.get(continuity ? "chi_square_corrected_p_value" : "chi_square_uncorrected_p_value");
                double actual = McNemarTest.chiSquarePValue(b, cc, continuity);
                if (b + cc == 0) {
                    assertThat(expected.isNull() || expected.asDouble() == 0).as(c.toString()).isTrue();
                    assertThat(actual).isEqualTo(1.0);
                    continue;
                }
                assertThat(ReferenceData.close(expected.asDouble(), actual, 1e-9, 1e-300))
                        .as(c + " continuity=" + continuity + " got " + actual).isTrue();
                checked++;
            }
        }
        assertThat(checked).isEqualTo(38);
    }

    /** The sign test by hand: all 8 discordant items one way gives p = 2 / 2^8 (common practice). */
    @Test
    void exactPValueOfAOneSidedTableIsTwiceHalfToTheDiscordantCount() {
        assertThat(McNemarTest.exactPValue(8, 0)).isCloseTo(2.0 / 256, within(1e-15));
        assertThat(McNemarTest.exactPValue(0, 8)).isCloseTo(2.0 / 256, within(1e-15));
    }

    /**
     * Connor (1987), Biometrics 43:207-211, states the sample size
     * n = (z_{1-alpha/2}&radic;&psi; + z_{1-beta}&radic;(&psi; &minus; &delta;&sup2;))&sup2; / &delta;&sup2;;
     * at that (real-valued) n the power must be 1 &minus; beta, up to the added far tail (&lt; 1e-6 here).
     */
    @Test
    void powerInvertsConnorsSampleSizeFormula() {
        NormalDistribution normal = new NormalDistribution(null, 0, 1);
        double[][] cases = {{0.02, 0.10, 0.05, 0.80}, {0.05, 0.20, 0.01, 0.90}, {-0.03, 0.08, 0.05, 0.50},
                {0.004, 0.02, 0.05, 0.80}};
        for (double[] c : cases) {
            double delta = c[0], psi = c[1], alpha = c[2], target = c[3];
            double zA = normal.inverseCumulativeProbability(1 - alpha / 2);
            double zB = normal.inverseCumulativeProbability(target);
            double root = (zA * Math.sqrt(psi) + zB * Math.sqrt(psi - delta * delta)) / Math.abs(delta);
            // power() takes whole n; evaluate the formula at the two integers around the real root.
            long below = (long) Math.floor(root * root);
            assertThat(McNemarTest.power(delta, psi, below, alpha)).isLessThanOrEqualTo(target + 1e-6);
            assertThat(McNemarTest.power(delta, psi, below + 1, alpha)).isGreaterThanOrEqualTo(target);
            assertThat(McNemarTest.power(delta, psi, below + 1, alpha)).isCloseTo(target, within(0.01));
        }
    }

    /** With both tails kept, the power at no true difference is the level (common practice). */
    @Test
    void powerAtNoDifferenceIsTheLevel() {
        assertThat(McNemarTest.power(0, 0.1, 1000, 0.05)).isCloseTo(0.05, within(1e-12));
        assertThat(McNemarTest.power(0, 1, 7, 0.01)).isCloseTo(0.01, within(1e-12));
    }

    @Test
    void badInputIsAUsageError() {
        assertThatThrownBy(() -> McNemarTest.exactPValue(-1, 3)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> McNemarTest.chiSquarePValue(2, -3, true)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> McNemarTest.power(0.05, 0.02, 100, 0.05)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("below the accuracy difference");
        assertThatThrownBy(() -> McNemarTest.power(0.01, 1.5, 100, 0.05)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> McNemarTest.power(0.01, 0.1, 0, 0.05)).isInstanceOf(UserInputException.class);
    }
}
