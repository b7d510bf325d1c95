package org.assay.metrics.generation;

import org.assay.metrics.SumMetric;

/**
 * chrF from summed {@link ChrfCounts} (Popović 2015, "chrF: character n-gram F-score for automatic
 * MT evaluation", WMT; with word orders, chrF++: Popović 2017, WMT): per order, precision =
 * matches / hypothesis n-grams and recall = matches / reference n-grams; chrP and chrR are their
 * arithmetic means over the orders, and the value is the F-beta score
 * (1 + beta^2) chrP chrR / (beta^2 chrP + chrR), on the fraction scale 0..1.
 *
 * <p>An order enters the precision mean only when the hypotheses have n-grams of it, and the
 * recall mean only when the references have (a text shorter than n has no n-grams to be right or
 * wrong about). With no order at all on one side that mean is 0, and 0/0 in the F-score is 0.
 *
 * <p>NLTK 3.8's corpus_chrf instead averages per-sentence, per-order F-scores; the two agree on one
 * sentence and one order only ({@code ChrfReferenceTest} tests both the agreement and the difference).
 */
final class ChrfScore implements SumMetric {
    private final int orders;
    private final double beta;

    ChrfScore(int orders, double beta) {
        this.orders = orders;
        this.beta = beta;
    }

    @Override
    public double value(double[] sums) {
        double precision = 0, recall = 0;
        int precisionOrders = 0, recallOrders = 0;
        for (int j = 0; j < orders; j++) {
            double matches = sums[3 * j], hyp = sums[3 * j + 1], ref = sums[3 * j + 2];
            if (hyp > 0) {
                precision += matches / hyp;
                precisionOrders++;
            }
            if (ref > 0) {
                recall += matches / ref;
                recallOrders++;
            }
        }
        double p = precisionOrders == 0 ? 0 : precision / precisionOrders;
        double r = recallOrders == 0 ? 0 : recall / recallOrders;
        double b2 = beta * beta;
        return p == 0 && r == 0 ? 0 : (1 + b2) * p * r / (b2 * p + r);
    }
}
