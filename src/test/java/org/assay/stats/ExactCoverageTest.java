package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * Coverage computed exactly (summing the hypergeometric pmf over every possible sample count)
 * rather than simulated. The exact finite-population interval is built so that each tail misses
 * with probability at most alpha/2, hence covers K/N with probability at least 1 - alpha for
 * every K (Buonaccorsi 1987; Wendell &amp; Schmee 1996). Checked for every K of a test set of 4000
 * with subsamples of 400.
 */
class ExactCoverageTest {
    @Test
    void exactFinitePopulationIntervalCoversAtLeastNominallyForEveryK() {
        int N = 4000, n = 400;
        Interval[] byCount = new Interval[n + 1];
        for (int k = 0; k <= n; k++) byCount[k] = FinitePopulation.exactInterval(k, n, N, 0.95);
        double worst = 1;
        for (int K = 0; K <= N; K++) {
            double truth = (double) K / N;
            double coverage = 0;
            for (int k = 0; k <= n; k++) {
                if (byCount[k].contains(truth)) coverage += FinitePopulation.pmf(k, n, N, K);
            }
            worst = Math.min(worst, coverage);
            assertThat(coverage).as("coverage at K=" + K).isGreaterThanOrEqualTo(0.95 - 1e-12);
        }
        assertThat(worst).isLessThan(0.96);   // not trivially conservative everywhere
    }
}
