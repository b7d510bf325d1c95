package org.assay.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.assay.claims.Claim;
import org.assay.claims.Scale;
import org.junit.jupiter.api.Test;

/**
 * The plan's exact power against a seeded simulation of the reproduction it plans: a test set of N
 * items with K correct, a simple random subsample of n drawn without replacement (a partial
 * Fisher&ndash;Yates shuffle with {@link SplittableRandom}), and the audit's own decision on the
 * subsample's count ({@link CountEvidence} and {@link ClaimAssessor}, before multiplicity). The
 * simulated rate must lie within 2 points of the computed power; with 10,000 draws its Monte Carlo
 * standard deviation is at most 0.5 points. Not a timing test.
 */
class PlanSimulationTest {
    private static final int DRAWS = 10_000;

    @Test
    void simulatedRatesOfTheAuditsVerdictsMatchTheExactPower() {
        Object[][] cases = {
            // N, printed (percent), margin, confidence, n, seed
            {4000L, "87.4", 0.01, 0.95, 2888L, 11L},     // `assay plan --metric accuracy --claim 87.4 --test-size 4000`: (b)
            {4000L, "87.4", 0.01, 0.95, 2737L, 12L},     // ... and (c)
            {600L, "93.5", 0.02, 0.90, 250L, 13L},
            {250L, "50.0", 0.05, 0.95, 225L, 14L},
            {20000L, "61.8", 0.02, 0.95, 1500L, 15L},
        };
        int compared = 0;
        for (Object[] c : cases) {
            long N = (Long) c[0];
            Claim claim = PlanDecisionTest.claim((String) c[1]);
            double margin = (Double) c[2];
            PlanSettings s = PlanDecisionTest.settings((Double) c[3]);
            long n = (Long) c[4];
            double value = claim.value().fraction(Scale.PERCENT);
            double[] ci = claim.value().roundingInterval(Scale.PERCENT);
            CountPlanCurves curves = new CountPlanCurves(N, value, ci[0], ci[1], margin, s, value - margin, value + margin);
            ClaimAssessor assessor = new ClaimAssessor(s.estimation());
            Map<Long, Verdict> verdicts = new HashMap<>();
            SplittableRandom random = new SplittableRandom((Long) c[5]);
            long[][] truths = {{curves.lowerCount()}, {curves.higherCount()}, {curves.agreeCount()}};
            double[] computed = {curves.detectLower(n), curves.detectHigher(n), curves.agree(n)};
            Verdict[] counted = {Verdict.DISCREPANT, Verdict.DISCREPANT, Verdict.CONSISTENT};
            for (int t = 0; t < 3; t++) {
                long K = truths[t][0];
                int hits = 0;
                for (int d = 0; d < DRAWS; d++) {
                    long k = drawCount(random, (int) N, (int) K, (int) n);
                    Verdict v = verdicts.computeIfAbsent(k, kk -> assessor.assess(claim,
                            new CountEvidence(kk, n, N, IntervalChoice.EXACT), n, N, margin, List.of()).verdict());
                    if (v == counted[t]) hits++;
                }
                double simulated = (double) hits / DRAWS;
                assertThat(simulated).as("N=" + N + " " + c[1] + "% n=" + n + " K=" + K + " " + counted[t]
                        + " computed " + computed[t]).isCloseTo(computed[t], org.assertj.core.api.Assertions.within(0.02));
                compared++;
            }
        }
        assertThat(compared).isEqualTo(15);
    }

    /**
     * Successes among n items drawn without replacement from N items whose first K are successes:
     * the first n places of a partial Fisher&ndash;Yates shuffle (Knuth, TAOCP vol. 2, 3.4.2, algorithm P).
     */
    private static long drawCount(SplittableRandom random, int N, int K, int n) {
        int[] items = scratch(N);
        long count = 0;
        for (int i = 0; i < n; i++) {
            int j = i + random.nextInt(N - i);
            int chosen = items[j];
            items[j] = items[i];
            items[i] = chosen;
            if (chosen < K) count++;
        }
        return count;
    }

    private static int[] buffer = new int[0];

    /** 0..N-1 in some order: any permutation of the items is as good a starting point for the shuffle. */
    private static int[] scratch(int N) {
        if (buffer.length != N) {
            buffer = new int[N];
            for (int i = 0; i < N; i++) buffer[i] = i;
        }
        return buffer;
    }
}
