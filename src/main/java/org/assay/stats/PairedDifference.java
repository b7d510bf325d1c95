package org.assay.stats;

/**
 * The difference A &minus; B of two statistics computed on the same resampling units, as one
 * statistic the bootstrap can resample: every resample applies the same weight vector to both
 * systems' per-unit statistics, so the item-to-item correlation of the two systems is kept. This is
 * the paired bootstrap of Koehn (2004), "Statistical significance tests for machine translation
 * evaluation", EMNLP, over any metric that takes weights.
 *
 * <p>The units of A define the order; {@code bIndexOfA[i]} is the position in B of A's unit i (the
 * same item), so the two files may list their items in different orders.
 */
public final class PairedDifference implements Resampled {
    private final Resampled a;
    private final Resampled b;
    private final int[] bIndexOfA;

    public PairedDifference(Resampled a, Resampled b, int[] bIndexOfA) {
        int n = a.units();
        if (b.units() != n || bIndexOfA.length != n) {
            throw new IllegalArgumentException("paired statistics need the same units: " + n + " against " + b.units()
                    + " (" + bIndexOfA.length + " matched)");
        }
        boolean[] seen = new boolean[n];
        for (int j : bIndexOfA) {
            if (j < 0 || j >= n || seen[j]) throw new IllegalArgumentException("the unit matching is not one to one");
            seen[j] = true;
        }
        this.a = a;
        this.b = b;
        this.bIndexOfA = bIndexOfA.clone();
    }

    @Override public int units() { return a.units(); }

    @Override public double estimate() { return a.estimate() - b.estimate(); }

    /** A's statistic under {@code weights} minus B's under the same weights, moved to B's unit order. */
    @Override
    public double value(int[] weights) {
        int[] moved = new int[weights.length];   // per call: value() must be safe from several threads
        for (int i = 0; i < weights.length; i++) moved[bIndexOfA[i]] = weights[i];
        return a.value(weights) - b.value(moved);
    }

    /** Leaving one item out leaves it out of both systems: A's leave-one-out value minus B's for the same item. */
    @Override
    public double[] jackknife() {
        double[] ja = a.jackknife();
        double[] jb = b.jackknife();
        double[] out = new double[ja.length];
        for (int i = 0; i < out.length; i++) out[i] = ja[i] - jb[bIndexOfA[i]];
        return out;
    }
}
