package org.assay.audit;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.LongPredicate;
import org.assay.audit.checks.MetricFacts;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.claims.ClaimsFile;
import org.assay.claims.PrintedValue;
import org.assay.claims.Scale;
import org.assay.common.UserInputException;
import org.assay.metrics.MetricDefinition;
import org.assay.metrics.MetricKind;
import org.assay.metrics.MetricRegistry;
import org.assay.stats.FinitePopulation;
import org.assay.stats.HanleyMcNeil;
import org.assay.stats.NormalPlan;
import org.assay.stats.SampleSizeSearch;

/**
 * Plans a reproduction: for a claim, the subsample size n that (a) makes the audit's interval no
 * wider than &plusmn; the margin, (b) gives the target power to find a true value one margin below
 * (or above) the claim discrepant, and (c) gives the target power to find the claim consistent when
 * it is right; with a table of all three against n. The tests are the audit's own, before any
 * multiplicity adjustment: exact hypergeometric sums for count metrics ({@link CountPlanCurves}), a
 * normal approximation with a Hanley&ndash;McNeil or pilot standard error for the rest
 * ({@link NormalPlanCurves}).
 */
public final class ClaimPlanner {
    /** Sizes every table shows (those up to the test-set size), besides the test set itself and the answers. */
    static final long[] TABLE_SIZES = {50, 100, 200, 500, 1000};
    /**
     * Up to this test-set size every subsample size is computed exactly. Above it the exact search
     * covers every size up to the larger of this and twice the normal approximation's answer,
     * doubled until the targets are met.
     */
    static final long FULL_SEARCH = 20_000;

    private final PlanSettings settings;
    private final PlanPilot pilot;

    /** @param pilot outputs whose spread stands in for metrics without a formula; null when none */
    public ClaimPlanner(PlanSettings settings, PlanPilot pilot) {
        this.settings = settings;
        this.pilot = pilot;
    }

    /**
     * The scale a printed value of this metric is read on when none is given: percent for
     * proportions (and sums of them), the printed number itself otherwise. A proportion printed
     * below 1 ("0.912") could be either, so that is an error asking for the scale.
     */
    public static Scale defaultScale(String metric, PrintedValue printed) {
        if (!isProportion(metric)) return Scale.FRACTION;
        if (printed.number().abs().compareTo(java.math.BigDecimal.ONE) < 0) {
            throw UserInputException.usage("the claim " + printed.text() + " for " + metric + " could be a fraction ("
                    + printed.text() + ") or a percentage (" + printed.text() + "%)",
                    "add --scale fraction or --scale percent");
        }
        return Scale.PERCENT;
    }

    /** One claim; a claim that cannot be planned is a user error naming why. */
    public PlanResult plan(Claim claim, Long testSize, Map<String, Long> classCounts) {
        try {
            return new PlanResult(settings, claim.tableId(), List.of(planOne(claim, testSize, classCounts)), List.of());
        } catch (NotPlannable e) {
            throw claim.location() == null || claim.location().file() == null
                    ? UserInputException.usage(e.getMessage(), e.fix)
                    : new UserInputException(claim.location().file(), claim.location().describe(), e.getMessage(), e.fix);
        }
    }

    /**
     * Every claim of a table (of one row when {@code row} is given). A claim that cannot be planned
     * is listed with the reason. The table's test_size and class_counts come first; the arguments
     * fill them in when the table has none.
     */
    public PlanResult planTable(ClaimsFile claims, String tableId, String row, Long testSize, Map<String, Long> classCounts) {
        ClaimTable table = selectTable(claims, tableId);
        if (row != null && table.claims().stream().noneMatch(c -> row.equals(c.row()))) {
            Set<String> rows = new LinkedHashSet<>();
            table.claims().forEach(c -> rows.add(c.row()));
            throw UserInputException.usage("row '" + row + "' is not in table " + table.id() + " of " + claims.file(),
                    "rows: " + String.join(", ", rows));
        }
        Map<String, Long> counts = table.classCounts().isEmpty() ? classCounts : table.classCounts();
        List<ClaimPlan> plans = new ArrayList<>();
        List<PlanResult.Skipped> skipped = new ArrayList<>();
        for (Claim c : table.claims()) {
            if (row != null && !row.equals(c.row())) continue;
            Integer own = c.testSizeIn(table);
            if (own != null && testSize != null && own.longValue() != testSize) {
                throw UserInputException.usage("table " + table.id() + " gives test_size " + own + " for " + c.label()
                        + " but --test-size says " + testSize, "leave out --test-size, or correct the claims file");
            }
            try {
                plans.add(planOne(c, own != null ? Long.valueOf(own) : testSize, counts));
            } catch (NotPlannable e) {
                skipped.add(new PlanResult.Skipped(c, e.getMessage() + " (" + e.fix + ")"));
            }
        }
        return new PlanResult(settings, table.id(), plans, skipped);
    }

