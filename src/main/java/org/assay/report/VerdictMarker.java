package org.assay.report;

import org.assay.audit.Verdict;

/**
 * How a verdict is drawn in the plots: a shape and a colour, always next to the verdict word, so
 * that the verdict never rests on colour alone. The colours are from the Okabe–Ito palette
 * (M. Okabe and K. Ito, "Color Universal Design", 2008; hex values from memory), chosen to stay
 * apart for the common kinds of colour-vision deficiency.
 */
enum VerdictMarker {
    CONSISTENT(Verdict.CONSISTENT, "circle", "#009E73"),       // bluish green
    INCONCLUSIVE(Verdict.INCONCLUSIVE, "diamond", "#0072B2"),  // blue
    DISCREPANT(Verdict.DISCREPANT, "square", "#D55E00"),       // vermillion
    NOT_COMPUTABLE(Verdict.NOT_COMPUTABLE, "dash", "#6E6E6E");  // grey: nothing was estimated

    /** Half the size of a marker in pixels. */
    static final double RADIUS = 6;

    private final Verdict verdict;
    private final String shape;
    private final String colour;

    VerdictMarker(Verdict verdict, String shape, String colour) {
        this.verdict = verdict;
        this.shape = shape;
        this.colour = colour;
    }

    static VerdictMarker of(Verdict v) {
        for (VerdictMarker m : values()) if (m.verdict == v) return m;
        throw new IllegalArgumentException("no marker for " + v);
    }

    String shape() { return shape; }

    String colour() { return colour; }

    /** Draws the marker centred on (x, y) with the given class. */
    void draw(Svg svg, String cssClass, double x, double y) {
        svg.leaf("path", "class", cssClass, "data-verdict", verdict.word(), "data-shape", shape,
                "transform", "translate(" + Svg.num(x) + " " + Svg.num(y) + ")", "d", outline(),
                "fill", colour, "stroke", "#000000", "stroke-width", "0.8");
    }

    /** The shape's outline around the origin. */
    private String outline() {
        double r = RADIUS;
        String n = Svg.num(r), m = Svg.num(-r);
        return switch (this) {
            // a circle as two arcs, so every marker is a path with the same attributes
            case CONSISTENT -> "M" + m + " 0A" + n + " " + n + " 0 1 0 " + n + " 0A" + n + " " + n + " 0 1 0 " + m + " 0Z";
            case INCONCLUSIVE -> "M0 " + Svg.num(-r * 1.25) + "L" + Svg.num(r * 1.25) + " 0L0 " + Svg.num(r * 1.25)
                    + "L" + Svg.num(-r * 1.25) + " 0Z";
            case DISCREPANT -> "M" + Svg.num(-r * 0.9) + " " + Svg.num(-r * 0.9) + "H" + Svg.num(r * 0.9) + "V"
                    + Svg.num(r * 0.9) + "H" + Svg.num(-r * 0.9) + "Z";
            case NOT_COMPUTABLE -> "M" + m + " -1.5H" + n + "V1.5H" + m + "Z";
        };
    }
}
