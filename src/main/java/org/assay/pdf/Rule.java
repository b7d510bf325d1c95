package org.assay.pdf;

/**
 * A ruling line drawn on a page (a booktabs rule, an {@code \hline}, a vertical rule, an
 * underline), as a box in top-left page coordinates. pdfTeX draws most rules as thin filled
 * rectangles; stroked lines are widened by their line width into the same form.
 */
public record Rule(double x0, double x1, double top, double bottom) {

    /** Thinner than this (points) across its length counts as a line, not a filled box. */
    static final double MAX_THICKNESS = 2.5;

    public boolean horizontal() { return width() >= height() && height() <= MAX_THICKNESS; }

    public boolean vertical() { return height() > width() && width() <= MAX_THICKNESS; }

    public double width() { return x1 - x0; }

    public double height() { return bottom - top; }

    public double y() { return (top + bottom) / 2; }

    public double x() { return (x0 + x1) / 2; }

    /** Horizontal overlap with [a, b] in points (negative when apart). */
    public double overlapX(double a, double b) { return Math.min(x1, b) - Math.max(x0, a); }
}
