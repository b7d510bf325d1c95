package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.text.Normalizer;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.assay.testing.Pdflatex;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every character {@link LatexText} lets through or maps, compiled by pdflatex (Debian TeX Live) with
 * the templates' preamble and read back by poppler's pdftotext: the document must compile, and each
 * character must come back as itself, or as what pdftotext is known to make of the glyph pdfTeX draws
 * (listed below with the reason). Skipped, with the reason, where pdflatex or pdftotext is missing.
 */
class LatexTextCompileTest {
    /** The templates' preamble (claims-table.tex.mustache). */
    private static final String PREAMBLE = """
            \\documentclass[a4paper]{article}
            \\usepackage[T1]{fontenc}
            \\usepackage[utf8]{inputenc}
            \\usepackage{lmodern}
            \\usepackage[margin=2cm]{geometry}
            \\pagestyle{empty}
            \\begin{document}
            \\raggedright
            """;

    /**
     * What pdftotext (poppler 22) reports for characters that are printed, but not as that one code point:
     * pdfTeX builds the symbol from two glyphs, or the font names its glyph after a look-alike code point.
     */
    private static final Map<Integer, String> EXTRACTED_AS = new LinkedHashMap<>();

    static {
        EXTRACTED_AS.put(0x0027, "\u2019");        // LaTeX prints the ASCII apostrophe as a right quote (its convention)
        EXTRACTED_AS.put(0x2026, ". . .");         // \textellipsis is three spaced periods
        EXTRACTED_AS.put(0x2033, "\u2032\u2032");  // double prime: two primes
        EXTRACTED_AS.put(0x2010, "-");             // hyphen and non-breaking hyphen: the ASCII hyphen's glyph
        EXTRACTED_AS.put(0x2011, "-");
        EXTRACTED_AS.put(0x2012, "\u2013");        // figure dash drawn as an en dash
        EXTRACTED_AS.put(0x2015, "\u2014");        // horizontal bar drawn as an em dash
        EXTRACTED_AS.put(0x2215, "/");             // division slash drawn as a slash
        EXTRACTED_AS.put(0x2218, "\u25E6");        // \circ: cmsy's glyph is named after the white bullet
        EXTRACTED_AS.put(0x2219, "\u00B7");        // \cdot: named after the middle dot
        EXTRACTED_AS.put(0x22C5, "\u00B7");
        EXTRACTED_AS.put(0x0110, "\u00D0");        // T1 draws the capital D with stroke with the Eth glyph (same shape)
        EXTRACTED_AS.put(0x0394, "\u2206");        // cmr's capital Delta and Omega are named after the
        EXTRACTED_AS.put(0x03A9, "\u2126");        // increment and ohm signs
        EXTRACTED_AS.put(0x27F5, "\u2190\u2212");  // long arrows: an arrow and a minus sign
        EXTRACTED_AS.put(0x27F6, "\u2212\u2192");
        EXTRACTED_AS.put(0x27F7, "\u2190\u2192");
        EXTRACTED_AS.put(0x27F9, "=\u21D2");
        // Greek capitals and omicron that look Latin are printed as the Latin letters (TeX's math fonts
        // have no separate glyphs for them)
        String[] lookAlikes = {"\u0391A", "\u0392B", "\u0395E", "\u0396Z", "\u0397H", "\u0399I", "\u039AK", "\u039CM",
                "\u039DN", "\u039FO", "\u03A1P", "\u03A4T", "\u03A7X", "\u03BFo"};
        for (String pair : lookAlikes) EXTRACTED_AS.put((int) pair.charAt(0), pair.substring(1));
    }

    /** Characters with no LaTeX form here, each of which must come back as its stand-in. */
    private static final int[] STAND_INS = {0x4E2D, 0x6A21, 0x1F600, 0x0127, 0x017F, 0x2211, 0x0301, 0x200B};

    @TempDir Path tmp;

    @BeforeEach
    void tools() { Pdflatex.assumeInstalled(); }

