package org.assay.claims;

/** What a printed "±" value means: standard deviation over runs, standard error, half a 95% interval. */
public enum PmKind {
    SD, SE, CI95, UNKNOWN;

    public String id() { return name().toLowerCase(java.util.Locale.ROOT); }
}
