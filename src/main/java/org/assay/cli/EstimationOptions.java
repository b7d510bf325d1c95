package org.assay.cli;

import org.assay.audit.EstimationSettings;
import org.assay.audit.IntervalChoice;
import org.assay.common.UserInputException;
import picocli.CommandLine.Option;

/** Options shared by the commands that compute intervals. */
final class EstimationOptions {
    /** System property read when {@code --threads} is not given. */
    static final String THREADS_PROPERTY = "assay.threads";

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
            description = "Worker threads (default: the system property assay.threads if set, else all cores). "
                    + "Results do not depend on it.")
    Integer threads;

    @Option(names = "--interval", paramLabel = "METHOD", defaultValue = "auto",
            description = "auto (exact for counts, delong for roc_auc, bca otherwise), exact, wald, wilson, "
                    + "clopper-pearson, jeffreys, agresti-coull, delong, percentile, basic, bca.")
    String interval;

    EstimationSettings settings() {
        if (threads != null && threads < 1) {
            throw UserInputException.usage("--threads " + threads + " is not a number of threads",
                    "give --threads a whole number of 1 or more, or leave it out to use all cores");
        }
        int t = threads == null ? defaultThreads() : threads;
        return new EstimationSettings(confidence, resamples, seed, t, IntervalChoice.fromId(interval));
    }

    /**
     * The JVM-wide default, so a machine or a test can pin the thread count without changing the command line
     * ({@code ASSAY_JAVA_OPTS=-Dassay.threads=1}); an unreadable value stops the run rather than being ignored.
     */
    private static int defaultThreads() {
        String set = System.getProperty(THREADS_PROPERTY);
        if (set == null) return Runtime.getRuntime().availableProcessors();
        try {
            int t = Integer.parseInt(set.strip());
            if (t >= 1) return t;
        } catch (NumberFormatException e) {
            // reported below
        }
        throw UserInputException.usage("the system property " + THREADS_PROPERTY + " is \"" + set
                        + "\", not a number of threads",
                "set -D" + THREADS_PROPERTY + " to a whole number of 1 or more, such as 4, or pass --threads");
    }
}
