package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLongArray;
import org.assay.common.UserInputException;
import org.assay.stats.BootstrapTestStatistics.WeightedMean;
import org.junit.jupiter.api.Test;

class BootstrapEngineTest {
    private static final double[] DATA = {
        3.1, 0.4, 2.2, 5.9, 1.0, 0.7, 4.4, 2.8, 0.1, 9.3, 1.6, 2.0, 0.9, 3.3, 7.1, 0.5, 1.8, 2.6, 4.0, 0.2,
        6.5, 1.1, 0.8, 2.4, 3.9, 1.4, 0.3, 5.2, 2.9, 1.7};

    // DESIGN.md principle 5: the same seed gives the same replicates whatever the thread count.
    @Test
    void sameSeedGivesIdenticalReplicatesForAnyThreadCount() {
        WeightedMean mean = new WeightedMean(DATA);
        double[] one = new BootstrapEngine(2000, 42L, 1).run(mean).replicates();
        double[] two = new BootstrapEngine(2000, 42L, 2).run(mean).replicates();
        double[] three = new BootstrapEngine(2000, 42L, 3).run(mean).replicates();
        assertThat(two).containsExactly(one);
        assertThat(three).containsExactly(one);

        double[] otherSeed = new BootstrapEngine(2000, 43L, 1).run(mean).replicates();
        assertThat(otherSeed).isNotEqualTo(one);
    }

    @Test
    void countShortcutIsAlsoDeterministicAcrossThreads() {
        double[] one = new BootstrapEngine(1500, -7L, 1).runCount(61, 90).replicates();
        double[] three = new BootstrapEngine(1500, -7L, 3).runCount(61, 90).replicates();
        assertThat(three).containsExactly(one);
        assertThat(new BootstrapEngine(1500, -8L, 1).runCount(61, 90).replicates()).isNotEqualTo(one);
    }

    @Test
    void eachResampleIsAnIntegerWeightVectorSummingToN() {
        int n = DATA.length;
        int resamples = 3000;
        AtomicInteger calls = new AtomicInteger();
        AtomicInteger badSum = new AtomicInteger();
        AtomicInteger negative = new AtomicInteger();
        AtomicLongArray weightSum = new AtomicLongArray(n);
        AtomicLongArray weightSquares = new AtomicLongArray(n);
        WeightedMean mean = new WeightedMean(DATA);
        Resampled recording = new Resampled() {
            @Override public int units() { return n; }
            @Override public double estimate() { return mean.estimate(); }
            @Override public double[] jackknife() { return mean.jackknife(); }
            @Override public double value(int[] weights) {
                calls.incrementAndGet();
                long total = 0;
                for (int i = 0; i < weights.length; i++) {
                    if (weights[i] < 0) negative.incrementAndGet();
                    total += weights[i];
                    weightSum.addAndGet(i, weights[i]);
                    weightSquares.addAndGet(i, (long) weights[i] * weights[i]);
                }
                if (total != n || weights.length != n) badSum.incrementAndGet();
                return mean.value(weights);
            }
        };
        new BootstrapEngine(resamples, 1L, 2).run(recording);
        assertThat(calls.get()).isEqualTo(resamples);
        assertThat(badSum.get()).isZero();
        assertThat(negative.get()).isZero();
        // Multinomial(n; 1/n, ..., 1/n) counts have mean 1 and variance 1 - 1/n (common practice).
        // Statistical check: the per-unit average over 3000 resamples has sd sqrt(0.967/3000) = 0.018,
        // so 0.1 is more than 5 sd; the variance estimate's sd is about 0.03, so 0.15 is 5 sd.
        for (int i = 0; i < n; i++) {
            double avg = weightSum.get(i) / (double) resamples;
            double var = weightSquares.get(i) / (double) resamples - avg * avg;
            assertThat(avg).as("mean weight of unit %d", i).isCloseTo(1.0, within(0.1));
            assertThat(var).as("weight variance of unit %d", i).isCloseTo(1 - 1.0 / n, within(0.15));
        }
    }

    @Test
    void argumentsAreValidated() {
        assertThatThrownBy(() -> new BootstrapEngine(99, 0, 1)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("between 100");
        assertThatThrownBy(() -> new BootstrapEngine(1000, 0, 0)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("threads");
        BootstrapEngine engine = new BootstrapEngine(1000, 0, 1);
        assertThatThrownBy(() -> engine.runCount(11, 10)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> engine.runCount(-1, 10)).isInstanceOf(UserInputException.class);
        assertThatThrownBy(() -> engine.runCount(1, 1)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("at least 2");
        assertThatThrownBy(() -> engine.run(new WeightedMean(new double[] {1.5})))
                .isInstanceOf(UserInputException.class).hasMessageContaining("at least 2");
    }

    @Test
    void aStatisticUndefinedOnSomeResampleIsReportedNotDropped() {
        WeightedMean mean = new WeightedMean(DATA);
        Resampled undefinedSometimes = new Resampled() {
            @Override public int units() { return DATA.length; }
            @Override public double estimate() { return mean.estimate(); }
            @Override public double[] jackknife() { return mean.jackknife(); }
            // undefined when unit 0 is left out of the resample (happens in ~36% of resamples)
            @Override public double value(int[] w) { return w[0] == 0 ? Double.NaN : mean.value(w); }
        };
        assertThatThrownBy(() -> new BootstrapEngine(500, 3L, 2).run(undefinedSometimes))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("bootstrap resample");
    }

    // Degenerate input: every value equal. Every resample reproduces the data's value, so the
    // documented result is a zero-width distribution and zero-width intervals at the estimate.
    @Test
    void allEqualValuesGiveZeroWidthIntervalsAtTheEstimate() {
        double[] same = new double[25];
        java.util.Arrays.fill(same, 0.625);
        BootstrapDistribution d = new BootstrapEngine(500, 9L, 2).run(new WeightedMean(same));
        assertThat(d.standardError()).isZero();
        assertThat(d.acceleration()).isZero();
        for (Interval i : new Interval[] {d.percentile(0.95), d.basic(0.95), d.bca(0.95)}) {
            assertThat(i.lower()).isEqualTo(0.625);
            assertThat(i.upper()).isEqualTo(0.625);
        }
        assertThat(d.bca(0.95).method()).isEqualTo("bootstrap BCa");
        // A value off the estimate is as far out as a Monte Carlo p-value can say: 2/(B+1).
        assertThat(d.twoSidedPValue(0.7, 0.8)).isEqualTo(2.0 / 501);
        assertThat(d.twoSidedPValue(0.6, 0.65)).isEqualTo(1.0);
    }

    @Test
    void allSuccessesOrAllFailuresGiveZeroWidthIntervals() {
        BootstrapEngine engine = new BootstrapEngine(400, 5L, 1);
        BootstrapDistribution none = engine.runCount(0, 50);
        BootstrapDistribution all = engine.runCount(50, 50);
        assertThat(none.bca(0.95)).isEqualTo(new Interval(0, 0, 0.95, "bootstrap BCa"));
        assertThat(all.percentile(0.9)).isEqualTo(new Interval(1, 1, 0.9, "bootstrap percentile"));
        assertThat(all.countShortcut()).isTrue();
    }
}
