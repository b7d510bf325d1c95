package org.assay.report;

import java.util.Locale;

/**
 * A small SVG writer for the report's plots: elements, attributes and text, with every attribute
 * value and every text escaped ({@link Escape#html}, whose five entities are also XML's), and numbers
 * written with {@link Locale#ROOT} and fixed decimals so the same plot always gives the same bytes.
 * Element and attribute names are the callers' constants, never data.
 */
final class Svg {
    private final StringBuilder out = new StringBuilder(4096);

    /** Opens {@code <name a="v" ...>}; {@code attributes} alternate name and value. */
    Svg open(String name, String... attributes) {
        tag(name, attributes);
        out.append('>');
        return this;
    }

    /** Writes an empty element {@code <name a="v" .../>}. */
    Svg leaf(String name, String... attributes) {
        tag(name, attributes);
        out.append("/>");
        return this;
    }

    /** Writes {@code <name ...>text</name>} with the text escaped. */
    Svg element(String name, String text, String... attributes) {
        return open(name, attributes).text(text).close(name);
    }

    Svg text(String text) {
        out.append(Escape.html(text));
        return this;
    }

    Svg close(String name) {
        out.append("</").append(name).append('>');
        return this;
    }

    /** A line break between elements, so the source stays readable and diffs stay small. */
    Svg newline() {
        out.append('\n');
        return this;
    }

    @Override
    public String toString() { return out.toString(); }

    /** A coordinate with two decimals ("12.50"); never "-0.00". */
    static String num(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.equals("-0.00") ? "0.00" : s;
    }

    /**
     * Splits text into lines of at most about {@code width} characters at spaces (SVG text does not
     * wrap by itself); a word longer than a line gets a line of its own.
     */
    static java.util.List<String> wrap(String text, int width) {
        java.util.List<String> lines = new java.util.ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.strip().split("\\s+")) {
            if (line.length() > 0 && line.length() + 1 + word.length() > width) {
                lines.add(line.toString());
                line.setLength(0);
            }
            if (line.length() > 0) line.append(' ');
            line.append(word);
        }
        if (line.length() > 0 || lines.isEmpty()) lines.add(line.toString());
        return lines;
    }

    private void tag(String name, String... attributes) {
        if (attributes.length % 2 != 0) throw new IllegalArgumentException("attributes come in name/value pairs");
        out.append('<').append(name);
        for (int i = 0; i < attributes.length; i += 2) {
            out.append(' ').append(attributes[i]).append("=\"").append(Escape.html(attributes[i + 1])).append('"');
        }
    }
}
