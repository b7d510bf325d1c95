package org.assay.audit.checks;

import java.math.BigDecimal;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.claims.PmKind;
import org.assay.stats.HanleyMcNeil;
import org.assay.stats.Interval;
import org.assay.stats.ProportionMethod;

/**
 * The 95% half-width a claim's test set implies at its printed value: the printed ± when given
 * (converted by its kind), Wilson for count metrics on N items, Hanley–McNeil for ROC AUC with
 * class counts. Null when none applies.
 */
record Uncertainty(double halfWidth, String basis) {
    static final double Z95 = 1.959963984540054;

    static Uncertainty of(Claim c, ClaimTable table) {
        if (c.pm() != null) {
            double pm = c.pm() / c.scale().factor();
            PmKind kind = c.pmKind() == null ? PmKind.UNKNOWN : c.pmKind();
            return switch (kind) {
                case CI95 -> new Uncertainty(pm, "the printed ± (half a 95% interval)");
                case SE -> new Uncertainty(Z95 * pm, "1.96 × the printed standard error");
                case SD -> new Uncertainty(Z95 * pm / Math.sqrt(table.runs()),
                        "1.96 × the printed standard deviation / √runs");
                case UNKNOWN -> new Uncertainty(pm, "the printed ± (kind unknown, taken as it is)");
            };
        }
        MetricFacts facts = MetricFacts.of(c.metric());
        Integer n = c.testSizeIn(table);
        if (facts != null && facts.count() && n != null) {
            double p = c.value().fraction(c.scale());
            long k = Math.max(0, Math.min(n, Math.round(p * n)));
            Interval w = ProportionMethod.WILSON.interval().compute(k, n, 0.95);
            return new Uncertainty(w.halfWidth(), "the 95% Wilson interval for " + k + " of " + n + " items");
        }
        long[] counts = c.metric().equals("roc_auc") ? Claims.positivesAndNegatives(table, c) : null;
        if (counts != null) {
            double auc = Math.max(0, Math.min(1, c.value().fraction(c.scale())));
            double se = HanleyMcNeil.standardError(auc, counts[0], counts[1]);
            return new Uncertainty(Z95 * se, "1.96 × the Hanley–McNeil standard error for " + counts[0] + " and "
                    + counts[1] + " items");
        }
        return null;
    }

    /**
     * Decimals the half-width supports: the uncertainty rounded to two significant digits, and the
     * value to the same decimal place (JCGM 100:2008, the GUM, §7.2.6).
     */
    int supportedDecimals(Claim c) {
        double printedUnits = halfWidth * c.scale().factor();
        if (!(printedUnits > 0)) return Integer.MAX_VALUE;
        return 1 - (int) Math.floor(Math.log10(printedUnits));
    }

    /** The half-width on the claim's printed scale with two significant digits. */
    String shown(Claim c) {
        BigDecimal v = BigDecimal.valueOf(halfWidth * c.scale().factor())
                .round(new java.math.MathContext(2, java.math.RoundingMode.HALF_UP));
        return v.stripTrailingZeros().toPlainString();
    }
}
