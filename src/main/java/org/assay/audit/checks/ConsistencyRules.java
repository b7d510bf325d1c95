package org.assay.audit.checks;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.regex.Pattern;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;

/**
 * Rules that compare the claims of one table with each other, always with rounding intervals
 * (interval arithmetic), never with the printed points.
 */
final class ConsistencyRules {
    private ConsistencyRules() {}

    /** Claims of one row under one parent header, the unit the consistency rules work on. */
    private static Map<List<Object>, List<Claim>> byRowAndParent(ClaimTable table) {
        Map<List<Object>, List<Claim>> groups = new LinkedHashMap<>();
        for (Claim c : table.claims()) {
            groups.computeIfAbsent(List.of(Objects.toString(c.row()), Claims.parent(c)), k -> new ArrayList<>()).add(c);
        }
        return groups;
    }

    /** The harmonic-mean interval of two intervals; the harmonic mean is increasing in both arguments. */
    static double harmonic(double p, double r) { return p + r == 0 ? 0 : 2 * p * r / (p + r); }

    /** F1 against printed precision and recall (binary and micro averages only). */
    static final class F1 implements CheckRule {
        static final String NAME = "f1-consistency";

        @Override public String name() { return NAME; }

        @Override
        public List<CheckFinding> check(ClaimTable table, Tally tally) {
            List<CheckFinding> out = new ArrayList<>();
            for (List<Claim> group : byRowAndParent(table).values()) {
                for (String prefix : new String[] {"", "micro_", "macro_", "weighted_"}) {
                    Claim p = find(group, prefix + "precision"), r = find(group, prefix + "recall"), f = find(group, prefix + "f1");
                    if (p == null || r == null || f == null) continue;
                    if (prefix.equals("macro_") || prefix.equals("weighted_")) {
                        out.add(CheckFinding.of(NAME, CheckKind.NOTE, table.id(), List.of(f, p, r),
                                Claims.quote(f) + ": " + prefix.replace("_", "") + " F1 averages per-class F1 scores, so it "
                                        + "is not the harmonic mean of " + prefix.replace("_", "") + " precision and recall; "
                                        + "this pair is not checked.", null, Map.of()));
                        continue;
                    }
                    tally.ran(NAME);
                    double lo = harmonic(Claims.lo(p), Claims.lo(r)), hi = harmonic(Claims.hi(p), Claims.hi(r));
                    if (Claims.hi(f) < lo - 1e-12 || Claims.lo(f) > hi + 1e-12) {
                        Map<String, Object> d = new LinkedHashMap<>();
                        d.put("f1_from_precision_and_recall", List.of(lo, hi));
                        d.put("f1_printed_interval", List.of(Claims.lo(f), Claims.hi(f)));
                        int dec = f.value().decimals() + 1;
                        out.add(CheckFinding.of(NAME, CheckKind.INFEASIBLE, table.id(), List.of(f, p, r),
                                Claims.quote(f) + " is not the harmonic mean of the printed precision " + Claims.shown(p)
                                        + " and recall " + Claims.shown(r) + ", which allow F1 between "
                                        + Claims.onScale(f, lo, dec) + " and " + Claims.onScale(f, hi, dec) + ".",
                                "check which of the three values is wrong, or whether F1 was averaged differently", d));
                    }
                }
            }
            return out;
        }

        private static Claim find(List<Claim> group, String metric) {
            return group.stream().filter(c -> c.metric().equals(metric)).findFirst().orElse(null);
        }
    }

    /** Recall@1 ≤ Recall@5 ≤ Recall@10, top-1 ≤ top-5: cumulative metrics cannot fall as K grows. */
    static final class Monotone implements CheckRule {
        static final String NAME = "monotone-in-k";

        @Override public String name() { return NAME; }

