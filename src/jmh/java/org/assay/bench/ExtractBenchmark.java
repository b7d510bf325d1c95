package org.assay.bench;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.assay.pdf.Extraction;
import org.assay.pdf.TableExtractor;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * `assay extract` on the corpus's 20-page paper with 8 tables (src/test/resources/pdf/long-20pages.pdf):
 * open, read every page's glyphs and rules, find and rebuild the tables. The reference benchmark is
 * PDFBox's own plain-text extraction of the same file (open, PDFTextStripper over all pages), so the
 * result is quoted as a ratio: extracting tables costs X times extracting the text.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ExtractBenchmark {
    static final Path PAPER = Path.of("src/test/resources/pdf/long-20pages.pdf");
    private final TableExtractor extractor = new TableExtractor();

    @Benchmark
    public int extractTables() {
        Extraction x = extractor.extract(PAPER, null, null, null);
        if (x.tables().size() != 8) throw new IllegalStateException("expected 8 tables, got " + x.tables().size());
        return x.tables().stream().mapToInt(t -> t.cells().size()).sum();
    }

    @Benchmark
    public int referencePlainText() throws IOException {
        try (PDDocument doc = Loader.loadPDF(PAPER.toFile())) {
            StringWriter out = new StringWriter();
            new PDFTextStripper().writeText(doc, out);
            return out.getBuffer().length();
        }
    }
}
