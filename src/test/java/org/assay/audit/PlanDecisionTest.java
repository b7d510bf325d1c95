package org.assay.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;
import org.assay.claims.PrintedValue;
import org.assay.claims.Scale;
import org.assay.stats.ExactCountPlan;
import org.junit.jupiter.api.Test;

/**
 * The plan's exact power sums over the counts its tests reject or accept; those counts must be
 * exactly the ones the audit itself calls discrepant ({@link CountEvidence#pValue} below &alpha;)
 * and consistent ({@link ClaimAssessor}, before multiplicity). Checked for every count of each
 * sample size below, including tiny samples, claims at 0 and 100%, and a claim no count can print as.
 */
class PlanDecisionTest {
    private static final PlanSettings DEFAULT = settings(0.95);

    @Test
    void theRegionsAreTheAuditsVerdictsForEveryCount() {
        Object[][] cases = {
            // N, printed (percent), margin (fraction), confidence, sizes
            {4000L, "87.4", 0.01, 0.95, new long[] {1, 2, 5, 30, 311, 1200}},
            {1000L, "71.25", 0.01, 0.95, new long[] {3, 150, 640}},        // no count of 1000 prints as 71.25
            {250L, "50.0", 0.05, 0.95, new long[] {1, 7, 120, 249, 250}},
            {600L, "93.5", 0.02, 0.90, new long[] {4, 50, 333}},
            {500L, "0.0", 0.01, 0.95, new long[] {1, 60, 499}},
            {500L, "100.0", 0.01, 0.99, new long[] {2, 45, 400}},
            {80L, "12.5", 0.10, 0.95, new long[] {1, 9, 40, 79}},
        };
        int counts = 0;
        for (Object[] c : cases) {
            long N = (Long) c[0];
            Claim claim = claim((String) c[1]);
            double margin = (Double) c[2];
            PlanSettings s = settings((Double) c[3]);
            double[] ci = claim.value().roundingInterval(Scale.PERCENT);
            ExactCountPlan exact = new CountPlanCurves(N, claim.value().fraction(Scale.PERCENT), ci[0], ci[1], margin, s,
                    null, null).exact();
            ClaimAssessor assessor = new ClaimAssessor(s.estimation());
            for (long n : (long[]) c[4]) {
                long[] cuts = exact.discrepantCuts(n);
                long[] consistent = exact.consistentRange(n);
                for (long k = 0; k <= n; k++) {
                    CountEvidence evidence = new CountEvidence(k, n, N, IntervalChoice.EXACT);
                    Verdict v = assessor.assess(claim, evidence, n, N, margin, List.of()).verdict();
                    String label = "N=" + N + " " + c[1] + "% n=" + n + " k=" + k + " " + v;
                    assertThat(k <= cuts[0] || k >= cuts[1]).as(label).isEqualTo(v == Verdict.DISCREPANT);
                    assertThat(k >= consistent[0] && k <= consistent[1]).as(label).isEqualTo(v == Verdict.CONSISTENT);
                    counts++;
                }
            }
        }
        assertThat(counts).isEqualTo(4519);    // every count 0..n of every size above
    }

    /** The true counts one margin away round toward the claim, so the power is never computed for a larger error. */
    @Test
    void trueCountsLieWithinOneMarginOfTheClaim() {
        CountPlanCurves curves = new CountPlanCurves(4000, 0.874, 0.8735, 0.8745, 0.01, DEFAULT, 0.864, 0.884);
        assertThat(curves.lowerCount()).isEqualTo(3456);    // 0.864 * 4000 = 3456 exactly
        assertThat(curves.higherCount()).isEqualTo(3536);
        assertThat(curves.agreeCount()).isEqualTo(3496);
        CountPlanCurves odd = new CountPlanCurves(333, 0.5, 0.4995, 0.5005, 0.0125, DEFAULT, 0.4875, 0.5125);
        assertThat(odd.lowerCount()).isEqualTo(163);        // 162.34 -> 163 (0.4895 >= 0.4875)
        assertThat(odd.higherCount()).isEqualTo(170);       // 170.66 -> 170
    }

    static Claim claim(String printed) {
        return new Claim("T", "Ours", List.of("Accuracy"), "accuracy", Map.of(), PrintedValue.parse(printed), Scale.PERCENT,
                null, null, null, null, null);
    }

    static PlanSettings settings(double confidence) {
        return new PlanSettings(0.01, 0.8, confidence, PlanDirection.EITHER, List.of(), 1000, 1, 1);
    }
}
