package org.assay.report;

/** Text made safe for each output format: every value a report prints goes through one of these. */
final class Escape {
    private Escape() {}

    /** HTML text and attribute values. */
    static String html(String s) {
        StringBuilder sb = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }

    /**
     * Markdown table cells and running text: pipes and backslashes escaped, line breaks joined, and
     * angle brackets as entities so that no renderer takes a label for HTML.
     */
    static String markdown(String s) {
        return s.replace("\\", "\\\\").replace("|", "\\|").replace("\r\n", " ").replace('\n', ' ').replace('\r', ' ')
                .replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    /** LaTeX text mode: specials, ligatures and Unicode made printable text ({@link LatexText}). */
    static String latex(String s) {
        return LatexText.of(s);
    }
}
