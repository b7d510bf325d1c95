package org.assay.metrics.generation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.assay.common.UserInputException;

/**
 * How a text becomes tokens before n-grams are counted. The value of {@code tokenize=} in a
 * metric's parameters.
 */
public enum Tokenizer {
    /** Split on runs of whitespace; nothing else (the text is taken as already tokenized). */
    NONE("none"),
    /** The rules of the NIST mteval-v13a script, the usual default for BLEU in MT evaluation. */
    V13A("13a"),
    /** Every non-space character is a token, for languages written without spaces. */
    CHAR("char");

    private final String id;

    Tokenizer(String id) { this.id = id; }

    public String id() { return id; }

    /** The tokens of {@code text}, lower-cased first when {@code lowercase}. */
    public List<String> tokens(String text, boolean lowercase) {
        String t = lowercase ? text.toLowerCase(Locale.ROOT) : text;
        return switch (this) {
            case NONE -> whitespace(t);
            case V13A, CHAR -> throw new UnsupportedOperationException("tokenizer " + id + " is not written yet");
        };
    }

    static List<String> whitespace(String text) {
        List<String> out = new ArrayList<>();
        for (String s : text.strip().split("\\s+")) if (!s.isEmpty()) out.add(s);
        return out;
    }

    public static Tokenizer parse(String text) {
        for (Tokenizer t : values()) if (t.id.equals(text.strip().toLowerCase(Locale.ROOT))) return t;
        throw UserInputException.usage("unknown tokenizer '" + text + "'", "use none, 13a or char");
    }
}