        @Override
        public List<CheckFinding> check(ClaimTable table, Tally tally) {
            List<CheckFinding> out = new ArrayList<>();
            Map<List<Object>, List<Claim>> families = new LinkedHashMap<>();
            for (Claim c : table.claims()) {
                String family = switch (c.metric()) {
                    case "accuracy", "top_k_accuracy" -> "top_k_accuracy";
                    case "recall_at_k", "relevant_recall_at_k" -> c.metric();
                    default -> null;
                };
                if (family == null || k(c) == null) continue;
                Map<String, String> rest = new java.util.TreeMap<>(c.params());
                rest.remove("k");
                // the same row, the same other parameters (a retrieval direction), the same grandparent header
                List<String> parent = Claims.parent(c);
                families.computeIfAbsent(List.of(Objects.toString(c.row()), family, rest, parent), x -> new ArrayList<>()).add(c);
            }
            for (List<Claim> fam : families.values()) {
                fam.sort(Comparator.comparing(Monotone::k));
                for (int i = 0; i + 1 < fam.size(); i++) {
                    Claim small = fam.get(i), large = fam.get(i + 1);
                    if (k(small).equals(k(large))) continue;
                    tally.ran(NAME);
                    if (Claims.lo(small) > Claims.hi(large) + 1e-12) {
                        out.add(CheckFinding.of(NAME, CheckKind.INFEASIBLE, table.id(), List.of(large, small),
                                Claims.quote(large) + " (K = " + k(large) + ") is below " + Claims.shown(small) + " at K = "
                                        + k(small) + ", but a hit within the top " + k(small)
                                        + " is also a hit within the top " + k(large) + ".",
                                "check the two values; they may have been swapped", Map.of()));
                    }
                }
            }
            return out;
        }

        /** K of a cumulative metric; plain accuracy is top-1. */
        static Integer k(Claim c) {
            if (c.metric().equals("accuracy")) return 1;
            String k = c.params().get("k");
            try {
                return k == null ? null : Integer.valueOf(k.trim());
            } catch (NumberFormatException e) {
                return null;
            }
        }
    }

    /** An "Avg"/"Mean"/"RSUM" column must equal the mean or sum of the columns it summarises. */
    static final class SummaryColumn implements CheckRule {
        static final String NAME = "summary-column";
        private static final Pattern MEAN = Pattern.compile("(?i)avg\\.?|average|mean");
        private static final Pattern SUM = Pattern.compile("(?i)r-?sum|sum|total");

        @Override public String name() { return NAME; }

        @Override
        public List<CheckFinding> check(ClaimTable table, Tally tally) {
            List<CheckFinding> out = new ArrayList<>();
            for (List<Claim> group : byRowAndParent(table).values()) {
                for (Claim s : group) {
                    Boolean mean = isMean(s);
                    if (mean == null) continue;
                    List<Claim> parts = parts(s, group);
                    if (parts.size() < 2) continue;
                    tally.ran(NAME);
                    double lo = 0, hi = 0;
                    for (Claim c : parts) { lo += Claims.lo(c); hi += Claims.hi(c); }
                    if (mean) { lo /= parts.size(); hi /= parts.size(); }
                    if (Claims.hi(s) < lo - 1e-12 || Claims.lo(s) > hi + 1e-12) {
                        int dec = s.value().decimals() + 1;
                        out.add(CheckFinding.of(NAME, CheckKind.INFEASIBLE, table.id(), concat(s, parts),
                                Claims.quote(s) + " is not the " + (mean ? "mean" : "sum") + " of the " + parts.size()
                                        + " values it summarises (" + String.join(", ", parts.stream().map(Claims::shown).toList())
                                        + "), which allow " + Claims.onScale(s, lo, dec) + " to " + Claims.onScale(s, hi, dec) + ".",
                                "check the summary value, or say which columns it summarises (params: {of: \"A;B\"})",
                                Map.of("summarised", parts.stream().map(Claims::last).toList())));
                    }
                }
            }
            return out;
        }

        /** true = mean, false = sum, null = not a summary column; by metric id or by header. */
        private static Boolean isMean(Claim c) {
            if (c.metric().equals("mean")) return true;
            if (c.metric().equals("sum") || c.metric().equals("rsum")) return false;
            String h = Claims.last(c).trim();
            if (MEAN.matcher(h).matches()) return true;
            if (SUM.matcher(h).matches()) return false;
            return null;
        }

