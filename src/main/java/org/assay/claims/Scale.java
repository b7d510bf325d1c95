package org.assay.claims;

/** How a printed value is scaled: "87.4" percent means 0.874; "0.874" fraction means 0.874. */
public enum Scale {
    PERCENT(100.0),
    FRACTION(1.0);

    private final double factor;

    Scale(double factor) { this.factor = factor; }

    /** Divide a printed number by this to get the metric's own (fraction) scale. */
    public double factor() { return factor; }

    public String id() { return name().toLowerCase(java.util.Locale.ROOT); }
}
