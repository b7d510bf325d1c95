package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.stream.IntStream;
import org.apache.commons.math3.random.RandomDataGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Coverage of the finite-population rescaled BCa interval for a proportion, by simulation with
 * fixed seeds. A population of N = 4000 units with K = round(pN) successes; 2000 simple random
 * subsamples of n = 400 without replacement (Commons Math RandomDataGenerator.nextPermutation);
 * for each, the count-shortcut bootstrap (B = 2000) rescaled with withFinitePopulation(400, 4000)
 * and its 95% BCa interval. A 95% procedure should cover K/N in 95% of subsamples (common
 * practice); with 2000 subsamples the Monte Carlo sd of the coverage is 0.5 points, so the band
 * 95% +- 2 points is 4 sd wide.
 */
class BootstrapCoverageTest {
    private static final int POPULATION = 4000;
    private static final int SAMPLE = 400;
    private static final int SUBSAMPLES = 2000;

    static double coverage(double p, int resamples) {
        int successes = (int) Math.round(p * POPULATION);
        double truth = (double) successes / POPULATION;
        // units 0..K-1 are the successes; a subsample is n distinct units
        RandomDataGenerator sampler = new RandomDataGenerator(new Well19937c(4000L + successes));
        int[] counts = new int[SUBSAMPLES];
        for (int s = 0; s < SUBSAMPLES; s++) {
            int k = 0;
            for (int unit : sampler.nextPermutation(POPULATION, SAMPLE)) if (unit < successes) k++;
            counts[s] = k;
        }
        long covered = IntStream.range(0, SUBSAMPLES).parallel().filter(s -> {
            BootstrapDistribution d = new BootstrapEngine(resamples, 1000L + s, 1)
                    .runCount(counts[s], SAMPLE).withFinitePopulation(SAMPLE, POPULATION);
            return d.bca(0.95).contains(truth);
        }).count();
        return (double) covered / SUBSAMPLES;
    }

    @ParameterizedTest(name = "p = {0}")
    @ValueSource(doubles = {0.60, 0.85, 0.97})
    void rescaledBcaCoversNearNinetyFivePercent(double p) {
        assertThat(coverage(p, 2000)).as("coverage at p = %s", p).isBetween(0.93, 0.97);
    }
}
