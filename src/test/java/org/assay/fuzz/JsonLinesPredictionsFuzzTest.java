package org.assay.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.file.Path;
import org.assay.data.ClassificationReader;
import org.assay.data.ReadOptions;

/**
 * Fuzzes the JSON Lines predictions reader (JsonLinesRowSource under ClassificationReader: one object per
 * line, the nested probabilities object, strict numbers). The input is the file's bytes.
 */
class JsonLinesPredictionsFuzzTest {

    @FuzzTest(maxDuration = "20s")
    void predictions(byte[] input) {
        Path file = FuzzFiles.write("predictions.jsonl", input);
        ReaderContract.returnsOrRejects(file, () -> ClassificationReader.read(file, ReadOptions.defaults()));
    }
}
