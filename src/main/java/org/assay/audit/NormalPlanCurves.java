package org.assay.audit;

import org.assay.stats.NormalPlan;

/** Normal-approximation curves for a metric without an exact method, from a standard error se(n). */
final class NormalPlanCurves implements PlanCurves {
    private final NormalPlan plan;
    private final double value;
    private final double confidence;
    private final Double lowerTruth;
    private final Double higherTruth;

    NormalPlanCurves(NormalPlan.StandardError se, double value, double lo, double hi, double margin, PlanSettings settings,
                     Double lowerTruth, Double higherTruth) {
        this.plan = new NormalPlan(se, lo, hi, margin, settings.alpha(), settings.equivalenceConfidence());
        this.value = value;
        this.confidence = settings.confidence();
        this.lowerTruth = lowerTruth;
        this.higherTruth = higherTruth;
    }

    @Override public double halfWidth(long n) { return plan.halfWidth(n, confidence); }

    @Override public double detectLower(long n) { return lowerTruth == null ? Double.NaN : plan.discrepantPower(n, lowerTruth); }

    @Override public double detectHigher(long n) { return higherTruth == null ? Double.NaN : plan.discrepantPower(n, higherTruth); }

    @Override public double agree(long n) { return plan.consistentPower(n, value); }

    @Override public boolean zigzags() { return false; }
}
