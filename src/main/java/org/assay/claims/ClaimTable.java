package org.assay.claims;

import java.util.List;
import java.util.Map;

/**
 * A results table: its claims and the facts that shape every check on them.
 *
 * @param testSize    items the published numbers were computed on, or null when unknown
 * @param runs        runs averaged into each printed value (1 when not stated)
 * @param classCounts items per class in the test set (label to count), empty when not stated
 * @param compare     pairs of row labels the table compares (for example ours vs the strongest baseline)
 */
public record ClaimTable(String id, String caption, Integer testSize, int runs, List<Claim> claims,
                         Map<String, Long> classCounts, List<List<String>> compare) {
    public ClaimTable {
        claims = List.copyOf(claims);
        classCounts = Map.copyOf(classCounts);
        compare = compare.stream().map(List::copyOf).toList();
    }

    public ClaimTable(String id, String caption, Integer testSize, int runs, List<Claim> claims) {
        this(id, caption, testSize, runs, claims, Map.of(), List.of());
    }
}
