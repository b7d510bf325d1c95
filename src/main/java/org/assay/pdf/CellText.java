package org.assay.pdf;

import java.text.Normalizer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.assay.pdf.ParsedCell.Kind;
import org.assay.pdf.ParsedCell.UncertaintyStyle;

/**
 * Reads the text of one table cell as a PDF gives it: a number with its uncertainty, percent sign and
 * footnote marks, a missing-value mark, or other text. Pure string work; the caller has already taken
 * superscript glyphs out.
 *
 * <p>Decisions where the printed form is ambiguous (each lowers the confidence):
 * <ul>
 * <li>"1,234" is read as thousands (value "1,234", plain "1234", confidence 0.8); a comma that cannot be a
 *     thousands separator ("94,1", "0,912") is read as a decimal comma (plain "94.1", confidence 0.6).</li>
 * <li>Spaces inside digits or around the decimal point ("9 4.1", "94 .1") are kerning gaps: joined, 0.6.</li>
 * <li>One lower-case letter a–f written directly after the number ("94.1a") is a footnote letter, 0.7. Other
 *     letters are left alone because they are more often units (s, m, k, x, h).</li>
 * <li>"–/–" (a missing mark for a cell that holds two values) is missing, 0.8.</li>
 * <li>Two numbers in one cell ("94.1 / 95.2") are text with confidence 0.3; a lone number with other
 *     punctuation ("(94.1)", "~94") is text with 0.5; so is scientific notation ("1.2e-3").</li>
 * <li>Text cells keep only their trailing marks (†‡*§¶‖) as markers, so "C#" stays whole.</li>
 * </ul>
 */
public final class CellText {
    /** Marks NFKC must not touch (it leaves them alone today; this keeps it so). */
    private static final String KEEP = "→↔±×†‡";
    /** Footnote marks, in the order the trade usually assigns them (common practice). */
    private static final String MARKERS = "†‡*§¶‖#";
    /** Dash glyphs that PDFs use for a minus sign (Unicode Standard: U+2212 MINUS SIGN, U+2012 FIGURE DASH,
     *  U+2013 EN DASH, U+2014 EM DASH, U+FE63 SMALL HYPHEN-MINUS, U+FF0D FULLWIDTH HYPHEN-MINUS). */
    private static final String MINUS_GLYPHS = "\u2212\u2012\u2013\u2014\uFE63\uFF0D";
    /** Every dash that can stand for "no value", including hyphen and horizontal bar. */
    private static final String DASH_GLYPHS = MINUS_GLYPHS + "\u2010\u2011\u2015";
    private static final Set<String> MISSING = Set.of("-", "--", "---", "n/a", "n.a.", "n.a", "na", "n/a.");

    private static final String NUM = "[-+]?(?:[1-9]\\d{0,2}(?:,\\d{3})+(?:\\.\\d+)?|\\d+(?:[.,]\\d+)?|\\.\\d+)";
    private static final String UNUM = "(?:\\d+(?:\\.\\d+)?|\\.\\d+)";
    private static final Pattern FORM = Pattern.compile("(?<v>" + NUM + ")(?: ?(?<p1>%))?(?: ?(?:"
            + "(?:±|\\+/-|\\+-) ?(?<pm>" + UNUM + ")(?: ?(?<p2>%))?"
            + "|\\( ?(?<ppm>± ?)?(?<pp>" + UNUM + ")(?: ?(?<p3>%))? ?\\)(?: ?(?<p4>%))?"
            + "))?");
    private static final Pattern THOUSANDS = Pattern.compile("[-+]?[1-9]\\d{0,2}(?:,\\d{3})+(?:\\.\\d+)?");
    private static final Pattern LETTER_MARK = Pattern.compile("(.*[\\d%)])([a-f])");
    private static final Pattern KERNING_GAP = Pattern.compile("(?<=\\d) (?=[\\d.])|(?<=\\.) (?=\\d)");
    private static final Pattern SCIENTIFIC = Pattern.compile("[-+]?(?:\\d+(?:\\.\\d+)?|\\.\\d+)[eE][-+]?\\d+");
    private static final Pattern NUMBER_TOKEN =
            Pattern.compile("(?<![\\p{L}\\d.,])[-+]?(?:\\d+(?:[.,]\\d+)?|\\.\\d+)(?![\\p{L}\\d])");

    private CellText() {}

