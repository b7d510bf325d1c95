package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.apache.commons.math3.fraction.BigFraction;
import org.junit.jupiter.api.Test;

/** Cases beyond the brute-force sizes: large classes, the search cap, conventions, bad arguments. */
class RatioFeasibilityTest {

    // Common practice: F1 = 2TP/(2TP+FP+FN); TP = 40, FP = 7, FN = 9 gives 80/96 = 0.8333..., so
    // 0.833 is feasible with 49 positives of 1000. The witness found is checked independently.
    @Test
    void f1WitnessIsAValidMatrix() {
        Feasibility f = RatioFeasibility.f1(Printed.of("0.833", 1), 1000, 49L);
        assertThat(f.roundedFeasible()).isTrue();
        java.util.Map<String, Long> c = new java.util.HashMap<>();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("(\\w+) = (\\d+)").matcher(f.witness());
        while (m.find()) c.put(m.group(1), Long.parseLong(m.group(2)));
        assertThat(c.get("TP") + c.get("FP") + c.get("FN") + c.get("TN")).isEqualTo(1000);
        assertThat(c.get("TP") + c.get("FN")).isEqualTo(49);
        BigFraction v = new BigFraction(2 * c.get("TP"), 2 * c.get("TP") + c.get("FP") + c.get("FN"));
        assertThat(FeasibilityBruteForceTest.print(v, 1, 3, RoundingRule.HALF_UP)).isEqualTo("0.833");
        // 0.834 is not: no 2TP/(TP+49+FP) lies in [0.8335, 0.8345] (checked while writing this test by
        // enumerating every TP <= 49, FP <= 951 with Python's fractions module; not kept as a script).
        Feasibility gap = RatioFeasibility.f1(Printed.of("0.834", 1), 1000, 49L);
        assertThat(gap.roundedFeasible()).isFalse();
        assertThat(gap.exhaustive()).isTrue();
    }

    // scikit-learn's zero_division=0: F1 is 0 when no item is a true positive, even if every item is positive.
    @Test
    void f1OfZeroFollowsTheZeroDivisionConvention() {
        Feasibility f = RatioFeasibility.f1(Printed.of("0.0", 100), 10, 10L);
        assertThat(f.roundedFeasible()).isTrue();
        assertThat(f.witness()).isEqualTo("TP = 0, FP = 0, FN = 10, TN = 0");
    }

    // Common practice: with P = n every prediction that is positive is right, so precision is 1
    // whenever it is defined; 0.50 cannot arise.
    @Test
    void precisionWithEveryItemPositiveIsOne() {
        assertThat(RatioFeasibility.precision(Printed.of("0.50", 1), 20, 20L).provenInfeasible()).isTrue();
        assertThat(RatioFeasibility.precision(Printed.of("1.00", 1), 20, 20L).witness()).isEqualTo("TP = 1, FP = 0");
    }

    // Proof in RatioFeasibility.macroRecall: with K*n_max above the printed resolution every
    // value of [0, 1] is reachable, so every 2-decimal claim in [0, 1] is feasible and 1.01 is not.
    @Test
    void macroRecallOnLargeClassesIsDecidedByTheGrid() {
        long[] counts = {200, 300, 400, 500};
        for (int i = 0; i <= 100; i++) {
            String text = String.format(java.util.Locale.ROOT, "%d.%02d", i / 100, i % 100);
            Feasibility f = RatioFeasibility.macroRecall(Printed.of(text, 1), counts);
            assertThat(f.halfUpFeasible()).as(text).isTrue();
            assertThat(f.exhaustive()).as(text).isTrue();
            BigFraction v = FeasibilityBruteForceTest.macroOf(f.witness(), counts);
            assertThat(FeasibilityBruteForceTest.print(v, 1, 2, RoundingRule.HALF_UP)).as(text).isEqualTo(text);
        }
        Feasibility over = RatioFeasibility.macroRecall(Printed.of("1.01", 1), counts);
        assertThat(over.provenInfeasible()).isTrue();
        assertThat(over.nearestBelow()).isEqualTo("1.00");
    }

    // Ten classes of distinct prime sizes printed with four percent decimals: the partial sums
    // outgrow the search, so a miss must not be reported as impossible.
    @Test
    void macroRecallSearchThatStopsIsNotAVerdict() {
        long[] counts = {97, 89, 83, 79, 73, 71, 67, 61, 59, 53};
        Feasibility f = RatioFeasibility.macroRecall(Printed.of("94.1371", 100), counts);
        assertThat(f.exhaustive()).isFalse();
        assertThat(f.provenInfeasible()).isFalse();
        assertThat(f.note()).contains("search stopped");
    }

    @Test
    void badArgumentsAreRejected() {
        Printed p = Printed.of("0.5", 1);
        assertThatThrownBy(() -> RatioFeasibility.recall(p, 10, 0L)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> RatioFeasibility.recall(p, 0, null)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> RatioFeasibility.precision(p, 10, 11L)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> RatioFeasibility.rocAuc(p, 0, 5)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> RatioFeasibility.macroRecall(p, new long[] {3, 0})).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> RatioFeasibility.macroRecall(p, new long[0])).isInstanceOf(IllegalArgumentException.class);
    }
}
