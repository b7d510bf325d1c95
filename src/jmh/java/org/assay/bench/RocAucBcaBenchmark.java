package org.assay.bench;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.assay.audit.EstimationSettings;
import org.assay.audit.IntervalChoice;
import org.assay.audit.Measurer;
import org.assay.data.EvaluationData;
import org.assay.data.ReadOptions;
import org.assay.metrics.MetricRegistry;
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
 * ROC AUC with a BCa interval from 2,000 bootstrap resamples on n = 100,000 examples
 * (`assay measure --metric roc_auc --positive 1 --interval bca --resamples 2000`). The reference
 * benchmark computes the AUC once from the same data (sort and one pass), so the result reads as
 * "the interval costs X evaluations of the metric"; re-running the metric per resample would cost
 * B = 2,000, and a leave-one-out jackknife n = 100,000 more.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 4, time = 4)
@Fork(1)
public class RocAucBcaBenchmark {
    static final int N = 100_000;
    static final int RESAMPLES = 2_000;

    EvaluationData data;
    Measurer measurer;
    List<Measurer.MetricRequest> auc = List.of(new Measurer.MetricRequest("roc_auc", Map.of()));

    @Setup(Level.Trial)
    public void read() {
        Path csv = BenchData.classificationCsv(N, 13);
        data = BenchData.readClassification(csv, ReadOptions.defaults().withPositive("1"));
        BenchData.delete(csv);
        measurer = new Measurer(new EstimationSettings(0.95, RESAMPLES, EstimationSettings.DEFAULT_SEED,
                Runtime.getRuntime().availableProcessors(), IntervalChoice.BCA));
        org.assay.audit.Measurement m = aucBca().get(0);
        if (m.n() != N || !m.interval().method().contains("BCa")) throw new IllegalStateException("not a BCa interval on n = " + N);
    }

    /** Reference: the AUC once (the prepared metric sorts the scores, then one pass). */
    @Benchmark
    public double aucOnce() {
        return MetricRegistry.get("roc_auc").prepare(data, Map.of()).value();
    }

    /** The AUC with its BCa interval from 2,000 resamples (placement-value jackknife). */
    @Benchmark
    public List<org.assay.audit.Measurement> aucBca() {
        return measurer.measure(data, auc, null);
    }
}
