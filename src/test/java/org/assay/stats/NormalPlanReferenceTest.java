package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

/**
 * Normal-approximation half-width, power and sample sizes against statsmodels 0.13.5
 * (plan_reference.py): NormalIndPower(ratio=0) one-sided and two-sided powers,
 * zt_ind_solve_power, samplesize_confint_proportion, power_ztost_prop and _power_ztost, with the
 * finite-population correction applied through n_eff = n(N &minus; 1)/(N &minus; n) (Cochran 1977).
 */
class NormalPlanReferenceTest {
    private static final JsonNode REFERENCE = ReferenceData.load("plan_reference");

    private static NormalPlan.StandardError binomial(double p, long N) {
        return n -> Math.sqrt(p * (1 - p) / n * FinitePopulation.correction(n, N));
    }

    /** Half-width, both discrepancy powers, the two one-sided tests' power and the consistent power at fixed n. */
    @Test
    void powersAtFixedSizesMatchStatsmodels() {
        int rows = 0;
        for (JsonNode c : REFERENCE.get("normal")) {
            long N = c.get("N").asLong();
            double p = c.get("p").asDouble();
            double m = c.get("margin").asDouble();
            double alpha = c.get("alpha").asDouble();
            NormalPlan plan = new NormalPlan(binomial(p, N), c.get("lo").asDouble(), c.get("hi").asDouble(), m, alpha,
                    1 - 2 * alpha);
            for (JsonNode r : c.get("rows")) {
                long n = r.get("n").asLong();
                String label = c.get("N") + "/" + p + " n=" + n;
                close(label + " half-width", r.get("half_width").asDouble(), plan.halfWidth(n, 1 - alpha));
                close(label + " detect lower", r.get("detect_lower").asDouble(), plan.discrepantPower(n, p - m));
                close(label + " detect higher", r.get("detect_higher").asDouble(), plan.discrepantPower(n, p + m));
                close(label + " agreement (power_ztost_prop)", r.get("agreement").asDouble(), plan.agreementPower(n, p));
                close(label + " consistent", r.get("consistent").asDouble(), plan.consistentPower(n, p));
                rows++;
            }
        }
        assertThat(rows).isEqualTo(29);
    }

    /**
     * Where the two one-sided tests pass but the test against the claim would call the estimate
     * discrepant, "consistent" is rarer than agreement alone: at n = N &minus; 1 for the point claim
     * the agreement power is 1 (statsmodels) and the consistent power 1 &minus; &alpha; = 0.95. This is
     * the definition's difference from statsmodels' TOST power, tested on its own.
     */
    @Test
    void consistencyAlsoNeedsNoDiscrepancy() {
        JsonNode point = REFERENCE.get("normal").get(3);
        JsonNode last = point.get("rows").get(point.get("rows").size() - 1);
        assertThat(last.get("agreement").asDouble()).isGreaterThan(0.9999);
        assertThat(last.get("consistent").asDouble()).isCloseTo(0.95, org.assertj.core.api.Assertions.within(1e-6));
        NormalPlan plan = new NormalPlan(binomial(0.30, 2000), 0.30, 0.30, 0.03, 0.05, 0.9);
        assertThat(plan.agreementPower(1999, 0.30)).isGreaterThan(0.9999);
        assertThat(plan.consistentPower(1999, 0.30)).isCloseTo(0.95, org.assertj.core.api.Assertions.within(1e-9));
    }

    /**
     * The smallest n for each target: samplesize_confint_proportion (half-width), zt_ind_solve_power
     * for a point claim and brentq on statsmodels' power for a rounding interval (detect, in both
     * directions), brentq on the consistent power (agree), each turned into an integer n.
     */
    @Test
    void sampleSizesMatchStatsmodels() {
        for (JsonNode c : REFERENCE.get("normal")) {
            long N = c.get("N").asLong();
            double p = c.get("p").asDouble();
            double m = c.get("margin").asDouble();
            double alpha = c.get("alpha").asDouble();
            double target = c.get("power").asDouble();
            NormalPlan plan = new NormalPlan(binomial(p, N), c.get("lo").asDouble(), c.get("hi").asDouble(), m, alpha,
                    1 - 2 * alpha);
            String label = c.get("N") + "/" + p;
            assertThat(SampleSizeSearch.monotone(n -> plan.halfWidth(n, 1 - alpha) <= m, 1, N)).as(label + " interval")
                    .isEqualTo(c.get("n_interval").asLong());
            assertThat(SampleSizeSearch.monotone(n -> Math.min(plan.discrepantPower(n, p - m),
                    plan.discrepantPower(n, p + m)) >= target, 1, N)).as(label + " detect")
                    .isEqualTo(c.get("n_detect_either").asLong());
            assertThat(SampleSizeSearch.monotone(n -> plan.consistentPower(n, p) >= target, 1, N)).as(label + " agree")
                    .isEqualTo(c.get("n_agree").asLong());
        }
    }

    /**
     * ROC AUC: Hanley &amp; McNeil's standard error at the expected class sizes n&middot;share with the
     * finite-population correction; powers from statsmodels (one-sided NormalIndPower, _power_ztost),
     * sizes from brentq on them.
     */
    @Test
    void hanleyMcNeilPlansMatchStatsmodels() {
        for (JsonNode c : REFERENCE.get("hanley_mcneil")) {
            double a = Double.parseDouble(c.get("printed").asText());
            long pos = c.get("positives").asLong();
            long neg = c.get("negatives").asLong();
            long N = pos + neg;
            double m = c.get("margin").asDouble();
            double alpha = c.get("alpha").asDouble();
            double target = c.get("power").asDouble();
            double share = (double) pos / N;
            NormalPlan.StandardError se = n -> {
                double p = n * share;
                if (p < 1 || n - p < 1) return Double.NaN;
                return HanleyMcNeil.standardError(a, p, n - p) * Math.sqrt(FinitePopulation.correction(n, N));
            };
            NormalPlan plan = new NormalPlan(se, c.get("lo").asDouble(), c.get("hi").asDouble(), m, alpha, 1 - 2 * alpha);
            for (JsonNode r : c.get("rows")) {
                long n = r.get("n").asLong();
                String label = "AUC " + a + " n=" + n;
                close(label + " half-width", r.get("half_width").asDouble(), plan.halfWidth(n, 1 - alpha));
                close(label + " detect lower", r.get("detect_lower").asDouble(), plan.discrepantPower(n, a - m));
                close(label + " detect higher", r.get("detect_higher").asDouble(), plan.discrepantPower(n, a + m));
                close(label + " agreement (_power_ztost)", r.get("agreement").asDouble(), plan.agreementPower(n, a));
                close(label + " consistent", r.get("consistent").asDouble(), plan.consistentPower(n, a));
            }
            assertThat(SampleSizeSearch.monotone(n -> plan.halfWidth(n, 1 - alpha) <= m, 1, N))
                    .isEqualTo(c.get("n_interval").asLong());
            assertThat(SampleSizeSearch.monotone(n -> Math.min(plan.discrepantPower(n, a - m), plan.discrepantPower(n, a + m))
                    >= target, 1, N)).isEqualTo(c.get("n_detect").asLong());
            assertThat(SampleSizeSearch.monotone(n -> plan.consistentPower(n, a) >= target, 1, N))
                    .isEqualTo(c.get("n_agree").asLong());
        }
    }

    private static void close(String label, double expected, double actual) {
        assertThat(ReferenceData.close(expected, actual, 1e-9, 1e-12)).as(label + ": expected " + expected + ", got " + actual)
                .isTrue();
    }
}
