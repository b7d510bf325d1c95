package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.math.BigDecimal;
import java.math.RoundingMode;
import org.junit.jupiter.api.Test;

/**
 * Exact power on counts against outside computations (plan_reference.py): a brute force over whole
 * hypergeometric pmf arrays at finite N (scipy 1.10.1), and, for N = 2&middot;10<sup>9</sup> where the
 * count is binomial to about n/N, statsmodels 0.13.5 binom_test_reject_interval and power_binom_tost.
 */
class ExactCountPlanReferenceTest {
    private static final JsonNode REFERENCE = ReferenceData.load("plan_reference");

    /**
     * The brute force keeps every count whose p-value is below alpha for every count of the claim,
     * and every count whose 1 &minus; 2&alpha; interval (a scan over K) lies in the band: the same
     * probabilities to 1e-9, and the same half-width.
     */
    @Test
    void powersMatchTheHypergeometricBruteForce() {
        int checked = 0;
        for (JsonNode c : REFERENCE.get("hypergeometric")) {
            long N = c.get("N").asLong();
            long n = c.get("n").asLong();
            double m = c.get("margin").asDouble();
            double alpha = c.get("alpha").asDouble();
            double[] ci = org.assay.claims.PrintedValue.parse(c.get("printed").asText())
                    .roundingInterval(org.assay.claims.Scale.PERCENT);
            long low = (long) Math.ceil(ci[0] * N - 1e-9);
            long high = (long) Math.floor(ci[1] * N + 1e-9);
            // a claim no count prints as (71.25% of 1000) is tested against the two nearest counts
            ExactCountPlan plan = new ExactCountPlan(N, Math.min(low, high), Math.max(low, high),
                    alpha, smallestAtLeast(ci[0] - m - 1e-12, N), largestAtMost(ci[1] + m + 1e-12, N), 1 - 2 * alpha);
            for (String truth : new String[] {"lower", "higher", "claimed"}) {
                JsonNode t = c.get(truth);
                long K = t.get("count").asLong();
                String label = "N=" + N + " " + c.get("printed").asText() + " n=" + n + " " + truth;
                close(label + " discrepant", t.get("discrepant").asDouble(), plan.discrepantPower(n, K));
                close(label + " agreement", t.get("agreement").asDouble(), plan.agreementPower(n, K));
                close(label + " consistent", t.get("consistent").asDouble(), plan.consistentPower(n, K));
                checked++;
            }
            double value = Double.parseDouble(c.get("printed").asText()) / 100;
            assertThat(ExactCountPlan.interval(Math.round(value * n), n, N, 1 - alpha).halfWidth())
                    .isCloseTo(c.get("half_width").asDouble(), org.assertj.core.api.Assertions.within(1e-12));
        }
        assertThat(checked).isEqualTo(45);
    }

    /**
     * For N = 2&middot;10<sup>9</sup>: the rejection cut-offs equal statsmodels'
     * binom_test_reject_interval (two-sided, at the claim's two ends), and the powers equal the
     * binomial sums over them and power_binom_tost to 1e-5 (the hypergeometric and binomial differ by
     * about n/N).
     */
    @Test
    void theBinomialLimitMatchesStatsmodels() {
        for (JsonNode c : REFERENCE.get("binomial_limit")) {
            long N = c.get("N").asLong();
            long n = c.get("n").asLong();
            BigDecimal size = BigDecimal.valueOf(N);
            BigDecimal lo = new BigDecimal(c.get("lo").asText());
            BigDecimal hi = new BigDecimal(c.get("hi").asText());
            BigDecimal m = new BigDecimal(c.get("margin").asText());
            BigDecimal p = new BigDecimal(c.get("p").asText());
            double alpha = c.get("alpha").asDouble();
            ExactCountPlan plan = new ExactCountPlan(N, count(lo, size, RoundingMode.CEILING), count(hi, size, RoundingMode.FLOOR),
                    alpha, count(lo.subtract(m), size, RoundingMode.CEILING), count(hi.add(m), size, RoundingMode.FLOOR),
                    1 - 2 * alpha);
            String label = c.toString();
            long[] cuts = plan.discrepantCuts(n);
            assertThat(cuts[0]).as(label).isEqualTo(c.get("lower_cut").asLong());
            assertThat(cuts[1]).as(label).isEqualTo(c.get("upper_cut").asLong());
            assertThat(plan.discrepantPower(n, count(p.subtract(m), size, RoundingMode.HALF_UP)))
                    .as(label).isCloseTo(c.get("detect_lower").asDouble(), org.assertj.core.api.Assertions.within(1e-5));
            assertThat(plan.discrepantPower(n, count(p.add(m), size, RoundingMode.HALF_UP)))
                    .as(label).isCloseTo(c.get("detect_higher").asDouble(), org.assertj.core.api.Assertions.within(1e-5));
            assertThat(plan.agreementPower(n, count(p, size, RoundingMode.HALF_UP)))
                    .as(label).isCloseTo(c.get("agreement").asDouble(), org.assertj.core.api.Assertions.within(1e-5));
        }
    }

    private static long count(BigDecimal fraction, BigDecimal size, RoundingMode mode) {
        return fraction.multiply(size).setScale(0, mode).longValueExact();
    }

    private static long smallestAtLeast(double threshold, long N) {
        long k = 0;
        while (!((double) k / N >= threshold)) k++;
        return k;
    }

    private static long largestAtMost(double threshold, long N) {
        long k = N;
        while (!((double) k / N <= threshold)) k--;
        return k;
    }

    private static void close(String label, double expected, double actual) {
        assertThat(ReferenceData.close(expected, actual, 1e-9, 1e-12)).as(label + ": expected " + expected + ", got " + actual)
                .isTrue();
    }
}
