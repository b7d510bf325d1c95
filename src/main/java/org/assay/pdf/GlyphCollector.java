package org.assay.pdf;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.pdfbox.contentstream.operator.Operator;
import org.apache.pdfbox.cos.COSBase;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDFontDescriptor;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;

/**
 * Collects every glyph of a page with its box and font, using PDFBox's text stripper only for its
 * Unicode mapping and positions (nothing is written out).
 */
final class GlyphCollector extends PDFTextStripper {
    private final List<Glyph> glyphs = new ArrayList<>();
    private PageBudget budget;

    GlyphCollector() {
        setSortByPosition(false);
        setSuppressDuplicateOverlappingText(false);
    }

    List<Glyph> collect(org.apache.pdfbox.pdmodel.PDDocument document, int pageNumber, PageBudget budget)
            throws IOException {
        glyphs.clear();
        this.budget = budget;
        setStartPage(pageNumber);
        setEndPage(pageNumber);
        writeText(document, java.io.Writer.nullWriter());
        return List.copyOf(glyphs);
    }

    @Override
    protected void processOperator(Operator operator, List<COSBase> operands) throws IOException {
        budget.tick();
        super.processOperator(operator, operands);
    }

    @Override
    protected void processTextPosition(TextPosition t) {
        String text = t.getUnicode();
        if (text == null || text.isEmpty()) return;
        // The y scale of the text rendering matrix is the size as drawn, after any scaling of the table.
        double size = Math.abs(t.getYScale());
        double height = t.getHeightDir();
        if (!(size > 0)) size = height;
        double baseline = t.getYDirAdj();
        double x0 = t.getXDirAdj();
        double x1 = x0 + t.getWidthDirAdj();
        // PDFBox's glyph height is an estimate; the font size gives a box that is stable across fonts.
        double top = baseline - Math.max(height, 0.7 * size);
        double bottom = baseline + 0.22 * size;
        PDFont font = t.getFont();
        String name = fontName(font);
        glyphs.add(new Glyph(text, x0, x1, top, bottom, baseline, size, name, isBold(font, name), isItalic(name)));
    }

    static String fontName(PDFont font) {
        String name = font == null || font.getName() == null ? "" : font.getName();
        int plus = name.indexOf('+');
        return plus == 6 ? name.substring(7) : name; // drop the "ABCDEF+" subset tag
    }

    static boolean isBold(PDFont font, String name) {
        String n = name.toLowerCase(Locale.ROOT);
        // TeX's Computer Modern and Latin Modern bold faces are cmbx*/cmb* and lmroman*-bold; URW's
        // Times clone calls its bold "Medi" (medium).
        if (n.matches("(cmbx|cmb|cmssbx|cmbsy|cmmib|cmtb|ecbx|ecrb|ec bx).*")) return true;
        if (n.contains("bold") || n.contains("black") || n.contains("heavy") || n.contains("semibold")
                || n.contains("demi") || n.endsWith("-medi") || n.contains("-mediital")) return true;
        PDFontDescriptor d = font == null ? null : font.getFontDescriptor();
        return d != null && (d.isForceBold() || d.getFontWeight() >= 600);
    }

    static boolean isItalic(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        if (n.matches("(cmti|cmsl|cmbxti|cmbxsl|cmitt|ecti|ecsl).*")) return true;
        return n.contains("italic") || n.contains("oblique") || n.endsWith("ital") || n.contains("-it");
    }
}
