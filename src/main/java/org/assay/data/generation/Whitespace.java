package org.assay.data.generation;

import java.util.ArrayList;
import java.util.List;

/**
 * Whitespace as Python's {@code str.isspace()} and {@code str.split()} define it, which the
 * generation metrics' reference implementations split on. Java's {@code \s} is ASCII only and
 * {@link Character#isWhitespace} leaves out the no-break spaces (U+00A0, U+2007, U+202F) and
 * U+0085, so neither matches; the set here is every code point of general category Zs, Zl or Zp
 * plus the controls TAB, LF, VT, FF, CR, U+001C..U+001F and U+0085 (checked code point by code
 * point against Python in {@code WhitespaceTest}).
 */
public final class Whitespace {
    private Whitespace() {}

    public static boolean isSpace(int codePoint) {
        return Character.isSpaceChar(codePoint)
                || (codePoint >= 0x09 && codePoint <= 0x0D)
                || (codePoint >= 0x1C && codePoint <= 0x1F)
                || codePoint == 0x85;
    }

    /** True when {@code text} has no character other than whitespace. */
    public static boolean isBlank(String text) {
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            if (!isSpace(cp)) return false;
            i += Character.charCount(cp);
        }
        return true;
    }

    /** The runs of non-whitespace of {@code text}, in order (Python's {@code text.split()}). */
    public static List<String> split(String text) {
        List<String> out = new ArrayList<>();
        int start = -1;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            if (isSpace(cp)) {
                if (start >= 0) out.add(text.substring(start, i));
                start = -1;
            } else if (start < 0) {
                start = i;
            }
            i += Character.charCount(cp);
        }
        if (start >= 0) out.add(text.substring(start));
        return out;
    }

    /** {@code text} without its whitespace characters. */
    public static String remove(String text) {
        StringBuilder sb = new StringBuilder(text.length());
        text.codePoints().filter(cp -> !isSpace(cp)).forEach(sb::appendCodePoint);
        return sb.toString();
    }
}
