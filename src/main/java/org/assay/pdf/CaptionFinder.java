package org.assay.pdf;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Finds table and figure captions on a page. A caption starts a phrase with "Table N" or "Tab. N"
 * (arabic or roman numerals) followed by ":" or "." or by nothing else on an upper-case label line;
 * a mention inside running text ("Table 2 shows") is not a caption. Following lines of the same
 * paragraph are joined to it.
 */
final class CaptionFinder {
    private static final Pattern LABEL = Pattern.compile(
            "^(Table|TABLE|Tab\\.|Tbl\\.|Figure|FIGURE|Fig\\.)\\s*([0-9]+[A-Za-z]?|[IVXLC]+)\\s*([:.|]|$)(.*)");

    private CaptionFinder() {}

    static List<Caption> find(List<TextLine> lines, PageColumns columns, List<Rule> rules) {
        List<Caption> out = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            TextLine line = lines.get(i);
            for (int p = 0; p < line.phrases().size(); p++) {
                Phrase first = line.phrases().get(p);
                if (!first.text().matches("^(Table|TABLE|Tab\\.|Tbl\\.|Figure|FIGURE|Fig\\.).*")) continue;
                // A justified caption line spreads its words apart: read the label over the next phrases too.
                StringBuilder start = new StringBuilder(first.text());
                for (int k = p + 1; k < line.phrases().size() && k <= p + 2; k++) start.append(' ').append(line.phrases().get(k).text());
                Matcher m = LABEL.matcher(CellText.normaliseLabel(start.toString()));
                if (!m.find()) continue;
                String rest = m.group(4).strip();
                boolean separator = !m.group(3).isEmpty();
                boolean labelOnly = rest.isEmpty();
                if (!separator && !labelOnly && !m.group(1).equals("TABLE")) continue;
                out.add(caption(lines, i, p, m.group(1), m.group(2), columns, rules));
                break;
            }
        }
        return out;
    }

    private static Caption caption(List<TextLine> lines, int lineIndex, int phraseIndex, String label, String number,
                                   PageColumns columns, List<Rule> rules) {
        TextLine line = lines.get(lineIndex);
        List<Phrase> phrases = line.phrases();
        Phrase start = phrases.get(phraseIndex);
        double gutter = columns.gutter();
        StringBuilder text = new StringBuilder(start.text());
        double x0 = start.x0(), x1 = start.x1();
        for (int k = phraseIndex + 1; k < phrases.size(); k++) {
            Phrase next = phrases.get(k);
            boolean crossesGutter = columns.twoColumns() && start.x0() < gutter && next.x0() > gutter
                    && next.x0() - x1 > 0.6 * line.size();
            if (crossesGutter || next.x0() - x1 > 3.0 * line.size()) break;
            text.append(' ').append(next.text());
            x1 = next.x1();
        }
        double[] column = columns.columnOf(x0, x1);
        double firstX0 = x0, firstX1 = x1;
        double top = line.top(), bottom = line.baseline() + 0.15 * line.size(), lastBaseline = line.baseline();
        for (int j = lineIndex + 1; j < lines.size(); j++) {
            TextLine next = lines.get(j);
            if (next.baseline() - lastBaseline > 1.6 * line.size()) break;
            double from = lastBaseline, to = next.top();
            if (rules.stream().anyMatch(r -> r.horizontal() && r.y() > from && r.y() < to)) break; // a table's rule
            // Later lines of the paragraph lie under its first line; a figure beside it does not.
            double fx0 = firstX0, fx1 = firstX1;
            List<Phrase> inColumn = next.phrases().stream()
                    .filter(ph -> ph.x0() >= column[0] - 1 && ph.x1() <= column[1] + 1
                            && ph.overlapX(fx0, fx1) >= 0.5 * ph.width()).toList();
            if (inColumn.isEmpty()) continue; // a figure's labels on a line of their own
            if (LABEL.matcher(inColumn.get(0).text()).find()) break;
            for (Phrase ph : inColumn) {
                // A word hyphenated at the line end joins its rest without a space ("num-" "ber").
                boolean hyphenated = text.length() > 1 && text.charAt(text.length() - 1) == '-'
                        && Character.isLetter(text.charAt(text.length() - 2));
                if (!hyphenated) text.append(' ');
                text.append(ph.text());
                x0 = Math.min(x0, ph.x0());
                x1 = Math.max(x1, ph.x1());
            }
            bottom = next.baseline() + 0.15 * next.size(); // descenders may touch a rule set right below
            lastBaseline = next.baseline();
        }
        String kind = label.toLowerCase(java.util.Locale.ROOT).startsWith("t") ? "table" : "figure";
        return new Caption(kind, number, CellText.normaliseLabel(text.toString()), x0, x1, top, bottom, line.size());
    }
}
