package org.assay.metrics.regression;

import org.assay.stats.Resampled;

/**
 * Spearman's rank correlation: Pearson's r of the mid-ranks (ties get the mean of the ranks
 * they span, as in scipy.stats.spearmanr).
 *
 * <p>Exact under bootstrap weights: a resample is the data with unit i repeated w_i times, so
 * ranks are recomputed per resample as weighted mid-ranks, walking the two orders sorted once
 * at construction: O(n) per resample, no sorting. Ranks fixed from the full data would be
 * cheaper by nothing and wrong for resamples.
 *
 * <p>The jackknife is O(n log n) in closed form. Removing unit i lowers the rank of every unit
 * above it by 1 and of every unit tied with it by 1/2; with ranks centred at their mean, unit j
 * then moves by alpha_j = +1/2, 0 or -1/2 (above, tied, below in x; beta_j likewise in y), so
 * the leave-one-out sums of squares and products follow from prefix sums over each order and,
 * for the sum of alpha_j * beta_j, from the counts of concordant and discordant partners of
 * unit i, counted with a Fenwick tree.
 */
final class SpearmanStatistic implements Resampled {
    private final TieOrder x;
    private final TieOrder y;
    private final int n;

    SpearmanStatistic(double[] x, double[] y) {
        if (x.length != y.length) throw new IllegalArgumentException("x and y differ in length");
        this.x = new TieOrder(x);
        this.y = new TieOrder(y);
        this.n = x.length;
    }

    @Override public int units() { return n; }

    @Override public double estimate() { return value(null); }

    @Override
    public double value(int[] weights) {
        long total = 0;
        for (int i = 0; i < n; i++) total += weights == null ? 1 : weights[i];
        if (total == 0) return Double.NaN;
        double[] rx = x.centredRanks(weights, total);
        double[] ry = y.centredRanks(weights, total);
        double sxx = 0, syy = 0, sxy = 0;
        for (int i = 0; i < n; i++) {
            int w = weights == null ? 1 : weights[i];
            if (w == 0) continue;
            sxx += w * rx[i] * rx[i];
            syy += w * ry[i] * ry[i];
            sxy += w * rx[i] * ry[i];
        }
        // Centred ranks are all exactly 0 when one tie group holds all the weight.
        if (sxx == 0 || syy == 0) return Double.NaN;
        return CentredSums.correlation(sxx, syy, sxy);
    }

    @Override
    public double[] jackknife() {
        double[] u = x.centredRanks(null, n);
        double[] v = y.centredRanks(null, n);
        double uu = 0, vv = 0, uv = 0;
        for (int i = 0; i < n; i++) {
            uu += u[i] * u[i];
            vv += v[i] * v[i];
            uv += u[i] * v[i];
        }
        // Sums over the units strictly above minus strictly below unit i, in each order.
        double[] uByX = aboveMinusBelow(x, u);
        double[] vByX = aboveMinusBelow(x, v);
        double[] uByY = aboveMinusBelow(y, u);
        double[] vByY = aboveMinusBelow(y, v);
        long[] concordMinusDiscord = concordanceBalance();
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            int tx = x.groupSize(x.groupOf[i]);
            int ty = y.groupSize(y.groupOf[i]);
            boolean xConstant = x.groups() == 1 || (x.groups() == 2 && tx == 1);
            boolean yConstant = y.groups() == 1 || (y.groups() == 2 && ty == 1);
            if (n < 3 || xConstant || yConstant) {
                out[i] = Double.NaN;
                continue;
            }
            double sxx = uu - u[i] * u[i] - uByX[i] + (n - tx) / 4.0;
            double syy = vv - v[i] * v[i] - vByY[i] + (n - ty) / 4.0;
            double sxy = uv - u[i] * v[i] - vByX[i] / 2 - uByY[i] / 2 + concordMinusDiscord[i] / 4.0;
            out[i] = CentredSums.correlation(sxx, syy, sxy);
        }
        return out;
    }

    /** For each unit: the sum of {@code values} over units above it minus over units below it. */
    private double[] aboveMinusBelow(TieOrder order, double[] values) {
        int groups = order.groups();
        double[] groupSum = new double[groups];
        double total = 0;
        for (int g = 0; g < groups; g++) {
            for (int p = order.start[g]; p < order.start[g + 1]; p++) groupSum[g] += values[order.order[p]];
            total += groupSum[g];
        }
        double[] out = new double[n];
        double below = 0;
        for (int g = 0; g < groups; g++) {
            double above = total - below - groupSum[g];
            for (int p = order.start[g]; p < order.start[g + 1]; p++) out[order.order[p]] = above - below;
            below += groupSum[g];
        }
        return out;
    }

    /**
     * For each unit i: (#j above in x and y) + (#j below in both) - (#j above in x, below in y)
     * - (#j below in x, above in y). Ties in either variable count in none of the four.
     */
    private long[] concordanceBalance() {
        long[] out = new long[n];
        int[] fenwick = new int[y.groups() + 1];
        // Ascending sweep over x groups: partners below in x.
        int inserted = 0;
        for (int g = 0; g < x.groups(); g++) {
            for (int p = x.start[g]; p < x.start[g + 1]; p++) {
                int i = x.order[p];
                int yg = y.groupOf[i];
                long lowerY = countBelow(fenwick, yg);
                long higherY = inserted - countBelow(fenwick, yg + 1);
                out[i] += lowerY - higherY;
            }
            for (int p = x.start[g]; p < x.start[g + 1]; p++) insert(fenwick, y.groupOf[x.order[p]]);
            inserted += x.groupSize(g);
        }
        // Descending sweep: partners above in x.
        java.util.Arrays.fill(fenwick, 0);
        inserted = 0;
        for (int g = x.groups() - 1; g >= 0; g--) {
            for (int p = x.start[g]; p < x.start[g + 1]; p++) {
                int i = x.order[p];
                int yg = y.groupOf[i];
                long lowerY = countBelow(fenwick, yg);
                long higherY = inserted - countBelow(fenwick, yg + 1);
                out[i] += higherY - lowerY;
            }
            for (int p = x.start[g]; p < x.start[g + 1]; p++) insert(fenwick, y.groupOf[x.order[p]]);
            inserted += x.groupSize(g);
        }
        return out;
    }

    /** Number of inserted units whose y group is below {@code group}. */
    private static long countBelow(int[] fenwick, int group) {
        long count = 0;
        for (int k = group; k > 0; k -= k & -k) count += fenwick[k];
        return count;
    }

    private static void insert(int[] fenwick, int group) {
        for (int k = group + 1; k < fenwick.length; k += k & -k) fenwick[k]++;
    }
}
