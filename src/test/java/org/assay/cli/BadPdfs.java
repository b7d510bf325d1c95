package org.assay.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSDictionary;
import org.apache.pdfbox.cos.COSInteger;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdfwriter.compress.CompressParameters;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.common.PDStream;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.pdmodel.interactive.action.PDActionJavaScript;
import org.apache.pdfbox.pdmodel.interactive.action.PDPageAdditionalActions;

/**
 * Builds the hostile PDFs of the bad-input catalogue with PDFBox. The small ones are committed
 * under {@code src/test/resources/bad/pdf/} (regenerate with {@code bash make.sh} there, which
 * runs {@link #main}); the 10,000-page one is only ever built by the test, into a temporary folder.
 * Every file gets a fixed document id and no dates, so the same PDFBox writes the same bytes.
 */
final class BadPdfs {
    static final Path FOLDER = Path.of("src/test/resources/bad/pdf");
    /** The clean paper the JavaScript fixture is built from: extract must read it exactly as this one. */
    static final Path CLEAN_PAPER = Path.of("src/test/resources/pdf/booktabs-bold.pdf");
    /** Where the embedded JavaScript would report to if anything ever ran it. */
    static final int JAVASCRIPT_PORT = 47913;

    private BadPdfs() {}

    /** Writes the committed fixtures into {@code args[0]} (default: {@link #FOLDER}). */
    public static void main(String[] args) throws IOException {
        Path dir = args.length > 0 ? Path.of(args[0]) : FOLDER;
        for (Map.Entry<String, byte[]> e : committed().entrySet()) Files.write(dir.resolve(e.getKey()), e.getValue());
    }

    /** The committed fixtures by file name. */
    static Map<String, byte[]> committed() throws IOException {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put("form-draws-itself.pdf", formDrawsItself());
        files.put("page-tree-cycle.pdf", pageTreeCycle());
        files.put("javascript-open-action.pdf", javascriptOpenAction());
        return files;
    }