    private ClaimPlan planOne(Claim claim, Long testSize, Map<String, Long> classCounts) {
        if (!MetricRegistry.knows(claim.metric())) {
            throw new NotPlannable("unknown metric '" + claim.metric() + "'",
                    "known metrics: " + String.join(", ", MetricRegistry.all().stream().map(MetricDefinition::id).toList()));
        }
        MetricDefinition metric = MetricRegistry.get(claim.metric());
        for (String p : claim.params().keySet()) {
            if (!metric.params().contains(p)) {
                throw new NotPlannable("metric " + metric.id() + " takes no parameter '" + p + "'",
                        metric.params().isEmpty() ? "remove it" : "allowed: " + String.join(", ", metric.params()));
            }
        }
        double value = claim.value().fraction(claim.scale());
        double[] range = range(metric);
        if (value < range[0] || value > range[1]) {
            throw new NotPlannable("the claim " + claim.value().text() + (claim.scale() == Scale.PERCENT ? "%" : "")
                    + " is outside the range of " + metric.id() + " (" + show(range[0], claim) + " to "
                    + show(range[1], claim) + ")", "check the value and --scale");
        }
        long[] split = metric.kind() == MetricKind.ROC_AUC && pilot == null ? classSplit(claim, classCounts) : null;
        if (testSize == null && split != null) testSize = split[0] + split[1];
        if (testSize == null) {
            throw new NotPlannable("the test-set size is not known", "give --test-size N, or test_size in the claims file");
        }
        long size = testSize;
        if (size < 1 || size > Integer.MAX_VALUE) {
            throw new NotPlannable("test-set size " + size + " is outside 1 to " + Integer.MAX_VALUE, "give the number of test items");
        }
        if (split != null && split[0] + split[1] != size) {
            throw new NotPlannable("the class counts add up to " + (split[0] + split[1]) + " items but the test set has "
                    + size, "give the counts of the whole test set");
        }
        for (long n : settings.sizes()) {
            if (n > size) {
                throw UserInputException.usage("subsample size " + n + " is beyond the test set's " + size + " items",
                        "give sizes of at most " + size);
            }
        }
        double margin = claim.margin() != null ? claim.margin() : settings.margin();
        double[] ci = claim.value().roundingInterval(claim.scale());
        Double lowerTruth = settings.direction().lower() && value - margin >= range[0] ? value - margin : null;
        Double higherTruth = settings.direction().higher() && value + margin <= range[1] ? value + margin : null;
        List<String> notes = new ArrayList<>();
        if (lowerTruth == null && higherTruth == null) {
            throw new NotPlannable("no true value of " + metric.id() + " lies one margin " + switch (settings.direction()) {
                case LOWER -> "below"; case HIGHER -> "above"; case EITHER -> "away from"; } + " the claim",
                    "use a smaller --margin or another --direction");
        }
        if (settings.direction() == PlanDirection.EITHER && (lowerTruth == null || higherTruth == null)) {
            notes.add("a true value one margin " + (lowerTruth == null ? "below" : "above") + " the claim is outside the "
                    + "metric's range, so only the other direction is planned");
        }

        PlanCurves curves;
        String method;
        boolean exact = metric.kind() == MetricKind.COUNT;
        if (exact) {
            curves = new CountPlanCurves(size, value, ci[0], ci[1], margin, settings, lowerTruth, higherTruth);
            method = "exact (hypergeometric sums over the subsample's count)";
            notes.addAll(new CountEvidence(0, 1, size, IntervalChoice.EXACT).claimNotes(ci[0], ci[1]));
            notes.add("exact power zigzags as n grows (the tests' cut-offs move in whole counts): each size is the "
                    + "smallest from which its target holds at every size up to the largest one computed");
            notes.add("half-width: the audit's exact " + percent(settings.confidence()) + " interval when the subsample "
                    + "shows the claimed value");
            if (pilot != null) notes.add("the pilot is not needed for a count metric and was not used");
        } else {
            NormalPlan.StandardError se;
            if (metric.kind() == MetricKind.ROC_AUC && pilot == null) {
                se = hanleyMcNeil(value, split, size, notes);
                method = "normal approximation, Hanley–McNeil standard error from the class counts";
            } else if (pilot != null) {
                se = fromPilot(metric, claim, size, notes);
                method = metric.kind() == MetricKind.ROC_AUC
                        ? "normal approximation, DeLong standard error of the pilot scaled to n"
                        : "normal approximation, bootstrap standard error of the pilot scaled to n";
            } else {
                throw new NotPlannable(metric.id() + " has no formula for its variance, so planning needs a pilot",
                        "run the model on a few hundred random items and give their outputs with --pilot FILE");
            }
            curves = new NormalPlanCurves(se, value, ci[0], ci[1], margin, settings, lowerTruth, higherTruth);
            notes.add("half-width: z × the standard error at n, with the finite-population correction (N−n)/(N−1)");
        }
        notes.add("power to detect: the chance that 'assay audit' calls the claim discrepant when the true value is one "
                + "margin away, from the audit's test against the claim's rounding interval, before multiplicity "
                + "adjustment (auditing several claims at once, with Holm's adjustment, needs more items)");
        notes.add("power to agree: the chance that the audit calls the claim consistent when it is right: the "
                + percent(settings.equivalenceConfidence()) + " interval inside the rounding interval widened by the margin "
                + "(two one-sided tests), and not discrepant");

        LongPredicate meetsInterval = n -> curves.halfWidth(n) <= margin + 1e-12;
        LongPredicate meetsDetect = n -> (lowerTruth == null || curves.detectLower(n) >= settings.power())
                && (higherTruth == null || curves.detectHigher(n) >= settings.power());
        LongPredicate meetsAgree = n -> curves.agree(n) >= settings.power();
        long upTo = curves.zigzags() ? searchLimit(size, value, ci, margin, lowerTruth, higherTruth,
                meetsInterval.and(meetsDetect).and(meetsAgree)) : size;
        long nInterval = search(curves, meetsInterval, upTo);
        long nDetect = search(curves, meetsDetect, upTo);
        long nAgree = search(curves, meetsAgree, upTo);
        if (upTo < size) {
            notes.add("every size up to " + upTo + " of the " + size + " was computed exactly; larger ones were not");
        }
        List<PlanRow> rows = rows(curves, size, nInterval, nDetect, nAgree, lowerTruth, higherTruth);
        return new ClaimPlan(claim, size, method, exact, value, ci[0], ci[1], margin, lowerTruth, higherTruth,
                found(nInterval), found(nDetect), found(nAgree), upTo, rows, notes);
    }

