package org.assay.stats;

import java.util.EnumMap;
import java.util.Map;

/**
 * Collects achievable values, given family by family as arithmetic progressions
 * (base + t*step)/den or as a fixed numerator over a range of denominators, and keeps per
 * rounding rule the first outcome that prints as the claim, plus the achievable values nearest
 * to the rounded interval on either side. Every decision is exact integer arithmetic.
 */
final class FeasibSearch {
    /** Describes the outcome behind the achievable value num/den in concrete counts. */
    interface Witness {
        String describe(long num, long den);
    }

    private static final RoundingRule[] RULES = RoundingRule.values();

    private final Printed printed;
    private final Map<RoundingRule, GridWindow> windows = new EnumMap<>(RoundingRule.class);
    private final GridWindow rounded;
    private final Map<RoundingRule, String> witnesses = new EnumMap<>(RoundingRule.class);
    private boolean hasBelow;
    private long belowNum;
    private long belowDen = 1;
    private boolean hasAbove;
    private long aboveNum;
    private long aboveDen = 1;

    FeasibSearch(Printed printed) {
        this.printed = printed;
        for (RoundingRule rule : RULES) windows.put(rule, GridWindow.of(printed, rule));
        this.rounded = GridWindow.rounded(printed);
    }

    boolean found(RoundingRule rule) {
        return witnesses.containsKey(rule);
    }

    boolean foundAll() {
        return witnesses.size() == RULES.length;
    }

    /** The values k/den for every integer k in [kLo, kHi] (den &gt; 0). */
    void grid(long den, long kLo, long kHi, Witness witness) {
        progression(den, kLo, 1, kHi - kLo, witness);
    }

    /** The values (base + t*step)/den for t = 0..tMax (den &gt; 0, step &gt; 0). */
    void progression(long den, long base, long step, long tMax, Witness witness) {
        if (tMax < 0) return;
        for (RoundingRule rule : RULES) {
            if (witnesses.containsKey(rule)) continue;
            GridWindow w = windows.get(rule);
            long tFirst = tAtLeast(w.firstK(den), base, step);
            long tLast = tAtMost(w.lastK(den), base, step);
            long t = Math.max(tFirst, 0);
            if (t <= Math.min(tLast, tMax)) {
                long num = base + t * step;
                witnesses.put(rule, witness.describe(num, den));
            }
        }
        long tBelow = Math.min(tMax, tAtLeast(rounded.firstK(den), base, step) - 1);
        if (tBelow >= 0) offerBelow(base + tBelow * step, den);
        long tAbove = Math.max(0, tAtMost(rounded.lastK(den), base, step) + 1);
        if (tAbove <= tMax) offerAbove(base + tAbove * step, den);
    }

    /** The values a/d for every integer d in [dLo, dHi] (a &gt; 0, dLo &gt; 0). */
    void fixedNumerator(long a, long dLo, long dHi, Witness witness) {
        if (dLo > dHi) return;
        for (RoundingRule rule : RULES) {
            if (witnesses.containsKey(rule)) continue;
            GridWindow w = windows.get(rule);
            long d = Math.max(dLo, w.minDen(a));
            if (d <= Math.min(dHi, w.maxDen(a))) witnesses.put(rule, witness.describe(a, d));
        }
        long dBelow = Math.max(dLo, rounded.maxDen(a) + 1);       // larger d, smaller value
        if (rounded.maxDen(a) < dHi && dBelow <= dHi) offerBelow(a, dBelow);
        long dAbove = Math.min(dHi, rounded.minDen(a) - 1);
        if (dAbove >= dLo) offerAbove(a, dAbove);
    }

    private void offerBelow(long num, long den) {
        if (!hasBelow || GridWindow.compare(num, den, belowNum, belowDen) > 0) {
            hasBelow = true;
            belowNum = num;
            belowDen = den;
        }
    }

    private void offerAbove(long num, long den) {
        if (!hasAbove || GridWindow.compare(num, den, aboveNum, aboveDen) < 0) {
            hasAbove = true;
            aboveNum = num;
            aboveDen = den;
        }
    }

    /** Smallest t with base + t*step &gt;= k. */
    private static long tAtLeast(long k, long base, long step) {
        return -Math.floorDiv(base - k, step);
    }

    /** Largest t with base + t*step &lt;= k. */
    private static long tAtMost(long k, long base, long step) {
        return Math.floorDiv(k - base, step);
    }

    /**
     * The result. When {@code exhaustive} is false, the note should say why the search stopped;
     * a rule with a witness is still reported feasible.
     */
    Feasibility result(boolean exhaustive, String note) {
        boolean up = found(RoundingRule.HALF_UP);
        boolean even = found(RoundingRule.HALF_EVEN);
        boolean trunc = found(RoundingRule.TRUNCATE);
        String witness = up ? witnesses.get(RoundingRule.HALF_UP)
                : even ? witnesses.get(RoundingRule.HALF_EVEN)
                : witnesses.get(RoundingRule.TRUNCATE);
        String ruleNote = null;
        if (!up && even) ruleNote = "prints as " + printed.value().toPlainString() + " only under round-half-to-even";
        else if (!up && !even && trunc) {
            ruleNote = "prints as " + printed.value().toPlainString() + " only if the extra digits were dropped (truncation)";
        }
        String below = hasBelow ? printed.format(belowNum, belowDen, RoundingRule.HALF_UP) : null;
        String above = hasAbove ? printed.format(aboveNum, aboveDen, RoundingRule.HALF_UP) : null;
        return new Feasibility(up || even, up, even, trunc, witness, below, above, exhaustive, join(ruleNote, note));
    }

    private static String join(String a, String b) {
        if (a == null) return b;
        if (b == null) return a;
        return a + "; " + b;
    }
}
