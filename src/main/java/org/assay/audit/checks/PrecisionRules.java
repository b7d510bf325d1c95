package org.assay.audit.checks;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.claims.PmKind;
import org.assay.stats.Interval;
import org.assay.stats.ProportionMethod;

/** Rules about the uncertainty a table prints or implies. */
final class PrecisionRules {
    private PrecisionRules() {}

    /** More decimals than the test set's sampling error supports. */
    static final class Digits implements CheckRule {
        static final String NAME = "precision";

        @Override public String name() { return NAME; }

        @Override
        public List<CheckFinding> check(ClaimTable table, Tally tally) {
            List<CheckFinding> out = new ArrayList<>();
            List<String> unchecked = new ArrayList<>();
            for (Claim c : table.claims()) {
                Uncertainty u = Uncertainty.of(c, table);
                if (u == null) {
                    MetricFacts f = MetricFacts.of(c.metric());
                    if (f != null && f.count() && c.testSizeIn(table) == null) out.add(NotChecked.missingTestSize(NAME, table, c));
                    else if (c.metric().equals("roc_auc")) out.add(NotChecked.missingClassCounts(NAME, table, c, "the class counts"));
                    else if (!unchecked.contains(c.metric())) unchecked.add(c.metric());
                    continue;
                }
                tally.ran(NAME);
                int supported = u.supportedDecimals(c);
                if (c.value().decimals() <= supported) continue;
                int keep = Math.max(0, supported);
                String rounded = c.value().number().setScale(keep, RoundingMode.HALF_UP).toPlainString();
                Map<String, Object> d = new LinkedHashMap<>();
                d.put("half_width", u.halfWidth());
                d.put("basis", u.basis());
                d.put("supported_decimals", keep);
                out.add(CheckFinding.of(NAME, CheckKind.OVERSTATED_PRECISION, table.id(), List.of(c),
                        Claims.quote(c) + " is printed with " + c.value().decimals() + " decimals, but its 95% half-width is "
                                + "about ±" + u.shown(c) + " (" + u.basis() + "), which supports " + keep + ".",
                        "report it as " + rounded + " ± " + u.shown(c) + " (95% interval), or give the interval", d));
            }
            if (!unchecked.isEmpty()) {
                out.add(CheckFinding.of(NAME, CheckKind.NOTE, table.id(), List.of(),
                        "the precision of " + String.join(", ", unchecked) + " in table " + table.id() + " is not checked: "
                                + "without predictions or a printed ± there is no interval formula for them.",
                        "print a ± (with pm_kind) in the claims file to have it checked", Map.of()));
            }
            return out;
        }
    }

    /** Printed ± values that do not fit their kind and the test-set size. */
    static final class PlusMinus implements CheckRule {
        static final String NAME = "plus-minus";

        @Override public String name() { return NAME; }

        @Override
        public List<CheckFinding> check(ClaimTable table, Tally tally) {
            List<CheckFinding> out = new ArrayList<>();
            for (Claim c : table.claims()) {
                if (c.pm() == null) continue;
                MetricFacts f = MetricFacts.of(c.metric());
                Integer n = c.testSizeIn(table);
                PmKind kind = c.pmKind() == null ? PmKind.UNKNOWN : c.pmKind();
                if (kind == PmKind.SD && table.runs() == 1) {
                    tally.ran(NAME);
                    out.add(CheckFinding.of(NAME, CheckKind.NOTE, table.id(), List.of(c),
                            Claims.quote(c) + " ± " + pmText(c) + " is a standard deviation, which needs several runs, but "
                                    + "the table does not say how many runs were averaged.",
                            "state the number of runs (runs: in the claims file, and in the paper)", Map.of()));
                }
                if (f == null || !f.count() || n == null || table.runs() > 1) continue;
                double pm = c.pm() / c.scale().factor();
                double pmLo = Math.max(0, pm - halfUnit(c.pm()) / c.scale().factor());
                double pmHi = pm + halfUnit(c.pm()) / c.scale().factor();
                if (kind == PmKind.SE) {
                    tally.ran(NAME);
                    double p = Math.max(Claims.lo(c), Math.min(Claims.hi(c), 0.5));   // the p nearest 1/2 maximises p(1-p)
                    double maxSe = Math.sqrt(Math.max(0, p * (1 - p)) / n);
                    if (pmLo > maxSe * (1 + 1e-9)) {
                        out.add(CheckFinding.of(NAME, CheckKind.INFEASIBLE, table.id(), List.of(c),
                                Claims.quote(c) + " ± " + pmText(c) + " is given as a standard error, but a proportion near "
                                        + Claims.shown(c) + " on " + n + " items has a standard error of at most "
                                        + Claims.onScale(c, maxSe, c.value().decimals() + 2) + ".",
                                "check whether the ± is a standard deviation over runs or an interval", Map.of("max_standard_error", maxSe)));
                    }
                } else if (kind == PmKind.CI95) {
                    tally.ran(NAME);
                    double p = c.value().fraction(c.scale());
                    long k = Math.max(0, Math.min(n, Math.round(p * n)));
                    Interval w = ProportionMethod.WILSON.interval().compute(k, n, 0.95);
                    double hw = w.halfWidth();
                    if (pmHi < hw / 2 || pmLo > 2 * hw) {
                        out.add(CheckFinding.of(NAME, CheckKind.QUESTIONABLE, table.id(), List.of(c),
                                Claims.quote(c) + " ± " + pmText(c) + " is given as a 95% interval, but sampling alone gives "
                                        + "about ± " + Claims.onScale(c, hw, c.value().decimals() + 1) + " on " + n
                                        + " items (Wilson), " + (pmHi < hw / 2 ? "more than twice as wide" : "less than half as wide")
                                        + ".",
                                "say how the interval was computed (over test items or over runs)", Map.of("wilson_half_width", hw)));
                    }
                }
            }
            return out;
        }

        private static String pmText(Claim c) {
            return BigDecimal.valueOf(c.pm()).stripTrailingZeros().toPlainString();
        }

        /** Half a unit in the last printed place of the ± (as far as the stored number shows it). */
        private static double halfUnit(double pm) {
            int scale = Math.max(0, BigDecimal.valueOf(pm).stripTrailingZeros().scale());
            return 0.5 * Math.pow(10, -scale);
        }
    }
}