    /** Reads one cell. Null reads as an empty cell. */
    public static ParsedCell parse(String raw) {
        String text = normaliseSpacing(raw);
        if (text.isEmpty()) return new ParsedCell(Kind.EMPTY, null, null, null, false, List.of(), text, 1.0);

        List<String> markers = new ArrayList<>();
        StringBuilder rest = new StringBuilder();
        text.codePoints().forEach(c -> {
            if (MARKERS.indexOf(c) >= 0) markers.add(new String(Character.toChars(c)));
            else rest.appendCodePoint(c);
        });
        String core = rest.toString().replaceAll(" +", " ").strip();
        if (core.isEmpty()) return text(text, 0.5); // only marks: nothing to read

        String missing = mapDashes(core, DASH_GLYPHS, false).toLowerCase(Locale.ROOT).replace(" ", "");
        if (MISSING.contains(missing)) return new ParsedCell(Kind.MISSING, null, null, null, false, markers, text, 1.0);
        if (missing.equals("-/-")) return new ParsedCell(Kind.MISSING, null, null, null, false, markers, text, 0.8);

        String numeric = mapDashes(core, MINUS_GLYPHS, true);
        String joined = KERNING_GAP.matcher(numeric).replaceAll("");
        List<String> candidates = joined.equals(numeric) ? List.of(numeric) : List.of(numeric, joined);
        for (int i = 0; i < candidates.size(); i++) {
            String candidate = candidates.get(i);
            double gap = i == 0 ? 1.0 : 0.6; // the second candidate has its kerning gaps joined
            ParsedCell cell = number(candidate, markers, text, gap);
            if (cell != null) return cell;
            Matcher letter = LETTER_MARK.matcher(candidate);
            if (letter.matches()) {
                List<String> withLetter = new ArrayList<>(markers);
                withLetter.add(letter.group(2));
                cell = number(letter.group(1), withLetter, text, gap * 0.7);
                if (cell != null) return cell;
            }
        }
        if (SCIENTIFIC.matcher(numeric).matches()) return text(text, 0.5);
        long numbers = NUMBER_TOKEN.matcher(numeric).results().count();
        if (numbers >= 2) return text(text, 0.3);
        if (numbers == 1 && !numeric.codePoints().anyMatch(Character::isLetter)) return text(text, 0.5);
        return text(text, 1.0);
    }

    /** A number form, or null when the candidate is not one. */
    private static ParsedCell number(String candidate, List<String> markers, String text, double confidence) {
        Matcher m = FORM.matcher(candidate);
        if (!m.matches()) return null;
        String value = m.group("v");
        if (value.indexOf(',') >= 0) confidence *= THOUSANDS.matcher(value).matches() ? 0.8 : 0.6;
        String pm = m.group("pm") != null ? m.group("pm") : m.group("pp");
        UncertaintyStyle style = m.group("pm") != null || m.group("ppm") != null ? UncertaintyStyle.PLUS_MINUS
                : m.group("pp") != null ? UncertaintyStyle.PARENTHESES : null;
        boolean percent = m.group("p1") != null || m.group("p2") != null || m.group("p3") != null
                || m.group("p4") != null;
        return new ParsedCell(Kind.NUMBER, value, pm, style, percent, markers, text, confidence);
    }

    /** A text cell; its trailing marks (not '#', which ends names such as "C#") are its markers. */
    private static ParsedCell text(String text, double confidence) {
        int end = text.length();
        while (end > 0 && "†‡*§¶‖".indexOf(text.charAt(end - 1)) >= 0) end--;
        List<String> markers = new ArrayList<>();
        if (end > 0) for (int i = end; i < text.length(); i++) markers.add(String.valueOf(text.charAt(i)));
        return new ParsedCell(Kind.TEXT, null, null, null, false, markers, text, confidence);
    }

    /** Replaces dash glyphs by '-'; with beforeNumber, only those directly before a digit or a point. */
    private static String mapDashes(String s, String glyphs, boolean beforeNumber) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            boolean next = i + 1 < s.length() && (Character.isDigit(s.charAt(i + 1)) || s.charAt(i + 1) == '.');
            b.append(glyphs.indexOf(c) >= 0 && (!beforeNumber || next) ? '-' : c);
        }
        return b.toString();
    }

    /** The plain decimal form of a printed number (see {@link ParsedCell#plainValue()}). */
    static String plain(String printed) {
        String t = THOUSANDS.matcher(printed).matches() ? printed.replace(",", "") : printed.replace(',', '.');
        int digits = t.startsWith("-") || t.startsWith("+") ? 1 : 0;
        if (t.startsWith(".", digits)) t = t.substring(0, digits) + "0" + t.substring(digits);
        return t;
    }

    /**
     * Normalises a header or row label: compatibility forms folded by NFKC (Unicode Standard Annex #15, so
     * "ﬁ" becomes "fi" and full-width letters become ASCII) except the marks → ↔ ± × † ‡; runs of white space
     * (NBSP and thin space included) made one space; trimmed; no space before , . ; : ) or after (.
     * Hyphens are left as printed: a line-break hyphen cannot be told from a real one here.
     */
    public static String normaliseLabel(String s) {
        return normaliseSpacing(s).replaceAll(" (?=[,.;:)])", "").replaceAll("(?<=\\() ", "");
    }

    /** NFKC outside {@link #KEEP}, zero-width characters dropped, white space collapsed and trimmed. */
    static String normaliseSpacing(String s) {
        if (s == null) return "";
        StringBuilder out = new StringBuilder(s.length());
        StringBuilder run = new StringBuilder();
        s.codePoints().forEach(c -> {
            if (KEEP.indexOf(c) >= 0) {
                out.append(Normalizer.normalize(run, Normalizer.Form.NFKC)).appendCodePoint(c);
                run.setLength(0);
            } else {
                run.appendCodePoint(c);
            }
        });
        out.append(Normalizer.normalize(run, Normalizer.Form.NFKC));
        return out.toString().replaceAll("[\\u200B\\u200C\\u200D\\u2060\\uFEFF\\u00AD]", "")
                .replaceAll("[\\s\\p{Z}\\u0085]+", " ").strip();
    }
}
