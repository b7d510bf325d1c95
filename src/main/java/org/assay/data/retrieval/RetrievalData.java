package org.assay.data.retrieval;

import java.util.Arrays;
import java.util.List;

/**
 * Where each query's relevant candidates were ranked: everything the retrieval metrics need.
 *
 * <p>{@code relevantRanks[q]} holds the 1-based ranks of query q's relevant candidates,
 * sorted ascending, one entry per relevant candidate (so its length is the query's relevant
 * count R). Ranks are doubles because the {@link TiePolicy#AVERAGE} policy gives fractional
 * ranks; under the other policies they are whole numbers. A relevant candidate that was not
 * ranked within the query's scored depth (it sits in a sentinel tail, or is absent from a
 * ranked list) has rank {@link Double#POSITIVE_INFINITY}: "not retrieved within the depth".
 *
 * @param direction     a label such as "rows", "columns", "image-to-text" (free text)
 * @param queryIds      one id per query, in the order of {@code relevantRanks}
 * @param candidates    number of candidates each query was ranked against (for ranked lists:
 *                      the distinct candidate ids seen, a lower bound)
 * @param depth         the deepest rank at which every query's ranking is real: the minimum of
 *                      {@code scoredDepth}
 * @param ties          the policy the ranks were computed under
 * @param relevantRanks sorted ranks per query, see above
 * @param scoredDepth   per query, the number of leading ranks that are real (candidates with a
 *                      real score, or the length of the ranked list)
 * @param sentinel      the score value treated as "not scored", or null when none was found
 */
public record RetrievalData(
        String direction,
        List<String> queryIds,
        int candidates,
        int depth,
        TiePolicy ties,
        double[][] relevantRanks,
        int[] scoredDepth,
        Double sentinel) {

    public RetrievalData {
        queryIds = List.copyOf(queryIds);
        if (relevantRanks.length != queryIds.size() || scoredDepth.length != queryIds.size()) {
            throw new IllegalArgumentException("one rank list and one depth per query");
        }
        int min = Integer.MAX_VALUE;
        for (int q = 0; q < scoredDepth.length; q++) {
            min = Math.min(min, scoredDepth[q]);
            double[] r = relevantRanks[q];
            for (int i = 1; i < r.length; i++) {
                if (r[i] < r[i - 1]) throw new IllegalArgumentException("ranks of query " + q + " not sorted");
            }
        }
        if (queryIds.isEmpty()) throw new IllegalArgumentException("no queries");
        if (depth != min) throw new IllegalArgumentException("depth " + depth + " is not the minimum scored depth " + min);
    }

    public int queries() { return queryIds.size(); }

    /** Number of relevant candidates of query q (ranked or not). */
    public int relevantCount(int q) { return relevantRanks[q].length; }

    /** Rank of query q's best-ranked relevant candidate (infinite when none is ranked). */
    public double firstRank(int q) { return relevantRanks[q][0]; }

    @Override
    public boolean equals(Object o) {
        return o instanceof RetrievalData d && direction.equals(d.direction) && queryIds.equals(d.queryIds)
                && candidates == d.candidates && depth == d.depth && ties == d.ties
                && Arrays.deepEquals(relevantRanks, d.relevantRanks) && Arrays.equals(scoredDepth, d.scoredDepth)
                && java.util.Objects.equals(sentinel, d.sentinel);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(direction, queryIds, candidates, depth, ties,
                Arrays.deepHashCode(relevantRanks), Arrays.hashCode(scoredDepth), sentinel);
    }

    @Override
    public String toString() {
        return "RetrievalData[" + direction + ", " + queries() + " queries x " + candidates
                + " candidates, depth " + depth + ", " + ties + (sentinel == null ? "" : ", sentinel " + sentinel) + "]";
    }
}