    private static long search(PlanCurves curves, LongPredicate meets, long upTo) {
        return curves.zigzags() ? SampleSizeSearch.fromThenOn(meets, 1, upTo) : SampleSizeSearch.monotone(meets, 1, upTo);
    }

    /**
     * The largest size the exact search computes: the whole test set when it is small, otherwise
     * the larger of {@link #FULL_SEARCH} and twice the normal approximation's answer (binomial
     * variance at the claimed value), doubled while some target is still missed there.
     */
    private long searchLimit(long size, double value, double[] ci, double margin, Double lowerTruth, Double higherTruth,
                             LongPredicate meetsAll) {
        if (size <= FULL_SEARCH) return size;
        NormalPlan.StandardError binomial = n -> Math.sqrt(value * (1 - value) / n * FinitePopulation.correction(n, size));
        PlanCurves guess = new NormalPlanCurves(binomial, value, ci[0], ci[1], margin, settings, lowerTruth, higherTruth);
        long approximate = 0;
        for (LongPredicate meets : List.<LongPredicate>of(
                n -> guess.halfWidth(n) <= margin,
                n -> (lowerTruth == null || guess.detectLower(n) >= settings.power())
                        && (higherTruth == null || guess.detectHigher(n) >= settings.power()),
                n -> guess.agree(n) >= settings.power())) {
            long n = SampleSizeSearch.monotone(meets, 1, size);
            approximate = Math.max(approximate, n == SampleSizeSearch.NONE ? size : n);
        }
        long limit = Math.min(size, Math.max(FULL_SEARCH, 2 * approximate));
        while (limit < size && !meetsAll.test(limit)) limit = Math.min(size, 2 * limit);
        return limit;
    }

