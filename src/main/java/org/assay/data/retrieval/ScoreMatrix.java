package org.assay.data.retrieval;

import java.nio.file.Path;
import java.util.List;

/**
 * A query x candidate score matrix that can be read row by row, as often as needed, without
 * holding the whole matrix: the transposed direction reads it twice.
 */
public interface ScoreMatrix {
    /** Receives one row at a time; the array is reused between calls, so copy what you keep. */
    @FunctionalInterface
    interface RowVisitor {
        void row(int index, double[] scores);
    }

    Path file();

    int rows();

    int columns();

    /** Candidate ids from the file (a CSV header), or null when the file names none. */
    List<String> columnIds();

    /** Reads every row in order. Scores are checked: NaN is a user error naming the cell. */
    void scan(RowVisitor visitor);
}
