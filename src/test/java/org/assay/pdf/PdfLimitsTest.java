package org.assay.pdf;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;

/**
 * The limits against hostile PDFs end reading with one clear error (common practice: bound pages,
 * bytes, work and time per page for untrusted documents). Tight limits on the corpus papers stand
 * in for files built to exceed the defaults.
 */
class PdfLimitsTest {
    private static final Path LONG = CorpusExtractionTest.CORPUS.resolve("long-20pages.pdf");

    @Test
    void tooManyPagesIsRefusedBeforeAnyPageIsRead() {
        PdfLimits limits = new PdfLimits(PdfLimits.DEFAULT.maxBytes(), PdfLimits.DEFAULT.inMemoryBytes(), 10,
                PdfLimits.DEFAULT.maxOperatorsPage(), PdfLimits.DEFAULT.millisPerPage());
        assertThatThrownBy(() -> new PdfDocumentReader(limits).read(LONG, null, null))
                .isInstanceOf(UserInputException.class)
                .hasMessageContaining("long-20pages.pdf").hasMessageContaining("20 pages (limit pdf-pages is 10)").hasMessageContaining("--limit pdf-pages=N");
    }

    @Test
    void aPageWithTooMuchDrawingIsStoppedAndNamed() {
        PdfLimits limits = new PdfLimits(PdfLimits.DEFAULT.maxBytes(), PdfLimits.DEFAULT.inMemoryBytes(),
                PdfLimits.DEFAULT.maxPages(), 50, PdfLimits.DEFAULT.millisPerPage());
        assertThatThrownBy(() -> new PdfDocumentReader(limits).read(LONG, null, null))
                .isInstanceOf(UserInputException.class)
                .hasMessageContaining("page 1").hasMessageContaining("more than 50 drawing operators")
                .hasMessageContaining("--pages");
    }

    @Test
    void aFileOverTheSizeLimitIsRefusedUnread() {
        PdfLimits limits = new PdfLimits(1024, 512, 100, 1000, 1000);
        assertThatThrownBy(() -> new PdfDocumentReader(limits).read(LONG, null, null))
                .isInstanceOf(UserInputException.class).hasMessageContaining("(limit pdf-bytes is 1024)").hasMessageContaining("--limit pdf-bytes=N");
    }

    @Test
    void largeFilesAreParsedWithTheTempFileCacheAndGiveTheSameTables() {
        // inMemoryBytes of 1 byte sends every file through PDFBox's temp-file stream cache.
        PdfLimits onDisk = new PdfLimits(PdfLimits.DEFAULT.maxBytes(), 1, PdfLimits.DEFAULT.maxPages(),
                PdfLimits.DEFAULT.maxOperatorsPage(), PdfLimits.DEFAULT.millisPerPage());
        Path pdf = CorpusExtractionTest.CORPUS.resolve("multirow-groups.pdf");
        Extraction a = new TableExtractor(onDisk).extract(pdf, null, null, null);
        Extraction b = new TableExtractor().extract(pdf, null, null, null);
        assertThat(a.tables()).hasSize(2);
        assertThat(a.tables().get(0).cells()).hasSameSizeAs(b.tables().get(0).cells());
        assertThat(a.tables().get(0).rows()).isEqualTo(b.tables().get(0).rows());
    }

    @Test
    void pageListsAreParsedAndChecked() {
        assertThat(PageSelection.parse("1,4-6").resolve(10, LONG)).containsExactly(1, 4, 5, 6);
        assertThatThrownBy(() -> PageSelection.parse("3-x")).isInstanceOf(UserInputException.class)
                .hasMessageContaining("not a page list");
        assertThatThrownBy(() -> PageSelection.parse("5-2").resolve(10, LONG)).isInstanceOf(UserInputException.class);
    }
}
