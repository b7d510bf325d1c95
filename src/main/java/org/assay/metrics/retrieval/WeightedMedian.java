package org.assay.metrics.retrieval;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;
import org.assay.stats.Resampled;

/**
 * The median of one value per query under integer weights, a weight w meaning the query is
 * counted w times. With W = sum of weights, the median is the value at position (W+1)/2 of the
 * sorted multiset when W is odd and the mean of positions W/2 and W/2+1 when W is even
 * (the definition of numpy.median). The values are sorted once; each call walks them in order,
 * O(n); the jackknife uses the sorted order directly, O(n) in all.
 */
final class WeightedMedian implements Resampled {
    private final double[] sorted;
    private final int[] order;      // order[p] = unit at sorted position p
    private final int[] position;   // position[unit] = its sorted position

    WeightedMedian(double[] values) {
        Integer[] idx = IntStream.range(0, values.length).boxed().toArray(Integer[]::new);
        Arrays.sort(idx, Comparator.comparingDouble(i -> values[i]));
        order = new int[values.length];
        position = new int[values.length];
        sorted = new double[values.length];
        for (int p = 0; p < idx.length; p++) {
            order[p] = idx[p];
            position[idx[p]] = p;
            sorted[p] = values[idx[p]];
        }
    }

    @Override public int units() { return sorted.length; }

    @Override
    public double estimate() {
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
    }

    @Override
    public double value(int[] weights) {
        long total = 0;
        for (int w : weights) total += w;
        if (total == 0) return Double.NaN;
        long lower = (total + 1) / 2;          // 1-based positions of the middle element(s)
        long upper = total / 2 + 1;
        double low = Double.NaN;
        long seen = 0;
        for (int p = 0; p < sorted.length; p++) {
            int w = weights[order[p]];
            if (w == 0) continue;
            seen += w;
            if (Double.isNaN(low) && seen >= lower) low = sorted[p];
            if (seen >= upper) return total % 2 == 1 ? low : (low + sorted[p]) / 2;
        }
        return low;   // not reached: the walk always passes position upper <= total
    }

    @Override
    public double[] jackknife() {
        int n = sorted.length;
        double[] out = new double[n];
        if (n == 1) {
            out[0] = Double.NaN;
            return out;
        }
        int m = n - 1;
        for (int unit = 0; unit < n; unit++) {
            int removed = position[unit];
            out[unit] = m % 2 == 1 ? without(m / 2, removed) : (without(m / 2 - 1, removed) + without(m / 2, removed)) / 2;
        }
        return out;
    }

    /** Element i of the sorted values once sorted position {@code removed} is taken out. */
    private double without(int i, int removed) { return sorted[i < removed ? i : i + 1]; }
}