    @Test
    void everyCharacterLetThroughOrMappedCompilesAndPrintsAsItself() throws Exception {
        List<Integer> chars = new ArrayList<>();
        for (int cp = 0x20; cp < 0x7F; cp++) chars.add(cp);
        for (int cp = 0xA0; cp < 0x3000; cp++) {
            if (!LatexText.of(new String(Character.toChars(cp))).contains("U+")) chars.add(cp);
        }
        for (int cp : STAND_INS) chars.add(cp);
        StringBuilder doc = new StringBuilder(PREAMBLE);
        for (int cp : chars) {
            doc.append(String.format(Locale.ROOT, "%04X:", cp)).append(LatexText.of(new String(Character.toChars(cp))))
                    .append(":\\par\n");
        }
        doc.append("\\end{document}\n");
        Path tex = tmp.resolve("chars.tex");
        Files.writeString(tex, doc);
        Map<Integer, String> got = entries(Pdflatex.text(Pdflatex.compile(tex).pdf(), false));

        List<String> wrong = new ArrayList<>();
        for (int cp : chars) {
            String c = new String(Character.toChars(cp));
            String g = got.get(cp);
            if (g == null) {
                wrong.add(String.format("%04X %s: line missing", cp, c));
            } else if (!acceptable(cp, c, g)) {
                wrong.add(String.format("%04X %s -> '%s'", cp, c, g));
            }
        }
        assertThat(wrong).as("characters that do not come back from the PDF").isEmpty();
        assertThat(chars.size()).as("characters checked").isGreaterThan(95 + 180 + 100);
    }

    @Test
    void valuesWhereLatexLooksForAStarOrAnOptionalArgumentArePrinted() throws Exception {
        // after \\ LaTeX skips spaces and takes "*" or "[...]" as part of the line break; after \item and
        // \midrule it takes "[...]" as an optional argument (LaTeX kernel and booktabs; from memory)
        String doc = PREAMBLE.replace("\\begin{document}", "\\usepackage{booktabs}\n\\begin{document}")
                + "\\begin{tabular}{l}\n\\toprule\nfirst \\\\\n\\midrule\n" + LatexText.of("[2pt] bracket") + " \\\\\n"
                + LatexText.of("*star") + " \\\\\n" + LatexText.of("[3pt]") + " \\\\\n\\bottomrule\n\\end{tabular}\n"
                + "\\begin{itemize}\n\\item " + LatexText.of("[label] item") + "\n\\end{itemize}\n\\end{document}\n";
        Path tex = tmp.resolve("arguments.tex");
        Files.writeString(tex, doc);
        String text = Pdflatex.normalized(Pdflatex.text(Pdflatex.compile(tex).pdf(), false));
        assertThat(text).contains("[2pt] bracket", "*star", "[3pt]", "[label] item");
    }

    /** "00E9:é:" lines; a page break (form feed) or an accent pdftotext puts on the next line is joined. */
    private static Map<Integer, String> entries(String text) {
        Map<Integer, String> got = new LinkedHashMap<>();
        Integer current = null;
        StringBuilder value = new StringBuilder();
        for (String line : text.replace("\f", "").split("\n")) {
            if (line.matches("[0-9A-F]{4,6}:.*")) {
                if (current != null) got.put(current, between(value.toString()));
                int colon = line.indexOf(':');
                current = Integer.parseInt(line.substring(0, colon), 16);
                value.setLength(0);
                value.append(line.substring(colon));
            } else if (current != null) {
                value.append('\n').append(line);
            }
        }
        if (current != null) got.put(current, between(value.toString()));
        return got;
    }

    /** ":é:" to "é"; text after the closing colon (an accent on the next line) is kept. */
    private static String between(String v) {
        String t = v.strip().substring(1);
        int close = t.lastIndexOf(':');
        return close < 0 ? "<no closing colon: " + t + ">" : t.substring(0, close) + t.substring(close + 1);
    }

    private static boolean acceptable(int cp, String c, String extracted) {
        String g = Pdflatex.normalized(extracted);
        String nfc = Normalizer.normalize(g, Normalizer.Form.NFC);
        if (nfc.equals(c)) return true;
        if (EXTRACTED_AS.containsKey(cp)) return g.equals(EXTRACTED_AS.get(cp));
        if (Character.isSpaceChar(cp)) return g.isEmpty();   // a space prints as a space
        if (cp == 0x00AD) return g.isEmpty();                // soft hyphen: only a possible break point
        if (Arrays.stream(STAND_INS).anyMatch(s -> s == cp)) return g.equals(String.format(Locale.ROOT, "[U+%04X]", cp));
        // superscript digits, the micro sign: the same character after compatibility normalization
        if (Normalizer.normalize(g, Normalizer.Form.NFKC).equals(Normalizer.normalize(c, Normalizer.Form.NFKC))) return true;
        // accented Latin letters whose accent T1 draws as a separate glyph (ogonek, cedilla, comma accent)
        // that pdftotext does not recombine: the base letter (i and j dotless under an accent) is there
        String base = Normalizer.normalize(c, Normalizer.Form.NFD).substring(0, 1);
        String letters = g.replaceAll("\\s", "").replace('\u0131', 'i').replace('\u0237', 'j');
        return Character.isLetter(cp) && cp >= 0xC0 && cp <= 0x17F && letters.startsWith(base);
    }
}