    private List<PlanRow> rows(PlanCurves curves, long size, long nInterval, long nDetect, long nAgree,
                               Double lowerTruth, Double higherTruth) {
        Map<Long, Set<String>> marks = new TreeMap<>();
        for (long n : TABLE_SIZES) if (n <= size) marks.computeIfAbsent(n, k -> new LinkedHashSet<>());
        for (long n : settings.sizes()) marks.computeIfAbsent(n, k -> new LinkedHashSet<>()).add("asked");
        if (nInterval != SampleSizeSearch.NONE) marks.computeIfAbsent(nInterval, k -> new LinkedHashSet<>()).add("interval");
        if (nDetect != SampleSizeSearch.NONE) marks.computeIfAbsent(nDetect, k -> new LinkedHashSet<>()).add("detect");
        if (nAgree != SampleSizeSearch.NONE) marks.computeIfAbsent(nAgree, k -> new LinkedHashSet<>()).add("agree");
        marks.computeIfAbsent(size, k -> new LinkedHashSet<>()).add("test set");
        List<PlanRow> rows = new ArrayList<>();
        marks.forEach((n, why) -> rows.add(new PlanRow(n, curves.halfWidth(n),
                lowerTruth == null ? null : curves.detectLower(n), higherTruth == null ? null : curves.detectHigher(n),
                curves.agree(n), List.copyOf(why))));
        return rows;
    }

    /**
     * Hanley &amp; McNeil's standard error at the claimed AUC for a subsample with the test set's
     * class shares, times the finite-population correction; NaN while a class expects fewer than one item.
     * Without a named positive class, the larger of the two assignments (the conservative one).
     */
    private static NormalPlan.StandardError hanleyMcNeil(double auc, long[] split, long size, List<String> notes) {
        double share = (double) split[0] / size;
        boolean named = split[2] == 1;
        notes.add("ROC AUC: a normal approximation with the Hanley–McNeil standard error at the claimed AUC for a subsample "
                + "with the test set's class shares (" + split[0] + " and " + split[1] + " items)"
                + (named ? "" : "; no positive class was named, so the larger of its two values is used")
                + "; the audit itself uses DeLong's variance from your scores");
        return n -> {
            double pos = n * share;
            double neg = n - pos;
            if (pos < 1 || neg < 1) return Double.NaN;
            double se = HanleyMcNeil.standardError(auc, pos, neg);
            if (!named) se = Math.max(se, HanleyMcNeil.standardError(auc, neg, pos));
            return se * Math.sqrt(FinitePopulation.correction(n, size));
        };
    }

    /** The pilot's standard error extrapolated to n (se&sup2; &prop; 1/n) with the finite-population correction. */
    private NormalPlan.StandardError fromPilot(MetricDefinition metric, Claim claim, long size, List<String> notes) {
        if (pilot.size() > size) {
            throw UserInputException.usage("the pilot " + pilot.source() + " has " + pilot.size() + " items, more than the "
                    + "test set's " + size, "give a pilot drawn from the test set, or correct --test-size");
        }
        PlanPilot.Spread spread;
        try {
            spread = pilot.spread(metric, claim.params(), settings.estimation());
        } catch (UserInputException e) {
            throw new NotPlannable(e.problem(), e.fix());
        }
        notes.add("standard error from the pilot " + pilot.source() + " (" + pilot.size() + " items, " + spread.method()
                + "), extrapolated as se² ∝ 1/n and multiplied by the finite-population correction (N−n)/(N−1); "
                + "the pilot's own value is " + show(spread.value(), claim) + ", and the spread is taken as it is there");
        Evidence e = spread.evidence();
        return n -> e.standardErrorAt(n) * Math.sqrt(FinitePopulation.correction(n, size));
    }

