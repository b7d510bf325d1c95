package org.assay.pdf;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.io.IOUtils;
import org.apache.pdfbox.io.RandomAccessReadBufferedFile;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.encryption.InvalidPasswordException;
import org.assay.common.UserInputException;

/**
 * Opens a PDF with the limits of {@link PdfLimits} and reads the selected pages' glyphs and rules.
 * Every way a file can be unreadable ends in one {@link UserInputException} naming the file.
 */
public final class PdfDocumentReader {
    /**
     * PDFBox logs every glyph without a Unicode mapping (picture-mode line fonts, say) through
     * java.util.logging; those are not the user's problem, and errors reach them as exceptions anyway.
     * Held in fields so the logger settings are not garbage-collected.
     */
    private static final java.util.logging.Logger PDFBOX_LOG = quiet("org.apache.pdfbox");
    private static final java.util.logging.Logger FONTBOX_LOG = quiet("org.apache.fontbox");

    private final PdfLimits limits;
    private String lastTitle;

    public PdfDocumentReader(PdfLimits limits) { this.limits = limits; }

    public PdfDocumentReader() { this(PdfLimits.current()); }

    private static java.util.logging.Logger quiet(String name) {
        java.util.logging.Logger log = java.util.logging.Logger.getLogger(name);
        log.setLevel(java.util.logging.Level.OFF);
        return log;
    }

    /** The title in the document information of the last PDF read, or null. */
    public String lastTitle() { return lastTitle; }

    /** The document's pages as selected (null selects all), each with its glyphs and rules. */
    public List<PageContent> read(Path file, String password, PageSelection pages) {
        return read(file, password, pages, org.assay.common.Progress.NONE);
    }

    /** As {@link #read(Path, String, PageSelection)}, reporting each page read to {@code progress}. */
    public List<PageContent> read(Path file, String password, PageSelection pages, org.assay.common.Progress progress) {
        checkFile(file);
        try (PDDocument doc = load(file, password)) {
            String title = doc.getDocumentInformation() == null ? null : doc.getDocumentInformation().getTitle();
            lastTitle = title == null || title.isBlank() ? null : title.strip();
            int count = doc.getNumberOfPages();
            if (count > limits.maxPages()) {
                throw new UserInputException(file, null, "the PDF has " + count + " pages (limit pdf-pages is "
                        + limits.maxPages() + ")", "extract the pages with the tables into a smaller PDF, or raise the"
                        + " limit with --limit pdf-pages=N");
            }
            List<Integer> selected = pages == null ? PageSelection.all(count) : pages.resolve(count, file);
            List<PageContent> out = new ArrayList<>();
            GlyphCollector glyphs = new GlyphCollector();
            try (org.assay.common.Progress.Task task = progress.start("reading pages of " + file.getFileName(),
                    selected.size())) {
                for (int p : selected) {
                    out.add(readPage(file, doc, glyphs, p));
                    task.advance(1);
                }
            }
            if (out.stream().allMatch(pc -> pc.glyphs().stream().allMatch(Glyph::isSpace))) {
                throw new UserInputException(file, null, "the PDF has no text layer (a scan?)",
                        "type the claims in, or run OCR first");
            }
            return out;
        } catch (InvalidPasswordException e) {
            throw new UserInputException(file, null, password == null ? "the PDF is encrypted" : "the password is wrong",
                    password == null ? "give its password with --password" : "check the password given with --password");
        } catch (IOException | RuntimeException e) {
            if (e instanceof UserInputException u) throw u;
            throw new UserInputException(file, null, "the PDF is damaged and cannot be read ("
                    + shortReason(e) + ")", "download it again or re-save it from a PDF viewer", e);
        }
    }

    private PageContent readPage(Path file, PDDocument doc, GlyphCollector glyphs, int p) throws IOException {
        try {
            PDPage page = doc.getPage(p - 1);
            PDRectangle box = page.getCropBox();
            PageBudget budget = new PageBudget(limits.maxOperatorsPage(), limits.millisPerPage());
            List<Glyph> g = glyphs.collect(doc, p, budget);
            List<Rule> r = new RuleCollector(page, budget).collect();
            return new PageContent(p, box.getWidth(), box.getHeight(), g, r);
        } catch (PageBudget.Exceeded e) {
            throw new UserInputException(file, "page " + p, "reading the page exceeded " + e.getMessage()
                    + " (a looping or bloated content stream; limit " + e.limit().key() + ")",
                    "use --pages to skip this page, or if the page is genuine raise the limit with --limit "
                            + e.limit().key() + "=N");
        } catch (StackOverflowError e) {
            throw new UserInputException(file, "page " + p, "the page's content is nested too deeply to read",
                    "use --pages to skip this page");
        } catch (IOException | RuntimeException e) {
            // A page the document cannot give (a page tree that loops back on itself, a broken page
            // object) is named, so the user can skip it; the other pages may still be fine.
            if (e instanceof UserInputException u) throw u;
            throw new UserInputException(file, "page " + p, "the page cannot be read (" + shortReason(e) + ")",
                    "use --pages to skip this page, or re-save the PDF from a PDF viewer", e);
        }
    }

    private PDDocument load(Path file, String password) throws IOException {
        long size = Files.size(file);
        // Large files keep PDFBox's stream buffers on disk so memory stays bounded.
        var cache = size > limits.inMemoryBytes() ? IOUtils.createTempFileOnlyStreamCache()
                : IOUtils.createMemoryOnlyStreamCache();
        return Loader.loadPDF(new RandomAccessReadBufferedFile(file.toFile()), password == null ? "" : password,
                null, null, cache);
    }

    /** Cheap checks before PDFBox sees the file: exists, size, header, and a trailer at the end. */
    private void checkFile(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new UserInputException(file, null, "no such file", "check the path");
        }
        long size;
        byte[] head = new byte[1024];
        byte[] tail = new byte[2048];
        int headRead;
        int tailRead;
        try (RandomAccessFile f = new RandomAccessFile(file.toFile(), "r")) {
            size = f.length();
            headRead = Math.max(0, f.read(head));
            f.seek(Math.max(0, size - tail.length));
            tailRead = Math.max(0, f.read(tail));
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the file (" + e.getMessage() + ")", "check its permissions");
        }
        if (size == 0) throw new UserInputException(file, null, "the file is empty", "give a PDF file");
        if (size > limits.maxBytes()) {
            throw new UserInputException(file, null, "the file has " + size + " bytes (limit pdf-bytes is "
                    + limits.maxBytes() + ")", "extract the pages with the tables into a smaller PDF, or raise the"
                    + " limit with --limit pdf-bytes=N");
        }
        if (!new String(head, 0, headRead, StandardCharsets.ISO_8859_1).contains("%PDF-")) {
            throw new UserInputException(file, null, "this is not a PDF (no %PDF- header)", "give the paper's PDF file");
        }
        if (!new String(tail, 0, tailRead, StandardCharsets.ISO_8859_1).contains("%%EOF")) {
            throw new UserInputException(file, null, "the PDF is truncated or damaged (it does not end with %%EOF)",
                    "download it again");
        }
    }

    private static String shortReason(Throwable e) {
        String m = e.getMessage();
        if (m == null || m.isBlank()) m = e.getClass().getSimpleName();
        m = m.replaceAll("\\s+", " ");
        return m.length() > 120 ? m.substring(0, 117) + "..." : m;
    }

}
