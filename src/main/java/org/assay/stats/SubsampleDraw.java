package org.assay.stats;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.assay.common.UserInputException;

/**
 * Seeded draws of a subsample of positions 0..N-1 without replacement: simple random sampling,
 * and stratified sampling with proportional allocation.
 *
 * <p>The generator is {@link SplittableRandom} (SplitMix64, whose algorithm the JDK specifies), so a
 * seed redraws the same subsample on any machine and Java version. A simple random sample is the
 * first n positions of a seeded partial Fisher–Yates shuffle (Knuth, TAOCP vol. 2, Algorithm P):
 * every n-subset is equally likely. Results are sorted positions (file order).
 */
public final class SubsampleDraw {
    private SubsampleDraw() {}

    /** n of N positions, each n-subset equally likely. */
    public static int[] simple(int populationSize, int n, long seed) {
        check(populationSize, n);
        return drawFrom(identity(populationSize), n, new SplittableRandom(seed));
    }

    /**
     * Stratified: {@code stratumOf[i]} is position i's stratum (0..S-1); stratum h gets
     * {@code allocation[h]} positions drawn simply at random within it, strata in order 0..S-1,
     * one generator seeded once.
     */
    public static int[] stratified(int[] stratumOf, int[] allocation, long seed) {
        int strata = allocation.length;
        int[] sizes = new int[strata];
        for (int s : stratumOf) sizes[s]++;
        int[][] members = new int[strata][];
        int[] fill = new int[strata];
        for (int h = 0; h < strata; h++) {
            if (allocation[h] > sizes[h]) {
                throw new IllegalArgumentException("stratum " + h + " has " + sizes[h] + " items, " + allocation[h] + " requested");
            }
            members[h] = new int[sizes[h]];
        }
        for (int i = 0; i < stratumOf.length; i++) members[stratumOf[i]][fill[stratumOf[i]]++] = i;
        SplittableRandom rng = new SplittableRandom(seed);
        int total = Arrays.stream(allocation).sum();
        int[] out = new int[total];
        int at = 0;
        for (int h = 0; h < strata; h++) {
            int[] drawn = drawFrom(members[h], allocation[h], rng);
            System.arraycopy(drawn, 0, out, at, drawn.length);
            at += drawn.length;
        }
        Arrays.sort(out);
        return out;
    }

    /**
     * Proportional allocation of n over strata of the given sizes by the largest-remainder rule
     * (Hamilton's method): each stratum gets the floor of n·N_h/N, and the units left over go to
     * the largest remainders, ties to the earlier stratum (common practice).
     */
    public static int[] proportional(int[] sizes, int n) {
        long total = Arrays.stream(sizes).asLongStream().sum();
        check(total > Integer.MAX_VALUE ? Integer.MAX_VALUE : (int) total, n);
        int[] out = new int[sizes.length];
        long[] remainder = new long[sizes.length];   // remainders in units of 1/N, exact
        int given = 0;
        for (int h = 0; h < sizes.length; h++) {
            long q = (long) n * sizes[h];
            out[h] = (int) (q / total);
            remainder[h] = q % total;
            given += out[h];
        }
        for (int left = n - given; left > 0; left--) {
            int best = -1;
            for (int h = 0; h < sizes.length; h++) {
                if (out[h] < sizes[h] && (best < 0 || remainder[h] > remainder[best])) best = h;
            }
            out[best]++;
            remainder[best] = -1;
        }
        return out;
    }

    private static int[] drawFrom(int[] pool, int n, SplittableRandom rng) {
        int[] a = pool.clone();
        for (int i = 0; i < n; i++) {
            int j = i + rng.nextInt(a.length - i);
            int t = a[i]; a[i] = a[j]; a[j] = t;
        }
        int[] out = Arrays.copyOf(a, n);
        Arrays.sort(out);
        return out;
    }

    private static int[] identity(int n) {
        int[] a = new int[n];
        for (int i = 0; i < n; i++) a[i] = i;
        return a;
    }

    private static void check(int populationSize, int n) {
        if (n < 1 || n > populationSize) {
            throw UserInputException.usage("cannot draw " + n + " of " + populationSize + " items",
                    "choose a subsample size from 1 to " + populationSize);
        }
    }
}
