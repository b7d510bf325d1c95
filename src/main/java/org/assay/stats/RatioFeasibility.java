package org.assay.stats;

/**
 * Granularity checks for ratio metrics of a binary or multi-class confusion matrix on a test set
 * of known size: can any confusion matrix (or ranking) on that many items print as the claimed
 * value? The idea is the GRIM test of Brown &amp; Heathers (2017), Social Psychological and
 * Personality Science 8(4):363-369, extended from k/N to the sets of values each metric can take.
 * Every decision is exact integer arithmetic; each check is O(n) in the number of items, except
 * {@link #macroRecall}, which may need a bounded search.
 *
 * <p>Conventions: precision needs at least one positive prediction (TP + FP &gt;= 1) and recall
 * at least one positive item; a value with a zero denominator is not counted as achievable.
 * F1 is taken as 0 when TP = 0, which is scikit-learn's {@code zero_division=0} convention and
 * also the limit 2TP/(2TP+FP+FN) whenever FP + FN &gt; 0.
 */
public final class RatioFeasibility {
    /** Partial sums kept per class in the macro-recall search before it gives up. */
    static final int STATE_CAP = 1_000_000;

    private RatioFeasibility() {}

    /** Recall TP/P with P the positives (null: any P in 1..n). */
    public static Feasibility recall(Printed printed, long n, Long positives) {
        checkItems(n);
        FeasibSearch search = new FeasibSearch(printed);
        FeasibSearch.Witness witness = (tp, p) -> "TP = " + tp + ", FN = " + (p - tp);
        if (positives != null) {
            long p = positives;
            if (p < 1 || p > n) throw new IllegalArgumentException("positives must be in [1, " + n + "] for recall, got " + p);
            search.grid(p, 0, p, witness);
        } else {
            for (long p = 1; p <= n; p++) search.grid(p, 0, p, witness);
        }
        return search.result(true, null);
    }

    /**
     * Precision TP/(TP+FP) with TP &lt;= P and FP &lt;= n-P; with positives null, any TP + FP in
     * 1..n. For each number of positive predictions D the achievable TP form an interval.
     */
    public static Feasibility precision(Printed printed, long n, Long positives) {
        checkItems(n);
        checkPositives(n, positives);
        FeasibSearch search = new FeasibSearch(printed);
        FeasibSearch.Witness witness = (tp, d) -> "TP = " + tp + ", FP = " + (d - tp);
        for (long d = 1; d <= n; d++) {
            long lo = positives == null ? 0 : Math.max(0, d - (n - positives));
            long hi = positives == null ? d : Math.min(positives, d);
            search.grid(d, lo, hi, witness);
        }
        return search.result(true, null);
    }

    /**
     * F1 = 2TP/(2TP+FP+FN) with FN = P - TP. Write it 2TP/D with D = TP + P + FP: for a fixed TP,
     * D runs over an interval ([TP+P, TP+n] with P known; [2TP, TP+n] otherwise, choosing P), so
     * one interval query per TP gives O(n) overall. TP = 0 gives F1 = 0 (see the class comment).
     */
    public static Feasibility f1(Printed printed, long n, Long positives) {
        checkItems(n);
        checkPositives(n, positives);
        FeasibSearch search = new FeasibSearch(printed);
        long zeroFn = positives == null ? 1 : positives;
        search.grid(1, 0, 0, (k, d) -> counts(0, 0, zeroFn, n));
        long maxTp = positives == null ? n : positives;
        for (long tp = 1; tp <= maxTp; tp++) {
            long t = tp;
            if (positives != null) {
                long p = positives;
                search.fixedNumerator(2 * tp, tp + p, tp + n, (a, d) -> counts(t, d - t - p, p - t, n));
            } else {
                // The D - 2TP errors are split between FP and FN; any split gives the same F1.
                search.fixedNumerator(2 * tp, 2 * tp, tp + n, (a, d) -> {
                    long errors = d - 2 * t;
                    return counts(t, errors / 2, errors - errors / 2, n);
                });
            }
        }
        return search.result(true, null);
    }

    /**
     * ROC AUC = U/(nPos*nNeg), U the Mann-Whitney count with ties counted one half, so AUC lies
     * on the grid j/(2*nPos*nNeg). Every j in 0..2*nPos*nNeg is achievable: give the negatives
     * scores 1..nNeg; a positive with score c + 0.5 beats c negatives (2c halves) and one with
     * score c (c &gt;= 1) beats c-1 and ties one (2c-1 halves), so each positive adds any number
     * of halves in 0..2*nNeg independently, and the sums cover 0..2*nPos*nNeg.
     */
    public static Feasibility rocAuc(Printed printed, long positives, long negatives) {
        if (positives < 1 || negatives < 1) {
            throw new IllegalArgumentException("ROC AUC needs >= 1 positive and >= 1 negative, got " + positives + " and " + negatives);
        }
        long pairs = Math.multiplyExact(positives, negatives);
        long halves = Math.multiplyExact(2, pairs);
        FeasibSearch search = new FeasibSearch(printed);
        search.grid(halves, 0, halves, (j, d) -> {
            long ordered = j / 2;
            long tied = j % 2;
            return "U = " + ordered + (tied == 1 ? ".5" : "") + " of " + pairs + " pairs (" + ordered
                    + " ordered correctly, " + tied + " tied, " + (pairs - ordered - tied) + " reversed)";
        });
        return search.result(true, null);
    }

