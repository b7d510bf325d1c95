package org.assay.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.assay.audit.checks.CheckResult;
import org.assay.audit.checks.ClaimChecker;
import org.assay.claims.ClaimsFile;
import org.assay.claims.ClaimsReader;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * `assay check` on a claims file of 200 claims whose tables have test sets of 1,000 to 100,000
 * items, mixing count metrics, binary F1/precision/recall without a positive count (the O(N)
 * search over every split), ROC AUC with class counts, Recall@K families and summary columns.
 * The reference benchmark reads and validates the same file without checking it, so the result
 * is quoted as a ratio: checking costs X times reading.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class CheckBenchmark {
    Path file;
    ClaimsFile claims;

    @Setup(Level.Trial)
    public void write() throws IOException {
        file = Files.createTempFile("assay-bench-claims", ".yaml");
        Files.writeString(file, claimsYaml(200, new SplittableRandom(7)));
        claims = ClaimsReader.read(file);
        if (claims.allClaims().size() != 200) throw new IllegalStateException("expected 200 claims");
    }

    /** Twenty tables of ten claims each; sizes from 1,000 to 100,000. */
    static String claimsYaml(int total, SplittableRandom rng) {
        StringBuilder y = new StringBuilder("tables:\n");
        int[] sizes = {1000, 2000, 5000, 10000, 20000, 40000, 60000, 80000, 100000, 100000};
        for (int t = 0; t < total / 10; t++) {
            int n = sizes[t % sizes.length];
            int pos = n / 4;
            y.append("  - id: T").append(t).append("\n    test_size: ").append(n)
                    .append("\n    class_counts: {pos: ").append(pos).append(", neg: ").append(n - pos).append("}\n    claims:\n");
            String[] rows = {"Ours", "Baseline"};
            for (String row : rows) {
                double acc = 70 + 25 * rng.nextDouble();
                claim(y, row, "Acc", "accuracy", "{}", fmt(acc, 2), "percent");
                claim(y, row, "F1", "f1", "{}", fmt(0.5 + 0.4 * rng.nextDouble(), 3), "fraction");
                claim(y, row, "P", "precision", "{}", fmt(0.5 + 0.4 * rng.nextDouble(), 3), "fraction");
                claim(y, row, "AUC", "roc_auc", "{}", fmt(0.7 + 0.29 * rng.nextDouble(), 4), "fraction");
                claim(y, row, "R@1", "recall_at_k", "{k: 1}", fmt(acc - 20, 1), "percent");
            }
        }
        return y.toString();
    }

    private static void claim(StringBuilder y, String row, String col, String metric, String params, String value,
                              String scale) {
        y.append("      - {row: ").append(row).append(", column: [").append(col).append("], metric: ").append(metric)
                .append(", params: ").append(params).append(", value: \"").append(value).append("\", scale: ")
                .append(scale).append("}\n");
    }

    private static String fmt(double v, int decimals) { return String.format(Locale.ROOT, "%." + decimals + "f", v); }

    /** Reference: read and validate the claims file. */
    @Benchmark
    public ClaimsFile readClaims() { return ClaimsReader.read(file); }

    /** Read the claims file and run every claim-only check (what `assay check` does before writing). */
    @Benchmark
    public CheckResult readAndCheck() { return new ClaimChecker().check(ClaimsReader.read(file)); }
}
