package org.assay.bench;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.assay.audit.EstimationSettings;
import org.assay.audit.Measurer;
import org.assay.data.retrieval.MatrixRanking;
import org.assay.data.retrieval.RetrievalInput;
import org.assay.data.retrieval.SentinelRule;
import org.assay.data.retrieval.TiePolicy;
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
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Recall@1/5/10 from a 5,000 x 25,000 float32 score matrix (500 MB; candidate j relevant to query
 * j / 5), as `assay measure --task retrieval --scores m.npy --group-size 5 --metric recall_at_k
 * --k 1,5,10` computes them: the .npy file read and ranked row by row (RetrievalInput), then the
 * three hit rates with exact intervals (Measurer). The matrix is written to a temporary file at
 * setup and deleted at the end. The reference benchmark reads the same file into a 1 MiB buffer
 * and does nothing with it (what `cat FILE > /dev/null` does), so the result reads as "X times
 * the cost of reading the file". Both read from the page cache once the first iteration ran.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 4, time = 4)
@Fork(value = 1, jvmArgsAppend = "-Xmx1g")
public class RecallAtKBenchmark {
    static final int QUERIES = 5_000;

    Path npy;
    RetrievalInput input;
    Measurer measurer;
    List<Measurer.MetricRequest> recall = List.of(
            new Measurer.MetricRequest("recall_at_k", Map.of("k", "1")),
            new Measurer.MetricRequest("recall_at_k", Map.of("k", "5")),
            new Measurer.MetricRequest("recall_at_k", Map.of("k", "10")));

    @Setup(Level.Trial)
    public void write() {
        npy = BenchData.scoreMatrixNpy(QUERIES, 19);
        input = new RetrievalInput("rows", npy, MatrixRanking.Side.ROWS, null, null, false, 5, TiePolicy.PESSIMISTIC,
                SentinelRule.detect());
        measurer = new Measurer(EstimationSettings.defaults());
        if (recallAtK().get(0).n() != QUERIES) throw new IllegalStateException("expected " + QUERIES + " queries");
    }

    @TearDown(Level.Trial)
    public void delete() { BenchData.delete(npy); }

    /** Reference: read every byte of the file, as cat does. */
    @Benchmark
    public long readFile() {
        long total = 0;
        ByteBuffer buf = ByteBuffer.allocateDirect(1 << 20);
        try (FileChannel in = FileChannel.open(npy, StandardOpenOption.READ)) {
            for (int r; (r = in.read(buf)) > 0; buf.clear()) total += r;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return total;
    }

    /** Read and rank the matrix, then Recall@1, @5 and @10 with their intervals. */
    @Benchmark
    public List<org.assay.audit.Measurement> recallAtK() {
        return measurer.measure(input.read(), recall, null);
    }
}
