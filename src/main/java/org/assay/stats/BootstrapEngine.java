package org.assay.stats;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Supplier;
import org.assay.common.Progress;
import org.assay.common.UserInputException;

/**
 * Seeded nonparametric bootstrap (Efron 1979, Ann. Statist. 7:1-26) over a statistic's
 * resampling units.
 *
 * <p>A resample is a vector of integer weights: n units drawn uniformly with replacement and
 * counted (multinomial counts summing to n), never a copy of the data (DESIGN.md principle 1).
 * Resample b draws its weights from a {@link SplittableRandom} seeded only by (seed, b), so
 * the replicates are bit-identical for any thread count (principle 5). A statistic of category
 * counts ({@link CategoryCounts}) is resampled through those counts, and a proportion through
 * its success count ({@link #runCount}): the same multinomial, drawn without n weights. Work is split into
 * contiguous blocks of resamples, one per thread; each thread reuses one weight buffer.
 *
 * <p>Limits: 100 &le; resamples &le; 10,000,000 (fewer than 100 cannot place a 95% endpoint
 * away from the extreme order statistics; the upper bound keeps the replicate array under
 * 80 MB); threads &ge; 1; any seed. A statistic needs at least 2 units: with one unit every
 * resample is the data itself and the bootstrap says nothing about its variability.
 */
public final class BootstrapEngine {
    static final int MIN_RESAMPLES = 100;
    static final int MAX_RESAMPLES = 10_000_000;

    /** Replicates a worker finishes before it reports progress: reporting stays rare next to the work. */
    private static final int REPORT_EVERY = 64;

    private final int resamples;
    private final long seed;
    private final int threads;
    private Progress progress = Progress.NONE;
    private String label = "resampling";

    public BootstrapEngine(int resamples, long seed, int threads) {
        if (resamples < MIN_RESAMPLES || resamples > MAX_RESAMPLES) {
            throw UserInputException.usage("bootstrap resamples must be between " + MIN_RESAMPLES
                    + " and " + MAX_RESAMPLES + ", got " + resamples,
                    "use e.g. 2000 resamples for intervals, 10000 for p-values");
        }
        if (threads < 1) {
            throw UserInputException.usage("bootstrap threads must be at least 1, got " + threads,
                    "use 1 thread, or the number of processor cores");
        }
        this.resamples = resamples;
        this.seed = seed;
        this.threads = threads;
    }

    /**
     * Bootstraps {@code statistic} with multinomial integer weights; the BCa acceleration
     * comes from {@link Resampled#jackknife()}.
     *
     * @throws UserInputException when the statistic has fewer than 2 units
     * @throws IllegalArgumentException when the statistic is not finite on the data or on a
     *     resample (naming the resample), or its jackknife has the wrong length
     */
    public BootstrapDistribution run(Resampled statistic) {
        if (statistic instanceof CategoryCounts counts) return runCategories(counts);
        int n = statistic.units();
        requireUnits(n);
        double estimate = statistic.estimate();
        requireFinite(estimate, "the statistic on the full data");
        double[] leaveOneOut = statistic.jackknife();
        if (leaveOneOut.length != n) {
            throw new IllegalArgumentException("jackknife has " + leaveOneOut.length
                    + " values for " + n + " units");
        }
        double acceleration = BootstrapAcceleration.fromJackknife(leaveOneOut);
        double[] replicates = replicate(affordableWorkers(4L * n), () -> {
            int[] weights = new int[n]; // one buffer per worker, reused for every resample
            return rng -> {
                Arrays.fill(weights, 0);
                for (int draw = 0; draw < n; draw++) weights[rng.nextInt(n)]++;
                return statistic.value(weights);
            };
        });
        return new BootstrapDistribution(estimate, replicates, acceleration, n, false, false);
    }

