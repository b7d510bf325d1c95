package org.assay.cli;

import java.nio.file.Path;
import java.util.List;
import org.assay.audit.ClassificationReproduction;
import org.assay.audit.GenerationReproduction;
import org.assay.audit.RegressionReproduction;
import org.assay.audit.Reproduction;
import org.assay.common.UserInputException;
import org.assay.data.regression.RegressionColumns;
import org.assay.metrics.Task;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Where a task's outputs are and how to read them: the options `measure` shares across tasks. */
final class TaskInputs {
    @Mixin ColumnOptions columns;

    @Mixin RetrievalOptions retrieval;

    @Option(names = "--references", paramLabel = "FILE", split = ",",
            description = "Generation: reference files, one per reference set, aligned line by line with a "
                    + "plain-text hypotheses FILE (not needed for a .jsonl FILE, which holds its references).")
    List<Path> references;

    @Option(names = "--target-column", paramLabel = "NAME", defaultValue = "target",
            description = "Regression: true-value column (default ${DEFAULT-VALUE}).")
    String target;

    /** The outputs to read for a task, as one reproduction with no table or row. */
    Reproduction reproduction(Task task, Path file) {
        return reproduction(task, file, null, null);
    }

    /** The outputs to read for a task, reproducing {@code row} of claims table {@code table} (null: the only one). */
    Reproduction reproduction(Task task, Path file, String table, String row) {
        return switch (task) {
            case CLASSIFICATION -> new ClassificationReproduction(table, row, required(file, task), columns.readOptions());
            case REGRESSION -> new RegressionReproduction(table, row, required(file, task),
                    new RegressionColumns(columns.id, target, columns.prediction));
            case RETRIEVAL -> {
                if (file != null) {
                    throw UserInputException.usage("retrieval reads --scores or --ranked, not a predictions file (" + file + ")",
                            "give the score matrix with --scores FILE");
                }
                yield retrieval.reproduction(table, row, columns.manifest);
            }
            case GENERATION -> new GenerationReproduction(table, row, required(file, task),
                    references == null ? List.of() : references, columns.manifest);
        };
    }

    /** Whether the reproduction has parts that serve only the claims under a column prefix (two directions). */
    boolean needsColumnPrefixes(Task task) {
        return task == Task.RETRIEVAL && retrieval.bothDirections();
    }

    private static Path required(Path file, Task task) {
        if (file == null) {
            throw UserInputException.usage("no predictions file given", "name the " + task.id() + " predictions file");
        }
        return file;
    }
}
