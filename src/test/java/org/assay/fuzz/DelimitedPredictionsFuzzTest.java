package org.assay.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.file.Path;
import org.assay.data.ClassificationReader;
import org.assay.data.ReadOptions;

/**
 * Fuzzes the CSV/TSV predictions reader (DelimitedRowSource under ClassificationReader: quoting, ragged
 * rows, duplicate ids, numbers, labels). The first input byte picks the separator (even: comma, odd: tab),
 * so a seed file is one character ('0' or '1') followed by the file's text.
 */
class DelimitedPredictionsFuzzTest {

    @FuzzTest(maxDuration = "20s")
    void predictions(byte[] input) {
        if (input.length == 0) return;
        String name = (input[0] & 1) == 0 ? "predictions.csv" : "predictions.tsv";
        Path file = FuzzFiles.write(name, ReaderContract.afterFirst(input));
        ReaderContract.returnsOrRejects(file, () -> ClassificationReader.read(file, ReadOptions.defaults()));
    }
}
