package org.assay.bench;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.assay.audit.EstimationSettings;
import org.assay.audit.IntervalChoice;
import org.assay.audit.Measurer;
import org.assay.data.EvaluationData;
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
 * Corpus BLEU with a BCa bootstrap interval from 1,000 resamples over 100,000 sentences
 * (`assay measure outputs.jsonl --task generation --metric bleu:tokenize=none --resamples 1000`,
 * the default interval for BLEU being BCa). The reference benchmark scores the corpus once from
 * the same data (tokenizing every sentence and summing its n-gram statistics), so the result reads
 * as "the interval costs X scorings of the corpus"; resampling sentences and re-scoring them would
 * cost B = 1,000.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 4, time = 4)
@Fork(1)
public class BleuBootstrapBenchmark {
    static final int SENTENCES = 100_000;
    static final int RESAMPLES = 1_000;
    static final Map<String, String> PARAMS = Map.of("tokenize", "none");

    EvaluationData data;
    Measurer measurer;
    List<Measurer.MetricRequest> bleu = List.of(new Measurer.MetricRequest("bleu", PARAMS));

    @Setup(Level.Trial)
    public void read() {
        Path jsonl = BenchData.generationJsonl(SENTENCES, 17);
        data = BenchData.readGeneration(jsonl);
        BenchData.delete(jsonl);
        measurer = new Measurer(new EstimationSettings(0.95, RESAMPLES, EstimationSettings.DEFAULT_SEED,
                Runtime.getRuntime().availableProcessors(), IntervalChoice.AUTO));
        org.assay.audit.Measurement m = bleuBootstrap().get(0);
        if (m.n() != SENTENCES || !m.interval().method().contains("BCa")) {
            throw new IllegalStateException("not a BCa interval on " + SENTENCES + " sentences");
        }
    }

    /** Reference: corpus BLEU once (tokenize, count n-grams, one BLEU from the sums). */
    @Benchmark
    public double bleuOnce() {
        return MetricRegistry.get("bleu").prepare(data, PARAMS).value();
    }

    /** Corpus BLEU with its BCa interval from 1,000 resamples of the sentences. */
    @Benchmark
    public List<org.assay.audit.Measurement> bleuBootstrap() {
        return measurer.measure(data, bleu, null);
    }
}
