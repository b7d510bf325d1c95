package org.assay.data.retrieval;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Which candidates are relevant to each query, by index: {@code relevant[q]} holds query q's
 * relevant candidate indices, sorted and distinct.
 */
public record Relevance(int queries, int candidates, int[][] relevant) {

    public Relevance {
        if (relevant.length != queries) throw new IllegalArgumentException("one list per query");
        for (int[] r : relevant) {
            for (int i = 0; i < r.length; i++) {
                if (r[i] < 0 || r[i] >= candidates) throw new IllegalArgumentException("candidate " + r[i] + " out of range");
                if (i > 0 && r[i] <= r[i - 1]) throw new IllegalArgumentException("relevant lists must be sorted and distinct");
            }
        }
    }

    /**
     * The group-size rule: candidate j is relevant to query j / G. With rows = images and
     * G captions per image, image i's captions are i*G .. i*G+G-1 (there must be exactly
     * rows * G candidates).
     */
    public static Relevance groupSize(int queries, int candidates, int groupSize) {
        checkGroupShape(queries, candidates, groupSize, candidates);
        int[][] rel = new int[queries][groupSize];
        for (int q = 0; q < queries; q++) {
            for (int g = 0; g < groupSize; g++) rel[q][g] = q * groupSize + g;
        }
        return new Relevance(queries, candidates, rel);
    }

    /**
     * The group-size rule seen from the other side: query j (a caption) has the single relevant
     * candidate j / G (its image); there must be exactly candidates * G queries.
     */
    public static Relevance groupSizeTransposed(int queries, int candidates, int groupSize) {
        checkGroupShape(candidates, queries, groupSize, queries);
        int[][] rel = new int[queries][];
        for (int q = 0; q < queries; q++) rel[q] = new int[] {q / groupSize};
        return new Relevance(queries, candidates, rel);
    }

    private static void checkGroupShape(int groups, int members, int groupSize, int what) {
        if (groupSize < 1) {
            throw org.assay.common.UserInputException.usage("group size must be at least 1, not " + groupSize,
                    "give the number of candidates per query, e.g. 5 captions per image");
        }
        if ((long) groups * groupSize != members) {
            throw org.assay.common.UserInputException.usage("group size " + groupSize + " needs " + groups + " x "
                            + groupSize + " = " + (long) groups * groupSize + " members, but the matrix has " + what,
                    "check the group size and which side of the matrix holds the groups");
        }
    }

    /** The same relation read the other way: candidate c's relevant "candidates" are the queries it is relevant to. */
    public Relevance transposed() {
        List<List<Integer>> lists = new ArrayList<>();
        for (int c = 0; c < candidates; c++) lists.add(new ArrayList<>());
        for (int q = 0; q < queries; q++) for (int c : relevant[q]) lists.get(c).add(q);
        int[][] rel = new int[candidates][];
        for (int c = 0; c < candidates; c++) rel[c] = lists.get(c).stream().mapToInt(Integer::intValue).toArray();
        return new Relevance(candidates, queries, rel);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Relevance r && r.queries == queries && r.candidates == candidates
                && Arrays.deepEquals(r.relevant, relevant);
    }

    @Override
    public int hashCode() { return 31 * (31 * queries + candidates) + Arrays.deepHashCode(relevant); }

    @Override
    public String toString() { return "Relevance[" + queries + " queries, " + candidates + " candidates]"; }
}