    /**
     * The stratified bootstrap: each resample draws, within every stratum, as many units as the
     * stratum has, with replacement (Efron & Tibshirani 1993, An Introduction to the Bootstrap,
     * §3.6's two-sample case generalised to strata), so each stratum keeps its share of the sample
     * as a stratified draw does. The estimate is unchanged (a proportional allocation is
     * self-weighting); only the spread reflects the design. The BCa acceleration uses the
     * ordinary jackknife over all units.
     *
     * @param stratumOf each unit's stratum, 0..S-1
     */
    public BootstrapDistribution runStratified(Resampled statistic, int[] stratumOf) {
        int n = statistic.units();
        requireUnits(n);
        if (stratumOf.length != n) throw new IllegalArgumentException(stratumOf.length + " strata for " + n + " units");
        int strata = Arrays.stream(stratumOf).max().orElse(0) + 1;
        int[] size = new int[strata];
        for (int s : stratumOf) size[s]++;
        int[][] members = new int[strata][];
        int[] fill = new int[strata];
        for (int h = 0; h < strata; h++) members[h] = new int[size[h]];
        for (int i = 0; i < n; i++) members[stratumOf[i]][fill[stratumOf[i]]++] = i;
        double estimate = statistic.estimate();
        requireFinite(estimate, "the statistic on the full data");
        double acceleration = BootstrapAcceleration.fromJackknife(statistic.jackknife());
        double[] replicates = replicate(affordableWorkers(4L * n), () -> {
            int[] weights = new int[n];
            return rng -> {
                Arrays.fill(weights, 0);
                for (int[] m : members) {
                    for (int draw = 0; draw < m.length; draw++) weights[m[rng.nextInt(m.length)]]++;
                }
                return statistic.value(weights);
            };
        });
        return new BootstrapDistribution(estimate, replicates, acceleration, n, false, false);
    }

    /**
     * Bootstraps the proportion {@code successes / trials} of 0/1 values without building
     * weights. Resampling n such values with replacement makes the resampled count
     * Binomial(n, k/n), so each replicate is one exact draw of that count (by inverse CDF,
     * see {@link BootstrapBinomialSampler}) divided by n. The jackknife is closed-form:
     * leaving out one of the k successes gives (k-1)/(n-1), leaving out one of the n-k
     * failures gives k/(n-1), each with that multiplicity.
     *
     * <p>When k = 0 or k = n every replicate equals the estimate (zero-width intervals).
     *
     * @throws UserInputException when trials &lt; 2, trials exceeds 2^31-1, or successes is
     *     outside [0, trials]
     */
    public BootstrapDistribution runCount(long successes, long trials) {
        if (trials > Integer.MAX_VALUE) {
            throw UserInputException.usage("count bootstrap supports at most " + Integer.MAX_VALUE
                    + " trials, got " + trials, "use a subsample");
        }
        requireUnits(trials);
        if (successes < 0 || successes > trials) {
            throw UserInputException.usage("successes " + successes + " is outside [0, " + trials + "]",
                    "check the counts passed to the bootstrap");
        }
        int n = (int) trials;
        int k = (int) successes;
        double estimate = (double) k / n;
        double acceleration = BootstrapAcceleration.fromWeighted(
                new double[] {(k - 1.0) / (n - 1), (double) k / (n - 1)},
                new long[] {k, n - k});
        double[] replicates;
        if (k == 0 || k == n) {
            replicates = new double[resamples];
            Arrays.fill(replicates, estimate);
        } else {
            BootstrapBinomialSampler sampler = new BootstrapBinomialSampler(n, estimate);
            replicates = replicate(threads, () -> rng -> (double) sampler.draw(rng) / n);
        }
        return new BootstrapDistribution(estimate, replicates, acceleration, n, true, false);
    }

    /**
     * Bootstraps a statistic of category counts: n units resampled with replacement fall into
     * the categories as Multinomial(n, c_j / n) for observed counts c_j, drawn as a chain of
     * conditional binomials (category j gets Binomial(units left, c_j / units in categories j and
     * later), by exact inversion, {@link BinomialInversion}). The jackknife is closed-form: leaving
     * out a unit of category j gives the statistic at c - e_j, with multiplicity c_j.
     */
    private BootstrapDistribution runCategories(CategoryCounts statistic) {
        int n = statistic.units();
        requireUnits(n);
        long[] counts = statistic.categoryCounts();
        long total = 0;
        for (long c : counts) {
            if (c < 0) throw new IllegalArgumentException("negative category count " + c);
            total += c;
        }
        if (total != n) throw new IllegalArgumentException("category counts sum to " + total + ", not " + n);
        double estimate = statistic.estimate();
        requireFinite(estimate, "the statistic on the full data");
        double[] leaveOneOut = new double[counts.length];
        double[] work = new double[counts.length];
        for (int j = 0; j < counts.length; j++) work[j] = counts[j];
        for (int j = 0; j < counts.length; j++) {
            if (counts[j] == 0) continue;
            work[j] -= 1;
            leaveOneOut[j] = statistic.valueOfCounts(work);
            work[j] += 1;
        }
        double acceleration = BootstrapAcceleration.fromWeighted(leaveOneOut, counts);
        double[] replicates = replicate(threads, () -> {
            double[] drawn = new double[counts.length];   // one buffer per worker
            return rng -> {
                int left = n;
                long inRest = n;   // observed units in categories j and later
                for (int j = 0; j < counts.length; j++) {
                    int x = left == 0 || counts[j] == 0 ? 0
                            : counts[j] == inRest ? left
                            : BinomialInversion.inverse(left, (double) counts[j] / inRest, rng.nextDouble());
                    drawn[j] = x;
                    left -= x;
                    inRest -= counts[j];
                }
                return statistic.valueOfCounts(drawn);
            };
        });
        return new BootstrapDistribution(estimate, replicates, acceleration, n, false, false, true);
    }

