package org.assay.audit;

import java.util.List;

/**
 * One subsample size of a plan's table, all on the metric's fraction scale.
 *
 * @param halfWidth    half-width of the audit's interval at that size
 * @param detectLower  power to find a true value one margin below the claim discrepant; null when not planned
 * @param detectHigher the same one margin above; null when not planned
 * @param agree        power to find the claim consistent when it is right
 * @param marks        why the size is in the table: "interval", "detect", "agree" (the plan's answers), "test set", "asked"
 */
public record PlanRow(long n, double halfWidth, Double detectLower, Double detectHigher, double agree, List<String> marks) {
    public PlanRow {
        marks = List.copyOf(marks);
    }

    /** The power to detect in the planned direction: the smaller of the two when both are planned. */
    public double detect() {
        if (detectLower == null) return detectHigher;
        if (detectHigher == null) return detectLower;
        return Math.min(detectLower, detectHigher);
    }
}
