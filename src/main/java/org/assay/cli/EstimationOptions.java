package org.assay.cli;

import org.assay.audit.EstimationSettings;
import org.assay.audit.IntervalChoice;
import picocli.CommandLine.Option;

/** Options shared by the commands that compute intervals. */
final class EstimationOptions {
    @Option(names = "--confidence", paramLabel = "C", defaultValue = "0.95",
            description = "Confidence level of every interval (default ${DEFAULT-VALUE}).")
    double confidence;

    @Option(names = "--resamples", paramLabel = "B", defaultValue = "10000",
            description = "Bootstrap resamples (default ${DEFAULT-VALUE}).")
    int resamples;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "" + EstimationSettings.DEFAULT_SEED,
            description = "Seed of every random procedure (default ${DEFAULT-VALUE}); printed in reports.")
    long seed;

    @Option(names = "--threads", paramLabel = "T",
            description = "Worker threads (default: all cores). Results do not depend on it.")
    Integer threads;

    @Option(names = "--interval", paramLabel = "METHOD", defaultValue = "auto",
            description = "auto (exact for counts, delong for roc_auc, bca otherwise), exact, wald, wilson, "
                    + "clopper-pearson, jeffreys, agresti-coull, delong, percentile, basic, bca.")
    String interval;

    EstimationSettings settings() {
        int t = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        return new EstimationSettings(confidence, resamples, seed, t, IntervalChoice.fromId(interval));
    }
}
