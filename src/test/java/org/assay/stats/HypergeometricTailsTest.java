package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.HypergeometricDistribution;
import org.junit.jupiter.api.Test;

/**
 * The truncated tail sums against Commons Math 3.6.1 HypergeometricDistribution, which sums
 * every term of the support: tails to 1e-12 relative (down to tails of 1e-250), and the same
 * quantiles (inverseCumulativeProbability), over random parameters up to N = 30,000.
 */
class HypergeometricTailsTest {

    @Test
    void tailsAndQuantilesEqualCommonsMathsFullSums() {
        SplittableRandom rng = new SplittableRandom(41);
        int checked = 0;
        for (int round = 0; round < 200; round++) {
            int N = 2 + rng.nextInt(rng.nextBoolean() ? 200 : 30_000);
            int n = 1 + rng.nextInt(N);
            int K = rng.nextInt(N + 1);
            HypergeometricDistribution full = new HypergeometricDistribution(null, N, K, n);
            HypergeometricTails tails = new HypergeometricTails(n, N, K);
            int lo = full.getSupportLowerBound();
            int hi = full.getSupportUpperBound();
            for (int j = 0; j < 12; j++) {
                int x = lo - 1 + rng.nextInt(hi - lo + 3);
                assertRelative(tails.atMost(x), full.cumulativeProbability(x), N, n, K, x, "P(X <= x)");
                assertRelative(tails.atLeast(x), x <= lo ? 1 : full.upperCumulativeProbability(x), N, n, K, x, "P(X >= x)");
                checked++;
            }
            for (double p : new double[] {1e-9, 0.025, 0.5, 0.975, 1 - 1e-9, 1}) {
                assertThat(tails.quantile(p)).as("N=%d n=%d K=%d p=%s", N, n, K, p)
                        .isEqualTo(full.inverseCumulativeProbability(p));
            }
        }
        assertThat(checked).isEqualTo(2400);
    }

    private static void assertRelative(double ours, double commonsMath, int N, int n, int K, int x, String what) {
        if (commonsMath < 1e-250) {
            assertThat(ours).as("%s N=%d n=%d K=%d x=%d", what, N, n, K, x).isLessThan(1e-240);
            return;
        }
        assertThat(Math.abs(ours - commonsMath) / commonsMath).as("%s N=%d n=%d K=%d x=%d: %s vs %s",
                what, N, n, K, x, ours, commonsMath).isLessThan(1e-12);
    }
}