    /**
     * {positives, negatives, named}: the test set's two classes for ROC AUC, the positive named by the
     * claim's {@code positive} parameter (named = 1), or, with two classes and none named, the first.
     */
    private static long[] classSplit(Claim claim, Map<String, Long> classCounts) {
        if (classCounts == null || classCounts.isEmpty()) {
            throw new NotPlannable("ROC AUC needs the class counts of the test set (or a pilot with scores)",
                    "give --class-counts pos=1200,neg=800 (class_counts in the claims file), or --pilot FILE");
        }
        long total = classCounts.values().stream().mapToLong(Long::longValue).sum();
        String positive = claim.params().get("positive");
        if (positive != null) {
            Long count = classCounts.get(positive);
            if (count == null) {
                throw new NotPlannable("the positive class '" + positive + "' is not among the class counts ("
                        + String.join(", ", classCounts.keySet()) + ")", "name one of them");
            }
            return new long[] {count, total - count, 1};
        }
        if (classCounts.size() != 2) {
            throw new NotPlannable("ROC AUC over " + classCounts.size() + " classes needs the positive class named",
                    "write the metric as roc_auc:positive=CLASS");
        }
        long[] two = classCounts.values().stream().mapToLong(Long::longValue).toArray();
        return new long[] {two[0], two[1], 0};
    }

    private static ClaimTable selectTable(ClaimsFile claims, String tableId) {
        List<String> ids = claims.tables().stream().map(ClaimTable::id).toList();
        if (tableId == null) {
            if (claims.tables().size() == 1) return claims.tables().get(0);
            throw UserInputException.usage("the claims file " + claims.file() + " has " + ids.size() + " tables",
                    "name one with --table (tables: " + String.join(", ", ids) + ")");
        }
        return claims.tables().stream().filter(t -> t.id().equals(tableId)).findFirst()
                .orElseThrow(() -> UserInputException.usage("table '" + tableId + "' is not in " + claims.file(),
                        "tables: " + String.join(", ", ids)));
    }

    /** The metric's range on the fraction scale: [0, 1] for proportions, from {@link MetricFacts} otherwise. */
    private static double[] range(MetricDefinition metric) {
        MetricFacts facts = MetricFacts.of(metric.id());
        if (facts != null) return new double[] {facts.lowest(), facts.highest()};
        if (metric.kind() != MetricKind.OTHER) return new double[] {0, 1};
        return new double[] {Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY};
    }

    private static boolean isProportion(String metric) {
        if (!MetricRegistry.knows(metric)) return false;
        MetricDefinition d = MetricRegistry.get(metric);
        MetricFacts facts = MetricFacts.of(metric);
        if (facts != null) return facts.lowest() == 0 && (facts.highest() == 1 || metric.equals("rsum"));
        return d.kind() != MetricKind.OTHER;
    }

    private static Long found(long n) { return n == SampleSizeSearch.NONE ? null : n; }

    private static String show(double fraction, Claim claim) {
        if (Double.isInfinite(fraction)) return fraction > 0 ? "∞" : "−∞";
        double printed = fraction * claim.scale().factor();
        return new java.math.BigDecimal(printed).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString()
                + (claim.scale() == Scale.PERCENT ? "%" : "");
    }

    private static String percent(double confidence) {
        return new java.math.BigDecimal(confidence * 100).round(new java.math.MathContext(6)).stripTrailingZeros()
                .toPlainString() + "%";
    }

    /** A claim this planner cannot plan, and what would let it. */
    private static final class NotPlannable extends RuntimeException {
        final String fix;

        NotPlannable(String problem, String fix) {
            super(problem);
            this.fix = fix;
        }
    }
}
