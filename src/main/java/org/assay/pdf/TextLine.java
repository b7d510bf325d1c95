package org.assay.pdf;

import java.util.List;

/** Glyphs sharing a baseline, split into phrases left to right. */
public record TextLine(double baseline, double top, double bottom, double size, List<Phrase> phrases) {
    public TextLine {
        phrases = List.copyOf(phrases);
    }

    public double x0() { return phrases.get(0).x0(); }

    public double x1() { return phrases.get(phrases.size() - 1).x1(); }

    public String text() {
        StringBuilder sb = new StringBuilder();
        for (Phrase p : phrases) sb.append(sb.length() == 0 ? "" : "   ").append(p.text());
        return sb.toString();
    }
}
