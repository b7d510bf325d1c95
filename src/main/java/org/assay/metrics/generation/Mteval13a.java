package org.assay.metrics.generation;

import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import org.assay.data.generation.Whitespace;

/**
 * The text normalisation of NIST's mteval-v13a script (its NormalizeText routine, the rules
 * written here from the published script, common practice for BLEU in MT evaluation):
 * <ol>
 *   <li>remove {@code <skipped>} tags;</li>
 *   <li>join end-of-line hyphenation ({@code "-\n"} removed), then turn line breaks into spaces;</li>
 *   <li>unescape {@code &quot; &amp; &lt; &gt;}, in that order (so {@code &amp;lt;} becomes {@code <},
 *       as in the script);</li>
 *   <li>pad with a space, lower-case when asked;</li>
 *   <li>split off the ASCII punctuation {@code { | } ~ [ \ ] ^ _ ` ! " # $ % & ( ) * + : ; < = > ? @ /};</li>
 *   <li>split off a period or comma unless preceded by a digit, then unless followed by a digit;</li>
 *   <li>split off a dash preceded by a digit;</li>
 *   <li>split on whitespace.</li>
 * </ol>
 * Lower-casing is Unicode ({@link String#toLowerCase} in the root locale, like NLTK 3.8's
 * NISTTokenizer); the script's {@code tr/[A-Z]/[a-z]/} lower-cases ASCII letters only.
 * NLTK 3.8's NISTTokenizer differs in two places, each tested in {@code TokenizerTest}: it
 * unescapes with XML rules ({@code &amp;lt;} stays {@code &lt;}; it also unescapes {@code &apos;
 * &#124; &#91; &#93;}), and it does not join {@code "-\n"}.
 */
final class Mteval13a {
    private Mteval13a() {}

    private static final Pattern PUNCTUATION = Pattern.compile("([\\x7B-\\x7E\\x5B-\\x60\\x20-\\x26\\x28-\\x2B\\x3A-\\x40/])");
    private static final Pattern PERIOD_COMMA_AFTER_NON_DIGIT = Pattern.compile("([^0-9])([.,])");
    private static final Pattern PERIOD_COMMA_BEFORE_NON_DIGIT = Pattern.compile("([.,])([^0-9])");
    private static final Pattern DASH_AFTER_DIGIT = Pattern.compile("([0-9])(-)");

    static List<String> tokens(String text, boolean lowercase) {
        return Whitespace.split(normalize(text, lowercase));
    }

    /** The normalised text, tokens separated by spaces (runs of spaces not yet collapsed). */
    static String normalize(String text, boolean lowercase) {
        String t = text.replace("<skipped>", "")
                .replace("-\n", "")
                .replace("\n", " ")
                .replace("&quot;", "\"")
                .replace("&amp;", "&")
                .replace("&lt;", "<")
                .replace("&gt;", ">");
        t = " " + t + " ";
        if (lowercase) t = t.toLowerCase(Locale.ROOT);
        t = PUNCTUATION.matcher(t).replaceAll(" $1 ");
        t = PERIOD_COMMA_AFTER_NON_DIGIT.matcher(t).replaceAll("$1 $2 ");
        t = PERIOD_COMMA_BEFORE_NON_DIGIT.matcher(t).replaceAll(" $1 $2");
        t = DASH_AFTER_DIGIT.matcher(t).replaceAll("$1 $2 ");
        return t;
    }
}
