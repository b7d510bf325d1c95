package org.assay.metrics;

import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The sorted-once ROC AUC against its definition evaluated pair by pair: the weighted share of
 * (positive, negative) pairs where the positive scores higher, ties counting one half
 * (Mann-Whitney U over n_pos * n_neg; Hanley &amp; McNeil 1982, Radiology 143:29-36). Scores come
 * from a handful of values, with -0.0 and 0.0 among them, so most pairs are ties.
 */
class RocAucStatisticTest {

    @Test
    void weightedValueEqualsThePairwiseDefinitionWithManyTies() {
        Random random = new Random(31);
        double[] values = {-1.5, -0.0, 0.0, 0.25, 0.25000000000000006, 3};
        for (int round = 0; round < 50; round++) {
            int n = 2 + random.nextInt(300);
            double[] scores = new double[n];
            boolean[] positive = new boolean[n];
            int[] weights = new int[n];
            for (int i = 0; i < n; i++) {
                scores[i] = values[random.nextInt(values.length)];
                positive[i] = random.nextBoolean();
                weights[i] = random.nextInt(4);
            }
            positive[0] = true;
            positive[1] = false;
            weights[0] = weights[1] = 1;
            RocAucStatistic auc = new RocAucStatistic(scores, positive);
            assertThat(auc.value(weights)).isCloseTo(pairwise(scores, positive, weights), within(1e-12));
            int[] ones = new int[n];
            java.util.Arrays.fill(ones, 1);
            assertThat(auc.estimate()).isCloseTo(pairwise(scores, positive, ones), within(1e-12));
        }
    }

    private static double pairwise(double[] s, boolean[] positive, int[] w) {
        double wins = 0;
        double pairs = 0;
        for (int i = 0; i < s.length; i++) {
            if (!positive[i]) continue;
            for (int j = 0; j < s.length; j++) {
                if (positive[j]) continue;
                double weight = (double) w[i] * w[j];
                pairs += weight;
                if (s[i] > s[j]) wins += weight;
                else if (s[i] == s[j]) wins += 0.5 * weight;   // -0.0 == 0.0: a tie
            }
        }
        return wins / pairs;
    }
}
