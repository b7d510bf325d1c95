package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import org.apache.commons.math3.distribution.BinomialDistribution;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * The power formulas against simulated rejection rates of the tests they describe (fixed seeds,
 * Commons Math Well19937c; not timed). Each comparison allows 4 Monte Carlo standard deviations,
 * &radic;(p(1 &minus; p)/R) with R replicates. Both formulas are normal approximations, so the cases
 * use n &gt;= 500 items.
 */
class PowerSimulationTest {
    private static final int REPLICATES = 4000;
    private static final double ALPHA = 0.05;

    /**
     * {delta, psi, n}: true accuracy difference, discordance rate, paired items. The first four
     * have at least 100 expected discordant items (n&middot;&psi;), the last two 40 and 100.
     */
    private static final double[][] PAIRED_CASES = {
            {0.02, 0.10, 2000}, {0.03, 0.10, 1000}, {0.02, 0.30, 3000}, {0.01, 0.05, 5000},
            {0.04, 0.08, 500}, {-0.05, 0.20, 500}};
    private static final int MANY_DISCORDANT = 4;

    /**
     * Connor (1987) approximates the unconditional (chi-square, uncorrected) McNemar test: with
     * n&middot;&psi; &gt;= 100 its power lies within Monte Carlo error of that test's simulated
     * rejection rate. (At n = 500, &psi; = 0.08, so 40 expected discordant items, the
     * approximation is about 1.6 points low, more than Monte Carlo error; that case is used only
     * in the exact-test comparison below.)
     */
    @Test
    void connorPowerMatchesTheSimulatedChiSquareMcNemarTest() {
        RandomGenerator rng = new Well19937c(19870301L);
        for (double[] c : java.util.Arrays.copyOf(PAIRED_CASES, MANY_DISCORDANT)) {
            double formula = McNemarTest.power(c[0], c[1], (long) c[2], ALPHA);
            double simulated = simulatePaired(rng, c[0], c[1], (long) c[2], false);
            assertThat(Math.abs(simulated - formula)).as(caseLabel(c, formula, simulated))
                    .isLessThanOrEqualTo(4 * monteCarloSd(formula));
        }
    }

    /**
     * The exact (conditional) McNemar test is conservative, so its rejection rate falls below
     * Connor's normal approximation, by up to about 3 points at these sizes (the smallest
     * n&middot;&psi; here is 40). It must lie within Monte Carlo error below the formula, and never
     * more than 3.5 points plus Monte Carlo error below it.
     */
    @Test
    void connorPowerIsCloseToTheSimulatedExactMcNemarTest() {
        RandomGenerator rng = new Well19937c(20200101L);
        for (double[] c : PAIRED_CASES) {
            double formula = McNemarTest.power(c[0], c[1], (long) c[2], ALPHA);
            double simulated = simulatePaired(rng, c[0], c[1], (long) c[2], true);
            double mc = 4 * monteCarloSd(formula);
            String label = caseLabel(c, formula, simulated);
            assertThat(simulated).as(label).isLessThanOrEqualTo(formula + mc);
            assertThat(simulated).as(label).isGreaterThanOrEqualTo(formula - 0.035 - mc);
        }
    }

    /**
     * Cohen's-h power of {@link TwoProportionTest#power} against the simulated rejection rate of
     * the pooled z-test {@link TwoProportionTest#pValue} on independent binomial counts.
     */
    @Test
    void cohensHPowerMatchesTheSimulatedPooledZTest() {
        double[][] cases = {{0.70, 0.65, 1000, 1000}, {0.912, 0.89, 2000, 2000}, {0.50, 0.45, 800, 1200},
                {0.20, 0.15, 600, 600}, {0.95, 0.92, 1500, 1000}};
        RandomGenerator rng = new Well19937c(19880101L);
        for (double[] c : cases) {
            long n1 = (long) c[2];
            long n2 = (long) c[3];
            double formula = TwoProportionTest.power(c[0], c[1], n1, n2, ALPHA);
            BinomialDistribution first = new BinomialDistribution(rng, (int) n1, c[0]);
            BinomialDistribution second = new BinomialDistribution(rng, (int) n2, c[1]);
            int rejections = 0;
            for (int r = 0; r < REPLICATES; r++) {
                double q1 = (double) first.sample() / n1;
                double q2 = (double) second.sample() / n2;
                if (TwoProportionTest.pValue(q1, q2, n1, n2) < ALPHA) rejections++;
            }
            double simulated = (double) rejections / REPLICATES;
            assertThat(Math.abs(simulated - formula)).as(caseLabel(c, formula, simulated))
                    .isLessThanOrEqualTo(4 * monteCarloSd(formula));
        }
    }

    /**
     * Rejection rate over n pairs whose difference d_i is +1 with probability (&psi; + &delta;)/2,
     * &minus;1 with (&psi; &minus; &delta;)/2, else 0: b + c ~ Binomial(n, &psi;), then
     * b ~ Binomial(b + c, (&psi; + &delta;)/(2&psi;)).
     */
    private static double simulatePaired(RandomGenerator rng, double delta, double psi, long n, boolean exact) {
        BinomialDistribution discordant = new BinomialDistribution(rng, (int) n, psi);
        double towardsFirst = (psi + delta) / (2 * psi);
        int rejections = 0;
        for (int r = 0; r < REPLICATES; r++) {
            int d = discordant.sample();
            int b = d == 0 ? 0 : new BinomialDistribution(rng, d, towardsFirst).sample();
            double p = exact ? McNemarTest.exactPValue(b, d - b) : McNemarTest.chiSquarePValue(b, d - b, false);
            if (p < ALPHA) rejections++;
        }
        return (double) rejections / REPLICATES;
    }

    private static double monteCarloSd(double p) {
        return Math.sqrt(p * (1 - p) / REPLICATES);
    }

    private static String caseLabel(double[] c, double formula, double simulated) {
        return java.util.Arrays.toString(c) + ": formula " + formula + ", simulated " + simulated;
    }
}
