package org.assay.metrics.generation;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.assay.data.generation.Whitespace;

/**
 * The answer normalisation of the SQuAD v1.1 evaluation (Rajpurkar, Zhang, Lopyrev and Liang 2016,
 * "SQuAD: 100,000+ Questions for Machine Comprehension of Text", EMNLP; the steps as recalled
 * from memory of its evaluation script): lower-case; remove ASCII punctuation (Python's
 * {@code string.punctuation}); replace the articles a, an, the, standing as whole words, by a
 * space; collapse whitespace.
 *
 * <p>"Whole word" is Python's regex {@code \b(a|an|the)\b}: an article is a maximal run of word
 * characters equal to one of them. Python's word characters (letters, numbers and the underscore)
 * are matched by hand ({@link #isWordCharacter}) because Java's {@code \b} counts combining marks
 * and connector punctuation as word characters and Python does not.
 */
final class AnswerNormalizer {
    private AnswerNormalizer() {}

    private static final String PUNCTUATION = "!\"#$%&'()*+,-./:;<=>?@[\\]^_`{|}~";

    static String normalize(String text) {
        String lower = text.toLowerCase(Locale.ROOT);
        StringBuilder noPunctuation = new StringBuilder(lower.length());
        lower.codePoints().filter(cp -> cp > 0x7F || PUNCTUATION.indexOf(cp) < 0).forEach(noPunctuation::appendCodePoint);
        return String.join(" ", Whitespace.split(withoutArticles(noPunctuation.toString())));
    }

    /** The normalised text's words (SQuAD's token F1 splits the normalised answer on whitespace). */
    static List<String> words(String text) { return Whitespace.split(normalize(text)); }

    private static String withoutArticles(String text) {
        StringBuilder out = new StringBuilder(text.length());
        int i = 0;
        while (i < text.length()) {
            int cp = text.codePointAt(i);
            if (!isWordCharacter(cp)) {
                out.appendCodePoint(cp);
                i += Character.charCount(cp);
                continue;
            }
            int end = i;
            while (end < text.length() && isWordCharacter(text.codePointAt(end))) end += Character.charCount(text.codePointAt(end));
            String word = text.substring(i, end);
            out.append(word.equals("a") || word.equals("an") || word.equals("the") ? " " : word);
            i = end;
        }
        return out.toString();
    }

    /** Python's {@code \w} on str patterns: letters (L*), numbers (N*) and the underscore. */
    static boolean isWordCharacter(int cp) {
        if (cp == '_') return true;
        return switch (Character.getType(cp)) {
            case Character.UPPERCASE_LETTER, Character.LOWERCASE_LETTER, Character.TITLECASE_LETTER,
                 Character.MODIFIER_LETTER, Character.OTHER_LETTER,
                 Character.DECIMAL_DIGIT_NUMBER, Character.LETTER_NUMBER, Character.OTHER_NUMBER -> true;
            default -> false;
        };
    }

    /**
     * SQuAD v1.1's token F1 of one prediction against one answer (from memory of its evaluation
     * script): with c the size of the multiset intersection of the two word lists, 0 when c = 0,
     * else 2PR/(P+R) with P = c/|prediction| and R = c/|answer|.
     */
    static double tokenF1(List<String> prediction, List<String> answer) {
        Map<String, Integer> p = Ngrams.ofTokens(prediction, 1), a = Ngrams.ofTokens(answer, 1);
        int common = Ngrams.overlap(p, a);
        if (common == 0) return 0;
        double precision = (double) common / prediction.size(), recall = (double) common / answer.size();
        return 2 * precision * recall / (precision + recall);
    }
}