        /** The columns a summary covers: named with params "of", else every other claim of its row and parent. */
        private static List<Claim> parts(Claim s, List<Claim> group) {
            String of = s.params().get("of");
            List<Claim> parts = new ArrayList<>();
            for (Claim c : group) {
                if (c == s || isMean(c) != null || c.scale() != s.scale()) continue;
                if (of != null && !List.of(of.split(";")).stream().map(String::trim).toList().contains(Claims.last(c).trim())) continue;
                parts.add(c);
            }
            return parts;
        }

        private static List<Claim> concat(Claim first, List<Claim> rest) {
            List<Claim> all = new ArrayList<>();
            all.add(first);
            all.addAll(rest);
            return all;
        }
    }

    /** Values outside the metric's range (a percent above 100, a negative accuracy, a fraction above 1). */
    static final class Range implements CheckRule {
        static final String NAME = "range";

        @Override public String name() { return NAME; }

        @Override
        public List<CheckFinding> check(ClaimTable table, Tally tally) {
            List<CheckFinding> out = new ArrayList<>();
            for (Claim c : table.claims()) {
                MetricFacts f = MetricFacts.of(c.metric());
                if (f == null) continue;
                tally.ran(NAME);
                if (Claims.lo(c) > f.highest() + 1e-12 || Claims.hi(c) < f.lowest() - 1e-12) {
                    out.add(CheckFinding.of(NAME, CheckKind.INFEASIBLE, table.id(), List.of(c),
                            Claims.quote(c) + " lies outside the range of " + c.metric() + " ("
                                    + range(c, f) + ").",
                            "check the value and its scale (percent or fraction)", Map.of()));
                }
            }
            return out;
        }

        private static String range(Claim c, MetricFacts f) {
            String lo = Double.isInfinite(f.lowest()) ? "-inf" : Claims.onScale(c, f.lowest(), 0);
            String hi = Double.isInfinite(f.highest()) ? "inf" : Claims.onScale(c, f.highest(), 0);
            return lo + " to " + hi + (c.scale().factor() == 100 ? " percent" : "");
        }
    }

    /** A value that looks like a fraction among percentages of the same column (0.94 beside 93.1). */
    static final class ScaleMixUp implements CheckRule {
        static final String NAME = "scale-mix-up";

        @Override public String name() { return NAME; }

        @Override
        public List<CheckFinding> check(ClaimTable table, Tally tally) {
            List<CheckFinding> out = new ArrayList<>();
            List<Claim> percentProportions = table.claims().stream().filter(c -> {
                MetricFacts f = MetricFacts.of(c.metric());
                return f != null && f.highest() == 1 && c.scale().factor() == 100;
            }).toList();
            for (List<Claim> col : Claims.byColumn(percentProportions).values()) {
                if (col.size() < 2) continue;
                for (Claim c : col) {
                    tally.ran(NAME);
                    double v = c.value().number().doubleValue();
                    long bigPeers = col.stream().filter(o -> o != c && o.value().number().doubleValue() > 10 * Math.max(v, 0.01)
                            && o.value().number().doubleValue() > 1).count();
                    if (v <= 1 && bigPeers > 0 && bigPeers == col.size() - 1) {
                        out.add(CheckFinding.of(NAME, CheckKind.QUESTIONABLE, table.id(), List.of(c),
                                Claims.quote(c) + " looks like a fraction in a percent column (the other rows print "
                                        + String.join(", ", col.stream().filter(o -> o != c).map(Claims::shown).toList())
                                        + "); read as percent it is " + String.format(Locale.ROOT, "%s%%", c.value().text()) + ".",
                                "check the scale of this value; " + c.value().text() + " as a fraction would print as "
                                        + c.value().number().movePointRight(2).stripTrailingZeros().toPlainString() + "%",
                                Map.of()));
                    }
                }
            }
            return out;
        }
    }
}
