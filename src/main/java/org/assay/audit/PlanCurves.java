package org.assay.audit;

/**
 * A claim's interval half-width and powers as functions of the subsample size n, on the metric's
 * fraction scale: exact for count metrics ({@link CountPlanCurves}), a normal approximation for the
 * rest ({@link NormalPlanCurves}).
 */
interface PlanCurves {
    /** Half-width of the audit's interval at size n. */
    double halfWidth(long n);

    /** Power to find a true value one margin below the claim discrepant; NaN when that direction is not planned. */
    double detectLower(long n);

    /** Power to find a true value one margin above the claim discrepant; NaN when that direction is not planned. */
    double detectHigher(long n);

    /** Power to find the claim consistent when it is right. */
    double agree(long n);

    /** Whether the curves zigzag with n (exact counts), so that a target met at n may be missed at n + 1. */
    boolean zigzags();
}
