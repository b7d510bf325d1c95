package org.assay.data.retrieval;

/**
 * How to recognise candidates a pipeline did not score but filled with one constant value
 * (for example -100) below every real score.
 *
 * <ul>
 *   <li>{@link #none()}: every value is a real score.</li>
 *   <li>{@link #detect()} (the default): the smallest value in the whole matrix is the sentinel
 *       when at least one query has it two or more times. A single occurrence ranks last either
 *       way, so it changes nothing.</li>
 *   <li>{@link #value(double)}: the caller names the value; a query with a real score below it
 *       is an error, as the sentinel would then not mark the tail of its ranking.</li>
 * </ul>
 * In a query whose list holds the sentinel {@code m >= 2} times, the tail of m tied candidates
 * has no real order: the query's scored depth is candidates - m and a relevant candidate in the
 * tail is "not retrieved within the depth". A detected sentinel can also be a genuine tie at
 * the bottom; that only lowers the depth (metrics at large K are then reported not computable),
 * it never changes a rank within the depth.
 */
public record SentinelRule(Kind kind, double given) {
    public enum Kind { NONE, DETECT, VALUE }

    public static SentinelRule none() { return new SentinelRule(Kind.NONE, Double.NaN); }

    public static SentinelRule detect() { return new SentinelRule(Kind.DETECT, Double.NaN); }

    public static SentinelRule value(double v) {
        if (Double.isNaN(v)) throw org.assay.common.UserInputException.usage("the sentinel value cannot be NaN", "give a number");
        return new SentinelRule(Kind.VALUE, v);
    }

    /** A score as a user would type it: -100 rather than -100.0. */
    public static String plain(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
