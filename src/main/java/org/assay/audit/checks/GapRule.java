package org.assay.audit.checks;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.stats.PairedGapRange;

/**
 * Is a compared lead larger than the test set can resolve? For each column of a count metric:
 * the bold value (or else the best) against the runner-up, and every pair of rows the table
 * names under {@code compare}. Both rows are assumed to be scored on the same N items, so the
 * paired test applies; its p-value depends on the unknown disagreement rate, so the finding
 * gives the range (Card et al. 2020, EMNLP) and the unpaired two-proportion bound beside it.
 */
final class GapRule implements CheckRule {
    static final String NAME = "gap";
    static final double ALPHA = 0.05;

    @Override public String name() { return NAME; }

    @Override
    public List<CheckFinding> check(ClaimTable table, Tally tally) {
        List<CheckFinding> out = new ArrayList<>();
        for (List<Claim> col : Claims.byColumn(table.claims()).values()) {
            if (col.size() < 2) continue;
            MetricFacts facts = MetricFacts.of(col.get(0).metric());
            for (List<Claim> pair : pairs(table, col, facts)) {
                Claim a = pair.get(0), b = pair.get(1);
                if (facts == null || !facts.count()) continue;
                // a value outside the metric's range is the range rule's finding; no gap test can use it
                if (outsideRange(a, facts) || outsideRange(b, facts)) continue;
                Integer n = a.testSizeIn(table);
                if (n == null || !Objects.equals(n, b.testSizeIn(table))) {
                    if (n == null) out.add(NotChecked.missingTestSize(NAME, table, a));
                    continue;
                }
                // orient so that "better" is first
                boolean aBetter = facts.higherIsBetter() ? Claims.lo(a) + Claims.hi(a) >= Claims.lo(b) + Claims.hi(b)
                        : Claims.lo(a) + Claims.hi(a) <= Claims.lo(b) + Claims.hi(b);
                Claim better = aBetter ? a : b, worse = aBetter ? b : a;
                double pb = better.value().fraction(better.scale()), pw = worse.value().fraction(worse.scale());
                if (pb == pw) continue;
                tally.ran(NAME);
                // the largest gap the rounding intervals allow decides the flag (never flag a gap rounding could widen)
                double widestBetter = facts.higherIsBetter() ? Claims.hi(better) : Claims.lo(better);
                double widestWorse = facts.higherIsBetter() ? Claims.lo(worse) : Claims.hi(worse);
                PairedGapRange widest = PairedGapRange.of(clip(widestBetter), clip(widestWorse), n, ALPHA);
                PairedGapRange printed = PairedGapRange.of(pb, pw, n, ALPHA);
                Map<String, Object> d = details(printed);
                String gapText = Claims.onScale(better, Math.abs(pb - pw), Math.max(better.value().decimals(), worse.value().decimals()))
                        + (better.scale().factor() == 100 ? " points" : "");
                String what = Claims.quote(better) + " leads " + (worse.row() == null ? "the other row" : "\"" + worse.row() + "\"")
                        + " (" + Claims.shown(worse) + ") by " + gapText + " on " + n + " items";
                if (widest.mostFavourable().exactPValue() >= ALPHA) {
                    out.add(CheckFinding.of(NAME, CheckKind.UNRESOLVED_GAP, table.id(), List.of(better, worse),
                            what + ". That gap cannot be significant at the 5% level on this test set even if every "
                                    + "disagreement went one way (McNemar p ≥ " + p(printed.mostFavourable().exactPValue())
                                    + "; unpaired p = " + p(printed.unpairedPValue()) + "); the power to detect it is "
                                    + pct(printed.mostFavourable().power()) + " at best.",
                            "report the difference with a confidence interval or a paired significance test, "
                                    + "and avoid calling it an improvement without one", d));
                } else if (widest.leastFavourable().exactPValue() >= ALPHA) {
                    out.add(CheckFinding.of(NAME, CheckKind.NOTE, table.id(), List.of(better, worse),
                            what + ". Whether that is significant depends on how often the two disagree: McNemar p runs from "
                                    + p(printed.mostFavourable().exactPValue()) + " (all disagreements one way) to "
                                    + p(printed.leastFavourable().exactPValue()) + " (as many as possible); unpaired p = "
                                    + p(printed.unpairedPValue()) + ", power " + pct(printed.unpairedPower()) + ".",
                            "report a paired test (McNemar or a paired bootstrap) for this comparison", d));
                }
            }
        }
        return out;
    }

    private static boolean outsideRange(Claim c, MetricFacts facts) {
        double p = c.value().fraction(c.scale());
        return p < facts.lowest() || p > facts.highest();
    }

    /** The pairs to compare in one column: the bold (or best) against the runner-up, and named pairs. */
    private static List<List<Claim>> pairs(ClaimTable table, List<Claim> col, MetricFacts facts) {
        Set<List<Claim>> pairs = new LinkedHashSet<>();
        if (facts != null) {
            List<Claim> sorted = new ArrayList<>(col);
            Comparator<Claim> byValue = Comparator.comparingDouble(c -> c.value().fraction(c.scale()));
            sorted.sort(facts.higherIsBetter() ? byValue.reversed() : byValue);
            Claim best = col.stream().filter(Claim::bold).findFirst().orElse(sorted.get(0));
            Claim runnerUp = sorted.stream().filter(c -> c != best && !c.bold()).findFirst().orElse(null);
            if (runnerUp != null) pairs.add(List.of(best, runnerUp));
        }
        for (List<String> named : table.compare()) {
            Claim a = col.stream().filter(c -> named.get(0).equals(c.row())).findFirst().orElse(null);
            Claim b = col.stream().filter(c -> named.get(1).equals(c.row())).findFirst().orElse(null);
            if (a != null && b != null && !pairs.contains(List.of(a, b)) && !pairs.contains(List.of(b, a))) pairs.add(List.of(a, b));
        }
        return new ArrayList<>(pairs);
    }

    private static Map<String, Object> details(PairedGapRange g) {
        Map<String, Object> d = new LinkedHashMap<>();
        d.put("n", g.n());
        d.put("correct", List.of(g.correct1(), g.correct2()));
        d.put("unpaired_p_value", g.unpairedPValue());
        d.put("unpaired_power", g.unpairedPower());
        d.put("mcnemar_most_favourable", end(g.mostFavourable()));
        d.put("mcnemar_least_favourable", end(g.leastFavourable()));
        return d;
    }

    private static Map<String, Object> end(PairedGapRange.End e) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("disagreement", e.disagreement());
        m.put("b", e.b());
        m.put("c", e.c());
        m.put("p_value", e.exactPValue());
        m.put("power", e.power());
        return m;
    }

    private static double clip(double p) { return Math.max(0, Math.min(1, p)); }

    private static String p(double p) { return p >= 0.001 ? String.format(Locale.ROOT, "%.3f", p) : String.format(Locale.ROOT, "%.1e", p); }

    private static String pct(double v) { return String.format(Locale.ROOT, "%.0f%%", 100 * v); }
}
