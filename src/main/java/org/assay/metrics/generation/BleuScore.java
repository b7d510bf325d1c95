package org.assay.metrics.generation;

import org.assay.metrics.SumMetric;

/**
 * BLEU from summed {@link BleuCounts}: the brevity penalty times the geometric mean of the
 * modified n-gram precisions p_1..p_N with uniform weights 1/N (Papineni et al. 2002, ACL,
 * section 2.3), on the fraction scale 0..1.
 * <ul>
 *   <li>p_n = matches_n / totals_n, smoothed as {@link BleuSmoothing} says. An order whose total is
 *       0 (every hypothesis shorter than n) counts as 0 matches out of 1, as NLTK 3.8 counts a
 *       single sentence (its modified_precision uses max(1, total) per sentence); at corpus level
 *       NLTK adds that 1 for each short hypothesis, which changes its corpus BLEU whenever some
 *       hypothesis is shorter than the order ({@code BleuReferenceTest} tests the difference).</li>
 *   <li>No unigram match gives 0 whatever the smoothing (NLTK 3.8's corpus_bleu does the same); so
 *       does an empty hypothesis.</li>
 *   <li>Without smoothing, a 0 match count at any order gives exactly 0 (NLTK 3.8 returns a value
 *       near 1e-77 there, from log(sys.float_info.min)).</li>
 *   <li>Brevity penalty: 1 when c &gt; r, else exp(1 - r/c), with c the summed hypothesis length
 *       and r the summed closest reference lengths.</li>
 * </ul>
 */
final class BleuScore implements SumMetric {
    private final int order;
    private final BleuSmoothing smoothing;

    BleuScore(int order, BleuSmoothing smoothing) {
        this.order = order;
        this.smoothing = smoothing;
    }

    @Override
    public double value(double[] sums) {
        double c = sums[2 * order], r = sums[2 * order + 1];
        if (c == 0 || sums[0] == 0) return 0;
        double logSum = 0;
        int zeroOrders = 0;
        for (int n = 1; n <= order; n++) {
            double matches = sums[n - 1];
            double total = Math.max(1, sums[order + n - 1]);
            double p;
            if (smoothing == BleuSmoothing.ADD_ONE && n > 1) {
                p = (matches + 1) / (total + 1);
            } else if (matches > 0) {
                p = matches / total;
            } else {
                p = switch (smoothing) {
                    case NONE, ADD_ONE -> 0;
                    case FLOOR -> BleuSmoothing.FLOOR_EPSILON / total;
                    case EXP -> 1 / (Math.pow(2, ++zeroOrders) * total);
                };
                if (p == 0) return 0;
            }
            logSum += Math.log(p);
        }
        double brevity = c > r ? 1 : Math.exp(1 - r / c);
        return brevity * Math.exp(logSum / order);
    }
}
