package org.assay.data;

import java.nio.file.Path;
import java.util.List;

/**
 * What every task's reproduced outputs have in common: where they were read from, how many
 * resampling units they hold (examples, queries, sentences), and warnings met while reading.
 */
public interface EvaluationData {
    Path source();

    /** Resampling units: examples for classification and regression, queries for retrieval, items for generation. */
    int size();

    List<String> warnings();
}
