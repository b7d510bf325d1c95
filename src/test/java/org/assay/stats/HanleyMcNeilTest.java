package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;

class HanleyMcNeilTest {

    /**
     * Published output of an independent implementation: the R package auctestr 1.0.0, se_auc(auc,
     * n_p, n_n) (Hanley &amp; McNeil 1982), documentation "Example output" (rdrr.io/cran/auctestr,
     * se_auc): se_auc(0.75, 20, 200) = 0.06498283, se_auc(0.75, 110, 110) = 0.03282048,
     * se_auc(0.75, 20, 20) = 0.07789072. Printed to 8 decimals, so within half a unit of the last.
     */
    @Test
    void matchesThePublishedExampleOutputOfAnIndependentImplementation() {
        assertThat(HanleyMcNeil.standardError(0.75, 20, 200)).isCloseTo(0.06498283, within(5e-9));
        assertThat(HanleyMcNeil.standardError(0.75, 110, 110)).isCloseTo(0.03282048, within(5e-9));
        assertThat(HanleyMcNeil.standardError(0.75, 20, 20)).isCloseTo(0.07789072, within(5e-9));
    }

    /**
     * At A = 1/2 the formula gives (m + n + 1)/(12 m n), the exact null variance of the
     * Mann&ndash;Whitney U divided by (m n)&sup2; (a fact of the trade, derivable from Q1 = Q2 = 1/3).
     * Checked against that variance found by enumerating all C(m + n, m) rankings
     * (power_reference.py, "null_auc_variance").
     */
    @Test
    void atOneHalfItIsTheExactNullVarianceOfTheMannWhitneyStatistic() {
        JsonNode reference = ReferenceData.load("power_reference");
        int checked = 0;
        for (JsonNode c : reference.get("null_auc_variance")) {
            long m = c.get("positives").asLong();
            long n = c.get("negatives").asLong();
            double se = HanleyMcNeil.standardError(0.5, m, n);
            assertThat(se * se).as(c.toString()).isCloseTo(c.get("variance").asDouble(), within(1e-12));
            assertThat(se * se).isCloseTo((m + n + 1.0) / (12.0 * m * n), within(1e-15));
            checked++;
        }
        assertThat(checked).isEqualTo(5);
    }

    /**
     * pROC 1.18.0 var(roc, method = "delong") on simulated binormal scores (power_reference.R).
     * The two estimators differ: DeLong estimates the variance from the scores, Hanley&ndash;McNeil
     * assumes exponential score distributions. In the committed cases the ratio Hanley&ndash;McNeil /
     * DeLong of the standard errors is 1.00&ndash;1.07 with equal class sizes and 0.89&ndash;1.21
     * with unequal ones (the exponential model fits binormal data worst there), so the tolerance
     * is 10% for equal and 25% for unequal sizes.
     */
    @Test
    void isCloseToPRocDeLongOnBinormalData() {
        JsonNode reference = ReferenceData.load("power_proc");
        int balanced = 0;
        for (JsonNode c : reference.get("binormal")) {
            long m = c.get("positives").asLong();
            long n = c.get("negatives").asLong();
            double delong = Math.sqrt(c.get("delong_variance").asDouble());
            double ratio = HanleyMcNeil.standardError(c.get("auc").asDouble(), m, n) / delong;
            double tolerance = m == n ? 0.10 : 0.25;
            assertThat(ratio).as(c.toString()).isCloseTo(1.0, within(tolerance));
            if (m == n) balanced++;
        }
        assertThat(balanced).isEqualTo(4);
    }

    /** A perfect or a perfectly inverted ranking leaves no spread: both Q terms equal A&sup2;. */
    @Test
    void isZeroAtTheEnds() {
        assertThat(HanleyMcNeil.standardError(1.0, 30, 70)).isZero();
        assertThat(HanleyMcNeil.standardError(0.0, 30, 70)).isZero();
    }

    @Test
    void badInputIsAUsageError() {
        assertThatThrownBy(() -> HanleyMcNeil.standardError(1.01, 10, 10)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("ROC AUC");
        assertThatThrownBy(() -> HanleyMcNeil.standardError(0.8, 0, 10)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("positives");
        assertThatThrownBy(() -> HanleyMcNeil.standardError(0.8, 10, 0)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("negatives");
    }
}
