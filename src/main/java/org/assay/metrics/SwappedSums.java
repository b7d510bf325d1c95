package org.assay.metrics;

import org.assay.stats.SwapStatistic;

/**
 * Two systems' values of one sum metric on the same units, with units' statistics swapped between
 * them for approximate randomization: swapping unit i moves A's statistics row for it into B's sums
 * and B's into A's, so corpus-level metrics (BLEU, macro F1) are recomputed from swapped sufficient
 * statistics, as Riezler &amp; Maxwell (2005) do for BLEU. Each trial is O(n &middot; width); nothing is
 * re-read or re-tokenized.
 *
 * <p>Both statistics must describe their units in the same coding (the same table width; for
 * classification, the same class list), which the caller checks; A's units define the order and
 * {@code bIndexOfA[i]} is B's position of A's unit i.
 */
public final class SwappedSums implements SwapStatistic {
    private final SumStatistic a;
    private final SumStatistic b;
    private final int[] bIndexOfA;
    private final double[] totalA;
    private final double[] totalB;

    public SwappedSums(SumStatistic a, SumStatistic b, int[] bIndexOfA) {
        if (a.units() != b.units() || bIndexOfA.length != a.units()) {
            throw new IllegalArgumentException("paired statistics need the same units: " + a.units() + " against " + b.units());
        }
        if (a.table().width() != b.table().width()) {
            throw new IllegalArgumentException("the two systems' statistics have different widths: " + a.table().width()
                    + " against " + b.table().width());
        }
        this.a = a;
        this.b = b;
        this.bIndexOfA = bIndexOfA.clone();
        this.totalA = a.table().weightedSums(null);
        this.totalB = b.table().weightedSums(null);
    }

    @Override public int units() { return a.units(); }

    @Override public double observed() { return a.metric().value(totalA) - b.metric().value(totalB); }

    @Override
    public double swapped(boolean[] swap) {
        double[] sumsA = totalA.clone();
        double[] sumsB = totalB.clone();
        UnitTable ta = a.table();
        UnitTable tb = b.table();
        for (int i = 0; i < swap.length; i++) {
            if (!swap[i]) continue;
            int j = bIndexOfA[i];
            ta.addUnit(i, -1, sumsA);
            tb.addUnit(j, 1, sumsA);
            tb.addUnit(j, -1, sumsB);
            ta.addUnit(i, 1, sumsB);
        }
        return a.metric().value(sumsA) - b.metric().value(sumsB);
    }
}
