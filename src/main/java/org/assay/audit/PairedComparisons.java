package org.assay.audit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.claims.ClaimsFile;
import org.assay.common.UserInputException;
import org.assay.data.ClassificationData;
import org.assay.metrics.MetricRegistry;
import org.assay.metrics.PreparedMetric;
import org.assay.stats.MultiplicityMethod;

/**
 * The paired comparisons of an audit: for every pair of rows a table names under {@code compare:}
 * whose two rows were both reproduced, and for every column (header path, metric and parameters)
 * both rows claim, the claimed gap beside the reproduced gap on the same items, with a test of the
 * claimed ordering. The p-values are adjusted across the audit's comparisons with the audit's
 * multiplicity method, and the verdicts use the adjusted values.
 */
final class PairedComparisons {
    private final EstimationSettings settings;
    private final PairedEstimator estimator;
    private final MultiplicityMethod multiplicity;

    PairedComparisons(EstimationSettings settings, PairedMethod method, MultiplicityMethod multiplicity) {
        this.settings = settings;
        this.estimator = new PairedEstimator(settings, method);
        this.multiplicity = multiplicity;
    }

    /** @param reproduced the outputs read for each reproduced row, keyed by (table id, row label) */
    List<Comparison> run(ClaimsFile claims, Map<List<String>, Reproduction.Outputs> reproduced) {
        List<Comparison> out = new ArrayList<>();
        for (ClaimTable table : claims.tables()) {
            for (List<String> pair : table.compare()) {
                Reproduction.Outputs a = reproduced.get(List.of(table.id(), pair.get(0)));
                Reproduction.Outputs b = reproduced.get(List.of(table.id(), pair.get(1)));
                if (a == null || b == null || pair.get(0).equals(pair.get(1))) continue;
                for (Claim[] claimPair : columnsOf(table, pair.get(0), pair.get(1))) {
                    out.add(compare(table, claimPair[0], claimPair[1], a, b));
                }
            }
        }
        return adjust(out);
    }

    /** The columns both rows claim, in the table's order: the same header path, metric and parameters. */
    private static List<Claim[]> columnsOf(ClaimTable table, String rowA, String rowB) {
        Map<List<Object>, Claim[]> columns = new LinkedHashMap<>();
        for (Claim c : table.claims()) {
            int side = rowA.equals(c.row()) ? 0 : rowB.equals(c.row()) ? 1 : -1;
            if (side < 0) continue;
            Claim[] slot = columns.computeIfAbsent(List.of(c.column(), c.metric(), new TreeMap<>(c.params())), k -> new Claim[2]);
            if (slot[side] == null) slot[side] = c;
        }
        return columns.values().stream().filter(s -> s[0] != null && s[1] != null).toList();
    }

    private Comparison compare(ClaimTable table, Claim a, Claim b, Reproduction.Outputs outA, Reproduction.Outputs outB) {
        double[] ia = a.value().roundingInterval(a.scale());
        double[] ib = b.value().roundingInterval(b.scale());
        double[] claimed = {ia[0] - ib[1], ia[1] - ib[0]};
        double printedGap = a.value().fraction(a.scale()) - b.value().fraction(b.scale());
        if (!MetricRegistry.knows(a.metric())) {
            return Comparison.notComputable(a, b, claimed, printedGap, "unknown metric '" + a.metric() + "'");
        }
        Reproduction.Part partA = outA.partFor(a);
        Reproduction.Part partB = outB.partFor(b);
        if (partA == null || partB == null) {
            return Comparison.notComputable(a, b, claimed, printedGap, "no outputs were given for column '"
                    + String.join(" / ", a.column()) + "' of row '" + (partA == null ? a.row() : b.row()) + "'");
        }
        // a mismatch of items is an input error, not a comparison that cannot be computed
        ReproductionPairing pairing = pairings.computeIfAbsent(List.of(partA, partB),
                k -> ReproductionPairing.match(partA.data(), a.row(), partB.data(), b.row()));
        Integer size = a.testSizeIn(table);
        Long population = size == null ? null : size.longValue();
        try {
            PreparedMetric ma = MetricRegistry.get(a.metric()).prepare(partA.data(), a.params());
            PreparedMetric mb = MetricRegistry.get(b.metric()).prepare(partB.data(), b.params());
            String why = ma.notComputable() != null ? ma.notComputable() : mb.notComputable();
            if (why != null) return Comparison.notComputable(a, b, claimed, printedGap, why);
            boolean sameCoding = !(partA.data() instanceof ClassificationData ca && partB.data() instanceof ClassificationData cb)
                    || ca.classes().equals(cb.classes());
            PairedEvidence e = estimator.evidence(ma, mb, pairing, sameCoding, population);
            List<String> notes = new ArrayList<>(e.notes());
            if (population == null) {
                notes.add("the test-set size is unknown, so the gap's interval uses infinite-population methods");
            }
            double p = e.pValue();
            return new Comparison(a, b, claimed[0], claimed[1], printedGap, ma.units(), population, e.gap(),
                    e.interval(settings.confidence()), e.test(), p, p, ComparisonVerdict.of(printedGap, e.gap(), p, settings.alpha()),
                    e.discordant(), null, notes);
        } catch (UserInputException e) {
            return Comparison.notComputable(a, b, claimed, printedGap, e.problem());
        }
    }

    private final Map<List<Reproduction.Part>, ReproductionPairing> pairings = new HashMap<>();

    /** The multiplicity adjustment over every computable comparison; verdicts follow the adjusted values. */
    private List<Comparison> adjust(List<Comparison> comparisons) {
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < comparisons.size(); i++) {
            if (comparisons.get(i).verdict() != ComparisonVerdict.NOT_COMPUTABLE) idx.add(i);
        }
        double[] p = new double[idx.size()];
        for (int j = 0; j < p.length; j++) p[j] = comparisons.get(idx.get(j)).pValue();
        double[] adjusted = multiplicity.adjust(p);
        List<Comparison> out = new ArrayList<>(comparisons);
        for (int j = 0; j < p.length; j++) {
            out.set(idx.get(j), comparisons.get(idx.get(j)).withAdjustedP(adjusted[j], settings.alpha()));
        }
        return out;
    }
}
