package org.assay.pdf;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.common.PDStream;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * PDFs built to hang or crash a reader (made here with PDFBox, not committed): a form XObject that
 * draws itself, and a page that repeats one operator millions of times. Each must end in one
 * clear error naming the page, never a hang or a stack trace (common practice for untrusted files).
 */
class HostilePdfTest {
    @TempDir Path tmp;

    @Test
    void aFormThatDrawsItselfEndsWithAnErrorOrIsSkipped() throws Exception {
        Path pdf = tmp.resolve("loop.pdf");
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(PDRectangle.LETTER);
            doc.addPage(page);
            PDFormXObject form = new PDFormXObject(new PDStream(doc));
            form.setBBox(new PDRectangle(0, 0, 100, 100));
            PDResources res = new PDResources();
            res.put(COSName.getPDFName("Fx"), form); // the form's resources name the form itself
            form.setResources(res);
            try (OutputStream os = form.getContentStream().createOutputStream()) {
                os.write("0 0 m 10 10 l S /Fx Do".getBytes(StandardCharsets.US_ASCII));
            }
            PDResources pageRes = new PDResources();
            pageRes.put(COSName.getPDFName("Fx"), form);
            page.setResources(pageRes);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                cs.beginText();
                cs.setFont(new PDType1Font(Standard14Fonts.FontName.HELVETICA), 10);
                cs.newLineAtOffset(72, 700);
                cs.showText("Table 1: a table that never ends");
                cs.endText();
                cs.drawForm(form);
            }
            doc.save(pdf.toFile());
        }
        long start = System.nanoTime();
        try {
            Extraction x = new TableExtractor().extract(pdf, null, null, null);
            assertThat(x.tables()).isEmpty(); // PDFBox refused the recursion; the caption has no body
        } catch (UserInputException e) {
            assertThat(e.getMessage()).contains("loop.pdf").contains("page 1");
        }
        assertThat((System.nanoTime() - start) / 1e9).as("seconds").isLessThan(30); // a bound, not a timing
    }

    @Test
    void aPageOfMillionsOfOperatorsIsStoppedByTheBudget() throws Exception {
        Path pdf = tmp.resolve("bloat.pdf");
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(PDRectangle.LETTER);
            doc.addPage(page);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                cs.beginText();
                cs.setFont(new PDType1Font(Standard14Fonts.FontName.HELVETICA), 10);
                cs.newLineAtOffset(72, 700);
                cs.showText("Table 1: results");
                cs.endText();
                for (int i = 0; i < 200_000; i++) cs.saveGraphicsState();
                for (int i = 0; i < 200_000; i++) cs.restoreGraphicsState();
            }
            doc.save(pdf.toFile());
        }
        PdfLimits tight = new PdfLimits(PdfLimits.DEFAULT.maxBytes(), PdfLimits.DEFAULT.inMemoryBytes(),
                PdfLimits.DEFAULT.maxPages(), 100_000, PdfLimits.DEFAULT.millisPerPage());
        assertThatThrownBy(() -> new TableExtractor(tight).extract(pdf, null, null, null))
                .isInstanceOf(UserInputException.class)
                .hasMessageContaining("bloat.pdf, page 1").hasMessageContaining("more than 100000 drawing operators");
    }

    @Test
    void aPageTreeThatLoopsBackToItsRootNamesThePageItCannotReach() {
        // made by org.assay.cli.BadPdfs: the root's second kid is a node whose only kid is the root
        Path pdf = Path.of("src/test/resources/bad/pdf/page-tree-cycle.pdf");
        assertThatThrownBy(() -> new TableExtractor().extract(pdf, null, null, null))
                .isInstanceOfSatisfying(UserInputException.class, e -> {
                    assertThat(e.position()).isEqualTo("page 2");
                    assertThat(e.problem()).startsWith("the page cannot be read").contains("recursion");
                    assertThat(e.fix()).contains("--pages");
                });
        // the page before the loop still reads
        assertThat(new TableExtractor().extract(pdf, null, PageSelection.parse("1"), null).pagesRead()).isEqualTo(1);
    }
}
