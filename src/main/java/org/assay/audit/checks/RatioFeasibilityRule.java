package org.assay.audit.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.stats.Feasibility;
import org.assay.stats.Printed;
import org.assay.stats.RatioFeasibility;

/**
 * Ratio metrics on N items: binary precision, recall and F1 (given the positive count, or over
 * every split of N), balanced accuracy / macro recall (given every class count) and ROC AUC
 * (given both class counts) can only take the values their integer counts allow.
 */
final class RatioFeasibilityRule implements CheckRule {
    static final String NAME = "ratio-feasibility";

    @Override public String name() { return NAME; }

    @Override
    public List<CheckFinding> check(ClaimTable table, Tally tally) {
        List<CheckFinding> out = new ArrayList<>();
        for (Claim c : table.claims()) {
            String m = c.metric();
            boolean binary = m.equals("precision") || m.equals("recall") || m.equals("f1");
            boolean macroRecall = m.equals("balanced_accuracy") || m.equals("macro_recall");
            boolean macroOther = m.equals("macro_precision") || m.equals("macro_f1");
            boolean auc = m.equals("roc_auc");
            if (!binary && !macroRecall && !macroOther && !auc) continue;
            if (table.runs() > 1) {
                out.add(CheckFinding.of(NAME, CheckKind.NOTE, table.id(), List.of(c), "not checked: "
                        + Claims.quote(c) + " averages " + table.runs() + " runs; ratio feasibility is checked for single runs.",
                        null, Map.of()));
                continue;
            }
            Printed p = Claims.printed(c);
            Feasibility f;
            String basis;
            if (binary) {
                Integer n = c.testSizeIn(table);
                if (n == null) {
                    out.add(NotChecked.missingTestSize(NAME, table, c));
                    continue;
                }
                Long positives = positives(table, c);
                basis = positives == null ? n + " items (any split into positives and negatives)"
                        : n + " items with " + positives + " positives";
                f = switch (m) {
                    case "precision" -> RatioFeasibility.precision(p, n, positives);
                    case "recall" -> RatioFeasibility.recall(p, n, positives);
                    default -> RatioFeasibility.f1(p, n, positives);
                };
            } else if (auc) {
                long[] k = Claims.positivesAndNegatives(table, c);
                if (k == null) {
                    out.add(NotChecked.missingClassCounts(NAME, table, c, "the positive and negative counts"));
                    continue;
                }
                basis = k[0] + " and " + k[1] + " items of the two classes";
                f = RatioFeasibility.rocAuc(p, k[0], k[1]);
            } else if (macroOther) {
                if (table.classCounts().isEmpty()) {
                    out.add(NotChecked.missingClassCounts(NAME, table, c, "the class counts"));
                    continue;
                }
                // Relaxation: with every class predicted exactly n_c times, per-class precision and F1
                // both equal t_c/n_c, so every macro recall value is also a macro precision / F1 value.
                // A value macro recall can reach is therefore not flagged; one it cannot reach is not
                // proof of anything (precision and F1 have many more values), so it is only noted.
                long[] k = table.classCounts().values().stream().mapToLong(Long::longValue).toArray();
                tally.ran(NAME);
                Feasibility viaRecall = RatioFeasibility.macroRecall(p, k);
                if (!viaRecall.roundedFeasible()) {
                    out.add(CheckFinding.of(NAME, CheckKind.NOTE, table.id(), List.of(c), "not fully checked: "
                            + Claims.quote(c) + " — " + m + " depends on the joint confusion matrix; only the values "
                            + "reachable with every class predicted as often as it occurs were searched.", null, Map.of()));
                }
                continue;
            } else {
                if (table.classCounts().isEmpty()) {
                    out.add(NotChecked.missingClassCounts(NAME, table, c, "the class counts"));
                    continue;
                }
                long[] k = table.classCounts().values().stream().mapToLong(Long::longValue).toArray();
                basis = "class counts " + table.classCounts().values();
                f = RatioFeasibility.macroRecall(p, k);
            }
            tally.ran(NAME);
            if (f.roundedFeasible() || !f.exhaustive()) {
                if (!f.exhaustive()) {
                    out.add(CheckFinding.of(NAME, CheckKind.NOTE, table.id(), List.of(c), "not fully checked: "
                            + Claims.quote(c) + " — " + f.note(), null, Map.of()));
                }
                continue;
            }
            Map<String, Object> d = new LinkedHashMap<>();
            d.put("basis", basis);
            d.put("nearest_below", f.nearestBelow());
            d.put("nearest_above", f.nearestAbove());
            d.put("truncation_feasible", f.truncatedFeasible());
            CheckKind kind = f.truncatedFeasible() ? CheckKind.NOTE : CheckKind.INFEASIBLE;
            out.add(CheckFinding.of(NAME, kind, table.id(), List.of(c),
                    Claims.quote(c) + (f.truncatedFeasible() ? " is reachable only by truncation, not rounding, on "
                            : " cannot arise from integer counts on ") + basis + "; the nearest achievable values print as "
                            + GranularityRule.nearest(f) + ".",
                    "check the value and the counts it was computed on", d));
        }
        return out;
    }

    /** The positive class's count: named by the claim's params, else the only class count there is to use. */
    private static Long positives(ClaimTable table, Claim c) {
        String positive = Claims.positive(c);
        if (positive != null) return table.classCounts().get(positive);
        return null;
    }
}
