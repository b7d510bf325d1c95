package org.assay.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.file.Path;
import org.assay.data.retrieval.NpyScoreMatrix;

/**
 * Fuzzes the .npy score-matrix reader: NpyHeader (magic, version, header length, the dict literal) when
 * the file is opened, then every row decoded by scan. The input is the file's bytes.
 */
class NpyScoreMatrixFuzzTest {

    @FuzzTest(maxDuration = "20s")
    void scoreMatrix(byte[] input) {
        Path file = FuzzFiles.write("scores.npy", input);
        ReaderContract.returnsOrRejects(file, () -> {
            NpyScoreMatrix matrix = NpyScoreMatrix.open(file);
            int[] rows = {0};
            matrix.scan((r, row) -> {
                if (row.length != matrix.columns()) throw new AssertionError("row " + r + " has " + row.length + " values");
                rows[0]++;
            });
            if (rows[0] != matrix.rows()) throw new AssertionError("scan visited " + rows[0] + " of " + matrix.rows() + " rows");
        });
    }
}
