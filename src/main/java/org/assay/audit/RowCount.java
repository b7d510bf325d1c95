package org.assay.audit;

/**
 * What became of the rows of one input file: every row read is either used or set aside for a
 * stated reason, so a report can show that nothing was dropped silently. (A malformed row is never
 * set aside: it stops the run with an error naming its line.)
 *
 * @param read            rows read (data rows, JSON Lines objects, manifest ids, score-matrix queries)
 * @param used            rows that entered the evaluation
 * @param setAsideReason  why the other rows were not used, or null when all were used
 */
public record RowCount(long read, long used, String setAsideReason) {
    public RowCount {
        if (used > read || used < 0) throw new IllegalArgumentException("used " + used + " of " + read + " rows");
        if (used < read && setAsideReason == null) throw new IllegalArgumentException("rows set aside need a reason");
    }

    /** Every row read was used. */
    public static RowCount allUsed(long rows) { return new RowCount(rows, rows, null); }

    public long setAside() { return read - used; }
}
