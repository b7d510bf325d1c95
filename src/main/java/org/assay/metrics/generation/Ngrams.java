package org.assay.metrics.generation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Counting n-grams, once per text, for the n-gram metrics. */
final class Ngrams {
    private Ngrams() {}

    /**
     * The n-grams of {@code tokens} with their counts, each keyed by its tokens joined with a
     * space. Tokens never hold whitespace (every tokenizer splits on it), so the key is unambiguous.
     */
    static Map<String, Integer> ofTokens(List<String> tokens, int n) {
        int grams = total(tokens.size(), n);
        Map<String, Integer> counts = new HashMap<>(Math.max(16, 2 * grams));   // sized once: no rehashing
        StringBuilder key = new StringBuilder();
        for (int i = 0; i < grams; i++) {
            key.setLength(0);
            key.append(tokens.get(i));
            for (int k = 1; k < n; k++) key.append(' ').append(tokens.get(i + k));
            counts.merge(key.toString(), 1, Integer::sum);
        }
        return counts;
    }

    /** The n-grams of a sequence of code points, each keyed by its n code points. */
    static Map<String, Integer> ofCodePoints(int[] codePoints, int n) {
        Map<String, Integer> counts = new HashMap<>();
        for (int i = 0; i + n <= codePoints.length; i++) counts.merge(new String(codePoints, i, n), 1, Integer::sum);
        return counts;
    }

    /** How many n-grams a sequence of {@code length} elements has. */
    static int total(int length, int n) { return Math.max(0, length - n + 1); }

    /** The size of the multiset intersection: the sum over n-grams of the smaller count. */
    static int overlap(Map<String, Integer> a, Map<String, Integer> b) {
        Map<String, Integer> small = a.size() <= b.size() ? a : b, large = small == a ? b : a;
        int sum = 0;
        for (Map.Entry<String, Integer> e : small.entrySet()) {
            Integer other = large.get(e.getKey());
            if (other != null) sum += Math.min(e.getValue(), other);
        }
        return sum;
    }
}