    /**
     * Macro-averaged recall (balanced accuracy): the mean over K classes of TP_c/n_c.
     *
     * <p>Why the shortcut is exact: let n* = max n_c. Setting j of the other classes fully right,
     * the rest fully wrong, and k items of the largest class right gives (j + k/n*)/K for every
     * j in 0..K-1 and k in 0..n*, which is every point i/(K*n*), i = 0..K*n*, of [0, 1]. So the
     * achievable values have no gap wider than 1/(K*n*) in [0, 1]. Every rounding interval is
     * one printed unit wide; when that is wider than 1/(K*n*), an interval meeting [0, 1] holds a
     * grid point (a point of [0, 1] inside it with the interval ending past 0 or 1 means it holds
     * 0 or 1 itself), so the grid alone decides feasibility. Otherwise a search over classes keeps
     * the exact partial sums that can still reach the interval, up to {@link #STATE_CAP}.
     */
    public static Feasibility macroRecall(Printed printed, long[] classCounts) {
        if (classCounts == null || classCounts.length == 0) throw new IllegalArgumentException("no classes");
        for (long c : classCounts) if (c < 1) throw new IllegalArgumentException("every class needs >= 1 item, got " + c);
        int k = classCounts.length;
        int largest = 0;
        for (int c = 1; c < k; c++) if (classCounts[c] > classCounts[largest]) largest = c;
        long nMax = classCounts[largest];
        FeasibSearch search = new FeasibSearch(printed);
        long gridDen = Math.multiplyExact(k, nMax);
        int big = largest;
        search.grid(gridDen, 0, gridDen, (i, d) -> {
            long[] right = new long[k];
            long full = Math.min(i / nMax, k - 1);
            right[big] = i - full * nMax;
            for (int c = 0; c < k && full > 0; c++) {
                if (c != big) {
                    right[c] = classCounts[c];
                    full--;
                }
            }
            return perClass(right, classCounts);
        });
        GridWindow w = GridWindow.of(printed, RoundingRule.HALF_UP);
        boolean gridDecides = GridWindow.compare(2, w.q, 1, gridDen) > 0;   // unit width 2/q > 1/(K n*)
        FeasibMacroSearch dp = new FeasibMacroSearch(printed, classCounts, largest, search);
        if (gridDecides && !dp.small()) {
            return approximateNearest(search.result(true, null));
        }
        if (dp.run()) return search.result(true, null);
        if (gridDecides) return approximateNearest(search.result(true, null));
        return search.result(search.foundAll(), "search stopped after " + STATE_CAP
                + " partial sums per class; a rule without a witness is not shown to be impossible, and the nearest"
                + " values are the nearest found");
    }

    /**
     * When the grid decides feasibility without the full search, the nearest values are only
     * the nearest found; but for a claim outside [0, 1] they are 0 or 1, which are exact.
     */
    private static Feasibility approximateNearest(Feasibility f) {
        if (!f.roundedFeasible() && !f.truncatedFeasible()) return f;
        return new Feasibility(f.roundedFeasible(), f.halfUpFeasible(), f.halfEvenFeasible(), f.truncatedFeasible(),
                f.witness(), f.nearestBelow(), f.nearestAbove(), true,
                (f.note() == null ? "" : f.note() + "; ")
                        + "nearest values are the nearest found; achievable values closer to the claim may exist");
    }

    static String perClass(long[] right, long[] counts) {
        StringBuilder sb = new StringBuilder("correct per class = ");
        for (int c = 0; c < counts.length; c++) {
            if (c > 0) sb.append(", ");
            sb.append(right[c]).append(" of ").append(counts[c]);
        }
        return sb.toString();
    }

    private static String counts(long tp, long fp, long fn, long n) {
        return "TP = " + tp + ", FP = " + fp + ", FN = " + fn + ", TN = " + (n - tp - fp - fn);
    }

    private static void checkItems(long n) {
        if (n < 1) throw new IllegalArgumentException("test-set size must be >= 1, got " + n);
    }

    private static void checkPositives(long n, Long positives) {
        if (positives != null && (positives < 0 || positives > n)) {
            throw new IllegalArgumentException("positives must be in [0, " + n + "], got " + positives);
        }
    }

}
