package org.assay.metrics.generation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.assay.common.UserInputException;
import org.assay.data.generation.Whitespace;

/**
 * How a text becomes tokens before n-grams are counted. The value of {@code tokenize=} in a
 * metric's parameters. Whitespace is Unicode whitespace as Python's {@code str.split()} sees it
 * ({@link Whitespace}).
 */
public enum Tokenizer {
    /** Split on runs of Unicode whitespace; nothing else (the text is taken as already tokenized). */
    NONE("none"),
    /** The rules of the NIST mteval-v13a script ({@link Mteval13a}), the usual default for BLEU in MT evaluation. */
    V13A("13a"),
    /** Every non-space character is a token, for languages written without spaces. */
    CHAR("char");

    private final String id;

    Tokenizer(String id) { this.id = id; }

    public String id() { return id; }

    /**
     * The tokens of {@code text}, lower-cased (Unicode, root locale) when {@code lowercase}: first
     * for {@code none} and {@code char}, at the step the mteval rules do it for {@code 13a}.
     */
    public List<String> tokens(String text, boolean lowercase) {
        return switch (this) {
            case NONE -> Whitespace.split(lower(text, lowercase));
            case V13A -> Mteval13a.tokens(text, lowercase);
            case CHAR -> characters(lower(text, lowercase));
        };
    }

    private static String lower(String text, boolean lowercase) {
        return lowercase ? text.toLowerCase(Locale.ROOT) : text;
    }

    /** Every code point that is not whitespace, one token each. */
    private static List<String> characters(String text) {
        List<String> out = new ArrayList<>();
        text.codePoints().filter(cp -> !Whitespace.isSpace(cp)).forEach(cp -> out.add(Character.toString(cp)));
        return out;
    }

    public static Tokenizer parse(String text) {
        for (Tokenizer t : values()) if (t.id.equals(text.strip().toLowerCase(Locale.ROOT))) return t;
        throw UserInputException.usage("unknown tokenizer '" + text + "'", "use none, 13a or char");
    }
}
