package org.assay.audit.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.stats.Feasibility;
import org.assay.stats.Granularity;

/**
 * Count metrics on N items take values k/N (k/(N·r) when r runs are averaged): a printed value
 * that no such fraction rounds to cannot be right for the stated test-set size (the GRIM rule of
 * Brown &amp; Heathers 2017, applied to proportions).
 */
final class GranularityRule implements CheckRule {
    static final String NAME = "granularity";

    @Override public String name() { return NAME; }

    @Override
    public List<CheckFinding> check(ClaimTable table, Tally tally) {
        List<CheckFinding> out = new ArrayList<>();
        for (Claim c : table.claims()) {
            MetricFacts facts = MetricFacts.of(c.metric());
            if (facts == null || !facts.count()) continue;
            Integer n = c.testSizeIn(table);
            if (n == null) {
                out.add(NotChecked.missingTestSize(NAME, table, c));
                continue;
            }
            tally.ran(NAME);
            long grid = (long) n * table.runs();
            Feasibility f = Granularity.ofCount(Claims.printed(c), grid);
            Map<String, Object> d = new LinkedHashMap<>();
            d.put("test_size", n);
            d.put("runs", table.runs());
            d.put("grid", "k/" + grid);
            d.put("nearest_below", f.nearestBelow());
            d.put("nearest_above", f.nearestAbove());
            d.put("truncation_feasible", f.truncatedFeasible());
            String items = table.runs() > 1 ? n + " items averaged over " + table.runs() + " runs" : n + " items";
            if (!f.roundedFeasible() && !f.truncatedFeasible()) {
                out.add(CheckFinding.of(NAME, CheckKind.INFEASIBLE, table.id(), List.of(c),
                        Claims.quote(c) + " cannot arise on " + items + ": no k/" + grid + " rounds to it; the nearest "
                                + "achievable values print as " + nearest(f) + ".",
                        "check the value and the test-set size; if the number is correct, state the test set it was computed on",
                        d));
            } else if (!f.roundedFeasible()) {
                out.add(CheckFinding.of(NAME, CheckKind.NOTE, table.id(), List.of(c),
                        Claims.quote(c) + " does not round from any k/" + grid + " on " + items
                                + ", but it is what truncation (not rounding) would print; nearest rounded values: "
                                + nearest(f) + ".",
                        "say how values were rounded", d));
            }
        }
        return out;
    }

    static String nearest(Feasibility f) {
        if (f.nearestBelow() != null && f.nearestAbove() != null) return f.nearestBelow() + " and " + f.nearestAbove();
        return f.nearestBelow() != null ? f.nearestBelow() : String.valueOf(f.nearestAbove());
    }
}
