package org.assay.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.file.Path;
import org.assay.pdf.PdfDocumentReader;
import org.assay.pdf.PdfLimits;

/**
 * Fuzzes PdfDocumentReader (PDFBox loading plus the glyph and rule collectors) on mutated PDF bytes. The
 * limits are small so that one input cannot take long: 1 MiB, 20 pages, 200,000 operators and one second
 * per page. The input is the file's bytes.
 */
class PdfDocumentFuzzTest {
    private static final PdfLimits SMALL = new PdfLimits(1 << 20, 1 << 20, 20, 200_000, 1_000);

    @FuzzTest(maxDuration = "20s")
    void document(byte[] input) {
        Path file = FuzzFiles.write("paper.pdf", input);
        ReaderContract.returnsOrRejects(file, () -> new PdfDocumentReader(SMALL).read(file, null, null));
    }
}
