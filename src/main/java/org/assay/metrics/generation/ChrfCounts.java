package org.assay.metrics.generation;

import java.util.List;
import java.util.Locale;
import org.assay.data.generation.Whitespace;

/**
 * One hypothesis-reference pair's chrF statistics, in the layout of one {@link CountTable} row:
 * for each order j (character n-grams n = 1..charOrder, then word n-grams n = 1..wordOrder),
 * three counts at {@code 3j, 3j+1, 3j+2}: matching n-grams (the sum over n-grams of the smaller
 * of the two counts), n-grams in the hypothesis, n-grams in the reference.
 * Character n-grams are taken over the text with its whitespace removed (Popović 2015, WMT);
 * words are the text split on whitespace (Popović 2017, WMT), punctuation left attached.
 * Characters are Unicode code points.
 */
final class ChrfCounts {
    private ChrfCounts() {}

    static int width(int charOrder, int wordOrder) { return 3 * (charOrder + wordOrder); }

    /** A text prepared once: its characters without whitespace, and its words. */
    record Prepared(int[] characters, List<String> words) {
        static Prepared of(String text, boolean lowercase) {
            String t = lowercase ? text.toLowerCase(Locale.ROOT) : text;
            return new Prepared(Whitespace.remove(t).codePoints().toArray(), Whitespace.split(t));
        }
    }

    static int[] of(Prepared hypothesis, Prepared reference, int charOrder, int wordOrder) {
        int[] row = new int[width(charOrder, wordOrder)];
        for (int n = 1; n <= charOrder; n++) {
            int j = 3 * (n - 1);
            row[j] = Ngrams.overlap(Ngrams.ofCodePoints(hypothesis.characters(), n),
                    Ngrams.ofCodePoints(reference.characters(), n));
            row[j + 1] = Ngrams.total(hypothesis.characters().length, n);
            row[j + 2] = Ngrams.total(reference.characters().length, n);
        }
        for (int n = 1; n <= wordOrder; n++) {
            int j = 3 * (charOrder + n - 1);
            row[j] = Ngrams.overlap(Ngrams.ofTokens(hypothesis.words(), n), Ngrams.ofTokens(reference.words(), n));
            row[j + 1] = Ngrams.total(hypothesis.words().size(), n);
            row[j + 2] = Ngrams.total(reference.words().size(), n);
        }
        return row;
    }
}
