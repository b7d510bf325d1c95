package org.assay.stats;

/**
 * Granularity check for a count-based value: on a test set of N items a proportion is k/N for an
 * integer k, and a value averaged over r runs lies on the grid k/(N*r). A printed value whose
 * rounding interval holds no point of that grid cannot have come from that test set.
 *
 * <p>Source: the GRIM test, Brown &amp; Heathers (2017), "The GRIM test: a simple technique
 * detects numerous anomalies in the reporting of results in psychology", Social Psychological
 * and Personality Science 8(4):363-369: the mean of N integer responses is a multiple of 1/N.
 * Here it is applied to fractions (accuracy, error rate, Recall@K) with the rounding interval
 * of the printed value decided exactly, in O(1).
 */
public final class Granularity {
    private Granularity() {}

    /** Can the printed value be k/denominator for an integer k in [0, denominator]? */
    public static Feasibility ofCount(Printed printed, long denominator) {
        if (denominator < 1) throw new IllegalArgumentException("denominator must be >= 1, got " + denominator);
        FeasibSearch search = new FeasibSearch(printed);
        search.grid(denominator, 0, denominator, (k, d) -> "k = " + k + " of " + d);
        return search.result(true, null);
    }

    /**
     * Can the printed value be a mean over {@code runs} runs of a proportion on {@code items}
     * items, that is k/(items*runs)? The witness names the total count over all runs.
     */
    public static Feasibility ofCount(Printed printed, long items, long runs) {
        if (items < 1) throw new IllegalArgumentException("items must be >= 1, got " + items);
        if (runs < 1) throw new IllegalArgumentException("runs must be >= 1, got " + runs);
        long denominator = Math.multiplyExact(items, runs);
        FeasibSearch search = new FeasibSearch(printed);
        search.grid(denominator, 0, denominator,
                (k, d) -> "k = " + k + " of " + d + " (" + items + " items x " + runs + " runs)");
        return search.result(true, null);
    }
}
