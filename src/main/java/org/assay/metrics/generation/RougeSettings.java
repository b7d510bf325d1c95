package org.assay.metrics.generation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.assay.data.generation.GenerationData;

/**
 * The settings every ROUGE variant takes, and the tokenization they share.
 *
 * <p>Tokens: the text is lower-cased (unless {@code lowercase=false}) and cut into maximal runs of
 * letters and decimal digits (Unicode categories L* and Nd); every other character separates
 * tokens and is dropped. With {@code stem=true} each token is replaced by its Porter stem
 * ({@link PorterStemming}), computed on its lower-case form. Lower-casing, dropping punctuation and
 * optional Porter stemming are the usual ROUGE preprocessing (common practice; Lin 2004 reports
 * ROUGE with and without stemming).
 *
 * @param measure   which of ROUGE's three numbers is reported
 * @param stem      Porter-stem every token
 * @param lowercase lower-case the text before tokenizing
 */
record RougeSettings(RougeMeasure measure, boolean stem, boolean lowercase) {

    static final Set<String> PARAMS = Set.of("measure", "stem", "lowercase");

    static RougeSettings read(String metric, Map<String, String> params) {
        String m = GenerationSettings.choice(metric, params, "measure", "f", List.of("f", "precision", "recall"));
        return new RougeSettings(RougeMeasure.parse(m), GenerationSettings.flag(metric, params, "stem", false),
                GenerationSettings.flag(metric, params, "lowercase", true));
    }

    /** The settings line, e.g. {@code measure=f stem=false lowercase=true refs=2}. */
    String line(GenerationData data) {
        return GenerationSettings.line(GenerationSettings.settings("measure", measure.id(), "stem", stem,
                "lowercase", lowercase), data);
    }

    /** The tokens of {@code text} under these settings. */
    List<String> tokens(String text, PorterStemming stemmer) {
        String t = lowercase ? text.toLowerCase(Locale.ROOT) : text;
        List<String> out = new ArrayList<>();
        int i = 0;
        while (i < t.length()) {
            if (!isWordCharacter(t.codePointAt(i))) {
                i += Character.charCount(t.codePointAt(i));
                continue;
            }
            int start = i;
            while (i < t.length() && isWordCharacter(t.codePointAt(i))) i += Character.charCount(t.codePointAt(i));
            out.add(token(t.substring(start, i), stemmer));
        }
        return out;
    }

    private static boolean isWordCharacter(int cp) {
        return Character.isLetter(cp) || Character.getType(cp) == Character.DECIMAL_DIGIT_NUMBER;
    }

    private String token(String word, PorterStemming stemmer) {
        return stem ? stemmer.stem(word.toLowerCase(Locale.ROOT)) : word;
    }
}
