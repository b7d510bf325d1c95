package org.assay.claims;

import java.util.List;

/**
 * A results table: its claims and the facts that shape every check on them.
 *
 * @param testSize items the published numbers were computed on, or null when unknown
 * @param runs     runs averaged into each printed value (1 when not stated)
 */
public record ClaimTable(String id, String caption, Integer testSize, int runs, List<Claim> claims) {
    public ClaimTable {
        claims = List.copyOf(claims);
    }
}