    /**
     * Reports each run's resamples to {@code progress} under {@code label} ("resampling macro_f1");
     * the replicates do not depend on it. Returns this engine.
     */
    public BootstrapEngine reportingTo(Progress progress, String label) {
        this.progress = progress;
        this.label = label;
        return this;
    }

    public int resamples() { return resamples; }

    public long seed() { return seed; }

    public int threads() { return threads; }

    /** One replicate from a generator that belongs to one resample. */
    private interface Replicate {
        double next(SplittableRandom rng);
    }

    /**
     * How many of the requested threads can each hold a buffer of {@code bytes}: at most half the
     * heap still free. Ten million units take 40 MB of weights per worker, so sixteen cores would
     * need 640 MB; the replicates do not depend on the number of workers, so fewer only takes longer.
     */
    private int affordableWorkers(long bytes) {
        Runtime runtime = Runtime.getRuntime();
        long free = runtime.maxMemory() - (runtime.totalMemory() - runtime.freeMemory());
        return (int) Math.max(1, Math.min(threads, free / 2 / Math.max(1, bytes)));
    }

    /** Fills replicates[b] for every b; each worker gets its own Replicate (and buffer). */
    private double[] replicate(int maxWorkers, Supplier<Replicate> perWorker) {
        double[] out = new double[resamples];
        int workers = Math.min(maxWorkers, resamples);
        try (Progress.Task task = progress.start(label, resamples)) {
            if (workers == 1) {
                fill(out, 0, resamples, perWorker.get(), task);
                return out;
            }
            fillInParallel(out, workers, perWorker, task);
        }
        return out;
    }

    private void fillInParallel(double[] out, int workers, Supplier<Replicate> perWorker, Progress.Task task) {
        ExecutorService pool = Executors.newFixedThreadPool(workers, runnable -> {
            Thread t = new Thread(runnable, "assay-bootstrap");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> blocks = new ArrayList<>();
            for (int w = 0; w < workers; w++) {
                int from = (int) ((long) resamples * w / workers);
                int to = (int) ((long) resamples * (w + 1) / workers);
                blocks.add(pool.submit(() -> fill(out, from, to, perWorker.get(), task)));
            }
            for (Future<?> block : blocks) block.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("bootstrap interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) throw r;
            throw new IllegalStateException("bootstrap worker failed", e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private void fill(double[] out, int from, int to, Replicate replicate, Progress.Task task) {
        for (int b = from; b < to; b++) {
            double value = replicate.next(new SplittableRandom(resampleSeed(seed, b)));
            requireFinite(value, "bootstrap resample " + b);
            out[b] = value;
            if ((b - from + 1) % REPORT_EVERY == 0) task.advance(REPORT_EVERY);
        }
        task.advance((to - from) % REPORT_EVERY);
    }

    /**
     * Seed of resample b: the b-th output of a SplittableRandom-style stream (golden-ratio
     * increment, then the MurmurHash3/Stafford "mix13" finaliser that SplittableRandom uses
     * internally; written out because the JDK does not expose it). Depends on (seed, b) only.
     */
    static long resampleSeed(long seed, int b) {
        return mix64(mix64(seed) + 0x9E3779B97F4A7C15L * (b + 1L));
    }

    private static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    private static void requireUnits(long n) {
        if (n < 2) {
            throw UserInputException.usage("the bootstrap needs at least 2 resampling units, got " + n,
                    "evaluate more items, or report the single value without an interval");
        }
    }

    private static void requireFinite(double value, String what) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("statistic is not finite (" + value + ") on " + what
                    + "; the metric must define its value for every resample");
        }
    }
}
