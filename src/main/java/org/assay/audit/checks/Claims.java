package org.assay.audit.checks;

import java.math.BigDecimal;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.assay.claims.ClaimTable;
import org.assay.claims.Claim;
import org.assay.stats.Printed;

/** Small helpers the rules share: converting claims to exact printed numbers and quoting them. */
final class Claims {
    private Claims() {}

    static Printed printed(Claim c) {
        return new Printed(c.value().number(), c.value().decimals(), (int) c.scale().factor());
    }

    static double lo(Claim c) { return c.value().roundingInterval(c.scale())[0]; }

    static double hi(Claim c) { return c.value().roundingInterval(c.scale())[1]; }

    /** "Table T2, row Ours, column Accuracy: 94.13%" — how a reviewer comment quotes a claim. */
    static String quote(Claim c) {
        StringBuilder sb = new StringBuilder("Table ").append(c.tableId());
        if (c.row() != null) sb.append(", row \"").append(c.row()).append('"');
        if (!c.column().isEmpty()) sb.append(", column \"").append(String.join(" / ", c.column())).append('"');
        return sb.append(": ").append(shown(c)).toString();
    }

    static String shown(Claim c) { return c.value().text() + (c.scale().factor() == 100 ? "%" : ""); }

    /** A fraction-scale value on the claim's printed scale with the given decimals. */
    static String onScale(Claim c, double fraction, int decimals) {
        return String.format(Locale.ROOT, "%." + Math.max(0, decimals) + "f", fraction * c.scale().factor());
    }

    /** Claims grouped by column: the same header path, metric and parameters, across rows. */
    static Map<List<Object>, List<Claim>> byColumn(List<Claim> claims) {
        Map<List<Object>, List<Claim>> columns = new java.util.LinkedHashMap<>();
        for (Claim c : claims) {
            columns.computeIfAbsent(List.of(c.column(), c.metric(), new java.util.TreeMap<>(c.params())),
                    k -> new java.util.ArrayList<>()).add(c);
        }
        return columns;
    }

    /** The parent header path (all but the last header): claims under one parent are summarised together. */
    static List<String> parent(Claim c) {
        return c.column().isEmpty() ? List.of() : c.column().subList(0, c.column().size() - 1);
    }

    static String last(Claim c) { return c.column().isEmpty() ? "" : c.column().get(c.column().size() - 1); }

    static BigDecimal factor(Claim c) { return BigDecimal.valueOf((long) c.scale().factor()); }

    /** The positive class named by the claim's params, or null. */
    static String positive(Claim c) { return c.params().get("positive"); }

    /** Positive and negative counts: two class counts, or the named positive class against all others. */
    static long[] positivesAndNegatives(ClaimTable table, Claim c) {
        Map<String, Long> counts = table.classCounts();
        String positive = Claims.positive(c);
        long total = counts.values().stream().mapToLong(Long::longValue).sum();
        if (positive != null && counts.containsKey(positive)) {
            return new long[] {counts.get(positive), total - counts.get(positive)};
        }
        if (counts.size() == 2) return counts.values().stream().mapToLong(Long::longValue).toArray();
        return null;
    }

}
