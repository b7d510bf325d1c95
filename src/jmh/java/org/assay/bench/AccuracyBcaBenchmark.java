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
 * Accuracy with a BCa interval from 10,000 bootstrap resamples on n = 1,000,000 examples, as
 * `assay measure --metric accuracy --interval bca --resamples 10000` computes it (Measurer on the
 * data ClassificationReproduction read). The reference benchmark computes the accuracy once (the
 * registry's prepared metric), so the result reads as "the interval costs X evaluations of the
 * metric"; resampling the data and re-running the metric would cost B = 10,000 evaluations, and
 * SciPy's BCa adds n = 1,000,000 leave-one-out ones.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 4, time = 3)
@Fork(1)
public class AccuracyBcaBenchmark {
    static final int N = 1_000_000;
    static final int RESAMPLES = 10_000;

    EvaluationData data;
    Measurer measurer;
    List<Measurer.MetricRequest> accuracy = List.of(new Measurer.MetricRequest("accuracy", Map.of()));

    @Setup(Level.Trial)
    public void read() {
        Path csv = BenchData.classificationCsv(N, 11);
        data = BenchData.readClassification(csv, ReadOptions.defaults());
        BenchData.delete(csv);
        measurer = new Measurer(new EstimationSettings(0.95, RESAMPLES, EstimationSettings.DEFAULT_SEED,
                Runtime.getRuntime().availableProcessors(), IntervalChoice.BCA));
        org.assay.audit.Measurement m = accuracyBca().get(0);
        if (m.n() != N || !m.interval().method().contains("BCa")) throw new IllegalStateException("not a BCa interval on n = " + N);
    }

    /** Reference: the accuracy once, from the same data. */
    @Benchmark
    public double accuracyOnce() {
        return MetricRegistry.get("accuracy").prepare(data, Map.of()).value();
    }

    /** The accuracy with its BCa interval from 10,000 resamples. */
    @Benchmark
    public List<org.assay.audit.Measurement> accuracyBca() {
        return measurer.measure(data, accuracy, null);
    }
}
