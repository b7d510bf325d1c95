package org.assay.report;

import java.text.Normalizer;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Any string as LaTeX text that pdflatex prints as text and never executes. Written by hand because no
 * maintained Java library converts Unicode to LaTeX for pdflatex; the choices follow the LaTeX kernel's
 * own command names (LaTeX2e font encodings, {@code encguide}) and are checked by compiling every
 * character with pdflatex ({@code LatexTextCompileTest}).
 *
 * <ul>
 *   <li>The ten special characters {@code \ { } $ & # % _ ^ ~} become text commands, so a label can
 *       never start a command, a group, math, an alignment cell, a comment or a {@code ^^} escape.</li>
 *   <li>ASCII that pdfTeX would turn into something else does not reach it raw: {@code < > |} (other
 *       glyphs in the OT1 encoding), {@code `} and the ligatures {@code --}, {@code ''}, {@code ,,};
 *       brackets are braced ({@code {[}}) so no value is taken for an optional argument of {@code \\},
 *       {@code \midrule} or {@code \item}, and a leading {@code *} is braced so it is not read as
 *       {@code \\*}.</li>
 *   <li>Latin-1 and Latin Extended-A letters and signs are left to LaTeX's utf8 input encoding with the
 *       T1 font encoding (the templates load {@code fontenc} T1), except the nine it has no definition for.</li>
 *   <li>Common symbols are mapped to LaTeX commands: dashes and quotes, arrows, relations, ± × − …,
 *       Greek letters as {@code \ensuremath} math.</li>
 *   <li>Everything else is shown as a visible stand-in {@code [U+4E2D]}: nothing is dropped.</li>
 * </ul>
 * Line breaks and tabs become spaces (a blank line would end a table cell). Text is put in Unicode
 * normalization form C first, so a decomposed "e" + combining acute prints as "é".
 */
final class LatexText {
    private LatexText() {}

    /** Latin-1 and Latin Extended-A characters LaTeX's utf8 + T1 does not define (TeX Live 2022): ĦħĸĿŀŉŦŧſ. */
    private static final Set<Integer> UNDEFINED_IN_T1 = Set.of(0x126, 0x127, 0x138, 0x13F, 0x140, 0x149, 0x166, 0x167, 0x17F);

    private static final Map<Integer, String> SYMBOLS = new HashMap<>();

    private static void text(int cp, String latex) { SYMBOLS.put(cp, latex); }

    private static void math(int cp, String latex) { SYMBOLS.put(cp, "\\ensuremath{" + latex + "}"); }

    // Only symbols whose glyphs pdftotext reads back are listed (LatexTextCompileTest). Big operators (cmex
    // glyphs have no Unicode names) and symbols stacked from pieces that copy out garbled (\notin, \cong,
    // \mapsto, the hook arrows) get the stand-in instead; \neq and the long arrows copy out as their two
    // pieces ("=" with a slash, "−→") and are kept.
    static {
        // Latin-1 signs whose T1/TS1 form would tie a copied table to fontenc T1; math works in any encoding
        math(0x00B1, "\\pm");
        math(0x00D7, "\\times");
        math(0x00F7, "\\div");
        math(0x00B5, "\\mu");
        math(0x00AC, "\\neg");
        text(0x00B0, "\\textdegree{}");
        text(0x00A7, "\\S{}");
        text(0x00B6, "\\P{}");
        // punctuation
        text(0x2010, "-{}");                  // hyphen
        text(0x2011, "-{}");                  // non-breaking hyphen
        text(0x2012, "\\textendash{}");       // figure dash
        text(0x2013, "\\textendash{}");
        text(0x2014, "\\textemdash{}");
        text(0x2015, "\\textemdash{}");       // horizontal bar
        text(0x2018, "\\textquoteleft{}");
        text(0x2019, "\\textquoteright{}");
        text(0x201A, "\\quotesinglbase{}");
        text(0x201C, "\\textquotedblleft{}");
        text(0x201D, "\\textquotedblright{}");
        text(0x201E, "\\quotedblbase{}");
        text(0x2020, "\\textdagger{}");
        text(0x2021, "\\textdaggerdbl{}");
        text(0x2022, "\\textbullet{}");
        text(0x2026, "\\textellipsis{}");
        text(0x2030, "\\textperthousand{}");
        text(0x2039, "\\guilsinglleft{}");
        text(0x203A, "\\guilsinglright{}");
        text(0x20AC, "\\texteuro{}");
        text(0x2122, "\\texttrademark{}");
        math(0x2032, "{}^{\\prime}");
        math(0x2033, "{}^{\\prime\\prime}");
        // spaces
        for (int cp = 0x2002; cp <= 0x2008; cp++) text(cp, " ");
        text(0x2009, "\\,");                  // thin space
        text(0x200A, "\\,");                  // hair space
        text(0x202F, "\\,");                  // narrow no-break space (thousands separator)
        // relations and operators
        math(0x2212, "-");                    // minus sign
        math(0x2213, "\\mp");
        math(0x2215, "/");
        math(0x2217, "\\ast");
        math(0x2218, "\\circ");
        math(0x2219, "\\cdot");
        math(0x22C5, "\\cdot");
        math(0x221D, "\\propto");
        math(0x221E, "\\infty");
        math(0x2206, "\\Delta");              // increment
        math(0x2202, "\\partial");
        math(0x2207, "\\nabla");
        math(0x2200, "\\forall");
        math(0x2203, "\\exists");
        math(0x2205, "\\emptyset");
        math(0x2208, "\\in");
        math(0x2227, "\\wedge");
        math(0x2228, "\\vee");
        math(0x2229, "\\cap");
        math(0x222A, "\\cup");
        math(0x2282, "\\subset");
        math(0x2283, "\\supset");
        math(0x2286, "\\subseteq");
        math(0x2287, "\\supseteq");
        math(0x2295, "\\oplus");
        math(0x2297, "\\otimes");
        math(0x223C, "\\sim");
        math(0x2248, "\\approx");
        math(0x2243, "\\simeq");
        math(0x2260, "\\neq");
        math(0x2261, "\\equiv");
        math(0x2264, "\\leq");
        math(0x2265, "\\geq");
        math(0x226A, "\\ll");
        math(0x226B, "\\gg");
        math(0x27E8, "\\langle");
        math(0x27E9, "\\rangle");
        math(0x2113, "\\ell");
        math(0x2126, "\\Omega");              // ohm sign
        // arrows
        math(0x2190, "\\leftarrow");
        math(0x2191, "\\uparrow");
        math(0x2192, "\\rightarrow");
        math(0x2193, "\\downarrow");
        math(0x2194, "\\leftrightarrow");
        math(0x2195, "\\updownarrow");
        math(0x2196, "\\nwarrow");
        math(0x2197, "\\nearrow");
        math(0x2198, "\\searrow");
        math(0x2199, "\\swarrow");
        math(0x21D0, "\\Leftarrow");
        math(0x21D1, "\\Uparrow");
        math(0x21D2, "\\Rightarrow");
        math(0x21D3, "\\Downarrow");
        math(0x21D4, "\\Leftrightarrow");
        math(0x27F5, "\\longleftarrow");
        math(0x27F6, "\\longrightarrow");
        math(0x27F7, "\\longleftrightarrow");
        math(0x27F9, "\\Longrightarrow");
        // Greek: capitals that look Latin are upright Latin letters, as in LaTeX's own math fonts
        String[] upper = {"\\mathrm{A}", "\\mathrm{B}", "\\Gamma", "\\Delta", "\\mathrm{E}", "\\mathrm{Z}", "\\mathrm{H}",
                "\\Theta", "\\mathrm{I}", "\\mathrm{K}", "\\Lambda", "\\mathrm{M}", "\\mathrm{N}", "\\Xi", "\\mathrm{O}",
                "\\Pi", "\\mathrm{P}", null, "\\Sigma", "\\mathrm{T}", "\\Upsilon", "\\Phi", "\\mathrm{X}", "\\Psi", "\\Omega"};
        for (int i = 0; i < upper.length; i++) if (upper[i] != null) math(0x0391 + i, upper[i]);
        // U+03B5 and U+03C6 are the open epsilon and the loopy phi, which TeX calls \varepsilon and \varphi
        String[] lower = {"\\alpha", "\\beta", "\\gamma", "\\delta", "\\varepsilon", "\\zeta", "\\eta", "\\theta",
                "\\iota", "\\kappa", "\\lambda", "\\mu", "\\nu", "\\xi", "o", "\\pi", "\\rho", "\\varsigma", "\\sigma",
                "\\tau", "\\upsilon", "\\varphi", "\\chi", "\\psi", "\\omega"};
        for (int i = 0; i < lower.length; i++) math(0x03B1 + i, lower[i]);
        math(0x03D1, "\\vartheta");
        math(0x03D5, "\\phi");
        math(0x03D6, "\\varpi");
        math(0x03F1, "\\varrho");
        math(0x03F5, "\\epsilon");
    }

    /** {@code s} as LaTeX text: printable by pdflatex with utf8 input and T1 fonts, never executable. */
    static String of(String s) {
        String t = Normalizer.normalize(s, Normalizer.Form.NFC);
        StringBuilder sb = new StringBuilder(t.length() + 16);
        for (int i = 0; i < t.length(); ) {
            int cp = t.codePointAt(i);
            int next = i + Character.charCount(cp) < t.length() ? t.codePointAt(i + Character.charCount(cp)) : -1;
            append(sb, cp, next, i == 0);
            i += Character.charCount(cp);
        }
        return sb.toString();
    }

    private static void append(StringBuilder sb, int cp, int next, boolean first) {
        switch (cp) {
            case '\\' -> sb.append("\\textbackslash{}");
            case '{' -> sb.append("\\{");
            case '}' -> sb.append("\\}");
            case '$' -> sb.append("\\$");
            case '&' -> sb.append("\\&");
            case '#' -> sb.append("\\#");
            case '%' -> sb.append("\\%");
            case '_' -> sb.append("\\_");
            case '^' -> sb.append("\\textasciicircum{}");
            case '~' -> sb.append("\\textasciitilde{}");
            case '<' -> sb.append("\\textless{}");
            case '>' -> sb.append("\\textgreater{}");
            case '|' -> sb.append("\\textbar{}");
            case '`' -> sb.append("\\textasciigrave{}");
            case '[' -> sb.append("{[}");
            case ']' -> sb.append("{]}");
            case '*' -> sb.append(first ? "{*}" : "*");
            // "--", "''" and ",," are ligatures (dash, closing quote, low quote) in T1: break them
            case '-', '\'', ',' -> sb.append((char) cp).append(next == cp ? "{}" : "");
            case '\n', '\r', '\t' -> sb.append(' ');
            default -> {
                if (cp >= 0x20 && cp < 0x7F) {
                    sb.append((char) cp);
                } else if (cp >= 0xA0 && cp <= 0x17F && !SYMBOLS.containsKey(cp) && !UNDEFINED_IN_T1.contains(cp)) {
                    sb.appendCodePoint(cp);   // left to inputenc utf8 + fontenc T1
                } else {
                    String mapped = SYMBOLS.get(cp);
                    sb.append(mapped != null ? mapped : standIn(cp));
                }
            }
        }
    }

    /** The visible stand-in for a character pdflatex cannot print: "[U+4E2D]", brackets braced. */
    static String standIn(int cp) {
        return "{[}U+" + String.format(Locale.ROOT, "%04X", cp) + "{]}";
    }
}
