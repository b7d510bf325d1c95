package org.assay.metrics.generation;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * One item's BLEU statistics (Papineni et al. 2002, "BLEU: a method for automatic evaluation of
 * machine translation", ACL, sections 2.1 and 2.2), in the layout of one {@link CountTable} row:
 * <pre>
 *   [0, order)          matches_n: hypothesis n-grams clipped by the largest count of that n-gram in any one reference
 *   [order, 2*order)    totals_n:  n-grams in the hypothesis
 *   2*order             hypothesis length (tokens)
 *   2*order + 1         the length of the reference closest to it (ties: the shorter)
 * </pre>
 */
final class BleuCounts {
    private BleuCounts() {}

    static int width(int order) { return 2 * order + 2; }

    static int[] of(List<String> hypothesis, List<List<String>> references, int order) {
        int[] row = new int[width(order)];
        for (int n = 1; n <= order; n++) {
            Map<String, Integer> hyp = Ngrams.ofTokens(hypothesis, n);
            List<Map<String, Integer>> refs = new ArrayList<>();
            for (List<String> r : references) refs.add(Ngrams.ofTokens(r, n));
            int clipped = 0;
            for (Map.Entry<String, Integer> e : hyp.entrySet()) {
                int max = 0;
                for (Map<String, Integer> r : refs) max = Math.max(max, r.getOrDefault(e.getKey(), 0));
                clipped += Math.min(e.getValue(), max);
            }
            row[n - 1] = clipped;
            row[order + n - 1] = Ngrams.total(hypothesis.size(), n);
        }
        row[2 * order] = hypothesis.size();
        row[2 * order + 1] = closestLength(hypothesis.size(), references);
        return row;
    }

    /** The reference length closest to {@code length}; of two equally close, the shorter. */
    static int closestLength(int length, List<List<String>> references) {
        int best = -1;
        for (List<String> r : references) {
            int len = r.size();
            if (best < 0 || Math.abs(len - length) < Math.abs(best - length)
                    || (Math.abs(len - length) == Math.abs(best - length) && len < best)) {
                best = len;
            }
        }
        return best;
    }
}