    /**
     * One page with a caption and a Form XObject whose own resources name it, and whose content
     * stream draws it again: a reader that follows {@code Do} without a guard never stops.
     */
    static byte[] formDrawsItself() throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(PDRectangle.LETTER);
            doc.addPage(page);
            PDResources pageResources = new PDResources();
            COSName font = pageResources.add(new PDType1Font(Standard14Fonts.FontName.HELVETICA));
            PDFormXObject form = new PDFormXObject(new PDStream(doc));
            form.setBBox(new PDRectangle(0, 0, 200, 50));
            PDResources formResources = new PDResources();
            formResources.put(COSName.getPDFName("Self"), form);     // the form's resources hold the form itself
            formResources.put(font, new PDType1Font(Standard14Fonts.FontName.HELVETICA));
            form.setResources(formResources);
            write(form.getContentStream(), "q 1 0 0 1 1 1 cm BT /" + font.getName() + " 9 Tf 0 0 Td (70.1) Tj ET /Self Do Q\n");
            COSName formName = pageResources.add(form);
            page.setResources(pageResources);
            PDStream content = new PDStream(doc);
            write(content, "BT /" + font.getName() + " 10 Tf 72 700 Td (Table 1: An invented result that draws itself.) Tj ET\n"
                    + "q 1 0 0 1 72 600 cm /" + formName.getName() + " Do Q\n");
            page.setContents(content);
            return save(doc);
        }
    }

    /**
     * Two pages of text where the page tree's second kid is an intermediate node whose only kid is
     * the root itself: walking the tree without remembering visited nodes loops for ever.
     */
    static byte[] pageTreeCycle() throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDPage page = textPage(doc, "Table 1: An invented result on a page of a cyclic page tree.");
            doc.addPage(page);
            COSDictionary root = doc.getDocumentCatalog().getPages().getCOSObject();
            COSDictionary inner = new COSDictionary();
            inner.setItem(COSName.TYPE, COSName.PAGES);
            inner.setItem(COSName.PARENT, root);
            COSArray innerKids = new COSArray();
            innerKids.add(root);                                       // back to the root: the cycle
            inner.setItem(COSName.KIDS, innerKids);
            inner.setItem(COSName.COUNT, COSInteger.get(1));
            COSArray kids = (COSArray) root.getDictionaryObject(COSName.KIDS);
            kids.add(inner);
            root.setItem(COSName.COUNT, COSInteger.get(2));
            return save(doc);
        }
    }

    /**
     * The clean two-page paper with JavaScript as the document's open action and as page 1's open
     * action; the script would call back to {@link #JAVASCRIPT_PORT} on localhost if it ever ran.
     */
    static byte[] javascriptOpenAction() throws IOException {
        try (PDDocument doc = Loader.loadPDF(CLEAN_PAPER.toFile())) {
            String url = "http://127.0.0.1:" + JAVASCRIPT_PORT;
            doc.getDocumentCatalog().setOpenAction(new PDActionJavaScript(
                    "app.launchURL('" + url + "/open-action', true); this.submitForm('" + url + "/submit');"));
            PDPageAdditionalActions actions = new PDPageAdditionalActions();
            actions.setO(new PDActionJavaScript("app.launchURL('" + url + "/page-open', true);"));
            doc.getPage(0).setActions(actions);
            return save(doc);
        }
    }

    /** A document of {@code n} pages, each with one line of text (for the page limit); built by the test only. */
    static byte[] pages(int n) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            for (int i = 1; i <= n; i++) doc.addPage(textPage(doc, "Page " + i + " of an invented report."));
            return save(doc);
        }
    }

    /**
     * One page that draws form 1, which draws form 2, and so on {@code depth} deep. Written as raw PDF
     * objects: PDFBox's own writer recurses through the chain and overflows its stack at this depth.
     */
    static byte[] nestedForms(int depth) {
        List<String> objects = new ArrayList<>();   // object k + 1 is objects.get(k)
        objects.add("<< /Type /Catalog /Pages 2 0 R >>");
        objects.add("<< /Type /Pages /Kids [3 0 R] /Count 1 >>");
        objects.add("<< /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] /Contents 4 0 R"
                + " /Resources << /Font << /F1 5 0 R >> /XObject << /N 6 0 R >> >> >>");
        objects.add(stream("", "BT /F1 10 Tf 72 700 Td (Table 1: An invented result inside nested forms.) Tj ET /N Do"));
        objects.add("<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>");
        for (int i = 0; i < depth; i++) {
            boolean last = i == depth - 1;
            int next = 6 + i + 1;
            objects.add(stream("/Type /XObject /Subtype /Form /BBox [0 0 100 100] /Resources "
                    + (last ? "<< >>" : "<< /XObject << /N " + next + " 0 R >> >>") + " ",
                    "0 0 m 1 1 l S" + (last ? "" : " /N Do")));
        }
        StringBuilder pdf = new StringBuilder("%PDF-1.4\n");
        long[] offsets = new long[objects.size()];
        for (int k = 0; k < objects.size(); k++) {
            offsets[k] = pdf.length();   // ASCII only, so characters are bytes
            pdf.append(k + 1).append(" 0 obj\n").append(objects.get(k)).append("\nendobj\n");
        }
        long xref = pdf.length();
        pdf.append("xref\n0 ").append(objects.size() + 1).append("\n0000000000 65535 f \n");
        for (long offset : offsets) pdf.append(String.format("%010d 00000 n \n", offset));
        pdf.append("trailer\n<< /Size ").append(objects.size() + 1).append(" /Root 1 0 R >>\nstartxref\n")
                .append(xref).append("\n%%EOF\n");
        return pdf.toString().getBytes(StandardCharsets.US_ASCII);
    }

    private static String stream(String dictionary, String content) {
        return "<< " + dictionary + "/Length " + content.length() + " >>\nstream\n" + content + "\nendstream";
    }

    private static PDPage textPage(PDDocument doc, String line) throws IOException {
        PDPage page = new PDPage(PDRectangle.LETTER);
        PDResources resources = new PDResources();
        COSName font = resources.add(new PDType1Font(Standard14Fonts.FontName.HELVETICA));
        page.setResources(resources);
        PDStream content = new PDStream(doc);
        write(content, "BT /" + font.getName() + " 10 Tf 72 700 Td (" + line + ") Tj ET\n");
        page.setContents(content);
        return page;
    }

    private static void write(PDStream stream, String operators) throws IOException {
        try (OutputStream out = stream.createOutputStream()) {
            out.write(operators.getBytes(StandardCharsets.US_ASCII));
        }
    }

    /** Saves without object streams and with a fixed /ID, so the bytes depend only on the content. */
    private static byte[] save(PDDocument doc) throws IOException {
        COSArray id = new COSArray();
        id.add(new COSString("assay-bad-pdf"));
        id.add(new COSString("assay-bad-pdf"));
        doc.getDocument().getTrailer().setItem(COSName.ID, id);
        doc.getDocumentInformation().getCOSObject().clear();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        doc.save(out, CompressParameters.NO_COMPRESSION);
        return out.toByteArray();
    }
}
