package org.assay.cli;

import java.nio.file.Path;
import org.assay.data.ReadOptions;
import picocli.CommandLine.Option;

/** How to read a predictions file: column names, positive class, manifest, ground truth. */
final class ColumnOptions {
    @Option(names = "--id-column", paramLabel = "NAME", defaultValue = "id", description = "Id column (default ${DEFAULT-VALUE}).")
    String id;

    @Option(names = "--label-column", paramLabel = "NAME", defaultValue = "label",
            description = "True-label column (default ${DEFAULT-VALUE}).")
    String label;

    @Option(names = "--prediction-column", paramLabel = "NAME", defaultValue = "prediction",
            description = "Predicted-label column (default ${DEFAULT-VALUE}).")
    String prediction;

    @Option(names = "--score-column", paramLabel = "NAME", defaultValue = "score",
            description = "Positive-class score column (default ${DEFAULT-VALUE}).")
    String score;

    @Option(names = "--probability-prefix", paramLabel = "PREFIX", defaultValue = "p_",
            description = "Prefix of per-class probability columns (default ${DEFAULT-VALUE}).")
    String probabilityPrefix;

    @Option(names = "--positive", paramLabel = "CLASS", description = "The positive class of binary metrics.")
    String positive;

    @Option(names = "--manifest", paramLabel = "FILE", description = "Subsample manifest: the ids evaluated, one per line.")
    Path manifest;

    @Option(names = "--truth", paramLabel = "FILE", description = "Ground truth (id and label columns) for the full test set.")
    Path truth;

    ReadOptions readOptions() {
        return new ReadOptions(id, label, prediction, score, probabilityPrefix, positive, manifest, truth);
    }
}
