package org.assay.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.file.Path;
import org.assay.claims.ClaimsReader;

/**
 * Fuzzes the claims reader in its three formats (YAML, JSON, CSV; the tree readers, their limits, and the
 * mapping to claims with validation). The first input byte picks the format by its value modulo 3
 * ('0': YAML, '1': JSON, '2': CSV), so a seed file is that digit followed by the claims file's text.
 */
class ClaimsFileFuzzTest {
    private static final String[] NAMES = {"claims.yaml", "claims.json", "claims.csv"};

    @FuzzTest(maxDuration = "20s")
    void claimsFile(byte[] input) {
        if (input.length == 0) return;
        Path file = FuzzFiles.write(NAMES[(input[0] & 0xff) % NAMES.length], ReaderContract.afterFirst(input));
        ReaderContract.returnsOrRejects(file, () -> ClaimsReader.read(file));
    }
}
