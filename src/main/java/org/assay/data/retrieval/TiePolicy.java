package org.assay.data.retrieval;

/**
 * Where a relevant candidate lands among candidates with exactly the same score.
 *
 * <p>Within one tie group of size {@code e} starting after {@code g} strictly higher scores,
 * holding {@code m} relevant candidates:
 * <ul>
 *   <li>{@link #OPTIMISTIC}: the relevant candidates take the group's first positions,
 *       g+1 .. g+m (the best order tie-breaking could give);</li>
 *   <li>{@link #PESSIMISTIC}: they take its last positions, g+e-m+1 .. g+e (the worst order);</li>
 *   <li>{@link #AVERAGE}: every member of the group gets the mean of its positions,
 *       g + (e+1)/2, which may be fractional (fractional ranking, as scipy's
 *       {@code rankdata(method='average')}).</li>
 * </ul>
 * The optimistic and pessimistic ranks are ones a real ordering produces, so every metric
 * computed from them is the best or worst value tie-breaking could reach.
 */
public enum TiePolicy {
    OPTIMISTIC,
    PESSIMISTIC,
    AVERAGE;

    /** The default: ties never flatter the result (common practice for audits). */
    public static final TiePolicy DEFAULT = PESSIMISTIC;

    /**
     * The rank of the {@code index}-th (0-based) of {@code relevantInGroup} relevant
     * candidates sharing a score, with {@code higher} candidates scored strictly above and
     * {@code groupSize} candidates at that score (the relevant ones included).
     */
    public double rank(long higher, long groupSize, int relevantInGroup, int index) {
        return switch (this) {
            case OPTIMISTIC -> higher + 1 + index;
            case PESSIMISTIC -> higher + groupSize - relevantInGroup + 1 + index;
            case AVERAGE -> higher + (groupSize + 1) / 2.0;
        };
    }

    /** Parses a policy name as a user types it (case-insensitive). */
    public static TiePolicy parse(String text) {
        for (TiePolicy p : values()) {
            if (p.name().equalsIgnoreCase(text.trim())) return p;
        }
        throw org.assay.common.UserInputException.usage("unknown tie policy '" + text + "'",
                "use optimistic, pessimistic (the default) or average");
    }
}
