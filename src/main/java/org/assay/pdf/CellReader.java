package org.assay.pdf;

import java.util.ArrayList;
import java.util.List;

/**
 * Reads one grid cell: superscript glyphs become footnote marks, the rest is parsed by
 * {@link CellText}, and bold comes from the fonts of the value's digits.
 */
final class CellReader {
    private CellReader() {}

    static ExtractedCell read(GridCell cell, List<String> rowPath, List<String> columnPath, int page) {
        List<Glyph> main = new ArrayList<>();
        List<String> superscripts = new ArrayList<>();
        for (Glyph g : cell.glyphs()) {
            boolean raised = g.size() < 0.85 * cell.size() && cell.baseline() - g.baseline() > 0.15 * cell.size();
            if (raised) superscripts.add(g.text());
            else main.add(g);
        }
        main.sort(java.util.Comparator.comparingDouble(Glyph::x0));
        String text = main.isEmpty() ? "" : LineBuilder.phrase(main, cell.size()).text();
        ParsedCell parsed = CellText.parse(text);
        List<String> markers = new ArrayList<>(parsed.markers());
        for (String s : superscripts) {
            String t = s.strip();
            if (!t.isEmpty() && !t.equals(",")) markers.add(t);
        }
        // Bold is read from the value's own digits: "\textbf{49.0}$\pm$1.5" is a bold value with a plain ± part.
        List<Glyph> digits = new ArrayList<>();
        for (Glyph g : main) {
            if (g.text().equals("±") || g.text().equals("(")) break;
            if (g.text().codePoints().anyMatch(Character::isDigit)) digits.add(g);
        }
        long boldDigits = digits.stream().filter(Glyph::bold).count();
        boolean bold = !digits.isEmpty() && boldDigits == digits.size();
        double confidence = parsed.confidence();
        if (boldDigits > 0 && !bold) confidence = Math.min(confidence, 0.6); // some digits bold, some not
        if (!superscripts.isEmpty() && parsed.kind() != ParsedCell.Kind.NUMBER) confidence = Math.min(confidence, 0.6);
        return new ExtractedCell(rowPath, columnPath, CellText.normaliseLabel(cell.text()), parsed, bold, cell.underlined(), markers, page, cell.x0(),
                cell.top(), cell.x1(), cell.bottom(), confidence);
    }
}
