package org.assay.stats;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.assay.common.UserInputException;

/**
 * Approximate randomization test of H0: the two systems' outputs are exchangeable item by item
 * (Noreen 1989, Computer-Intensive Methods for Testing Hypotheses, Wiley; for metrics of
 * machine translation, Riezler &amp; Maxwell 2005, "On some pitfalls in automatic evaluation and
 * significance testing for MT", ACL workshop on intrinsic and extrinsic evaluation measures). Each
 * trial swaps every item's pair of outputs with probability 1/2 and recomputes the difference;
 * the two-sided p-value is (1 + #{trials with |&Delta;*| &ge; |&Delta;|}) / (1 + trials).
 *
 * <p>When 2^n does not exceed the number of trials, all 2^n swap patterns are enumerated
 * instead and the p-value is the exact permutation p-value #{|&Delta;*| &ge; |&Delta;|} / 2^n (as
 * scipy's {@code permutation_test(permutation_type="samples", n_resamples=inf)} computes it; the
 * null distribution is symmetric, so its 2&middot;min of the one-sided tails is the same number).
 * "At least as extreme" allows a relative rounding error of 1e-12, so a swap that reproduces the
 * observed difference through another order of summation still counts.
 *
 * <p>Deterministic per seed: trial b draws its swaps from a generator seeded only by (seed, b), as
 * the bootstrap does ({@link BootstrapEngine}), so the p-value is the same for any thread count.
 */
public final class ApproximateRandomization {
    private static final double RELATIVE_TOLERANCE = 1e-12;
    private final int trials;
    private final long seed;
    private final int threads;

    /**
     * @param observed the difference on the data
     * @param pValue   two-sided p-value
     * @param trials   swap patterns evaluated (2^n when exact)
     * @param exact    whether every swap pattern was enumerated
     */
    public record Result(double observed, double pValue, long trials, boolean exact) {}

    public ApproximateRandomization(int trials, long seed, int threads) {
        if (trials < 100) {
            throw UserInputException.usage("approximate randomization needs at least 100 trials, got " + trials,
                    "use e.g. 10000 (--resamples)");
        }
        if (threads < 1) throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        this.trials = trials;
        this.seed = seed;
        this.threads = threads;
    }

    public Result test(SwapStatistic statistic) {
        int n = statistic.units();
        if (n < 1) throw UserInputException.usage("approximate randomization needs at least one item", "evaluate more items");
        double observed = statistic.observed();
        if (!Double.isFinite(observed)) {
            throw new IllegalArgumentException("the difference is not finite on the data (" + observed + ")");
        }
        double threshold = Math.abs(observed) * (1 - RELATIVE_TOLERANCE);
        if (n < 31 && (1L << n) <= trials) {
            long patterns = 1L << n;
            long extreme = count(patterns, b -> {
                boolean[] swap = new boolean[n];
                for (int i = 0; i < n; i++) swap[i] = ((b >>> i) & 1L) != 0;
                return swap;
            }, statistic, threshold);
            return new Result(observed, (double) extreme / patterns, patterns, true);
        }
        long extreme = count(trials, b -> {
            SplittableRandom rng = new SplittableRandom(BootstrapEngine.resampleSeed(seed, (int) b));
            boolean[] swap = new boolean[n];
            for (int i = 0; i < n; i++) swap[i] = rng.nextBoolean();
            return swap;
        }, statistic, threshold);
        return new Result(observed, (1.0 + extreme) / (1.0 + trials), trials, false);
    }

    /** The swap pattern of trial (or enumerated pattern) b. */
    private interface Pattern {
        boolean[] of(long b);
    }

    /** Patterns 0..count-1 split into contiguous blocks, one per worker; the count does not depend on the split. */
    private long count(long count, Pattern pattern, SwapStatistic statistic, double threshold) {
        int workers = (int) Math.max(1, Math.min(threads, count));
        if (workers == 1) return countBlock(0, count, pattern, statistic, threshold);
        ExecutorService pool = Executors.newFixedThreadPool(workers, task -> {
            Thread t = new Thread(task, "assay-randomization");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<Long>> blocks = new ArrayList<>();
            for (int w = 0; w < workers; w++) {
                long from = count * w / workers;
                long to = count * (w + 1) / workers;
                blocks.add(pool.submit(() -> countBlock(from, to, pattern, statistic, threshold)));
            }
            long total = 0;
            for (Future<Long> block : blocks) total += block.get();
            return total;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("randomization test interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) throw r;
            throw new IllegalStateException("randomization worker failed", e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private static long countBlock(long from, long to, Pattern pattern, SwapStatistic statistic, double threshold) {
        long extreme = 0;
        for (long b = from; b < to; b++) {
            double d = statistic.swapped(pattern.of(b));
            if (Double.isNaN(d)) {
                throw new IllegalArgumentException("the metric is undefined after swapping some items' outputs (trial "
                        + b + ")");
            }
            if (Math.abs(d) >= threshold) extreme++;
        }
        return extreme;
    }

    public int trials() { return trials; }
}
