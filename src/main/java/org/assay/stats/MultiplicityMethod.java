package org.assay.stats;

import java.util.Locale;
import org.assay.common.UserInputException;

/**
 * How an audit adjusts its p-values for testing many claims at once: Holm's step-down method
 * (family-wise error rate, the default) or Benjamini&ndash;Hochberg's step-up method (false
 * discovery rate). The formulas and their sources are in {@link Multiplicity}.
 */
public enum MultiplicityMethod {
    HOLM("holm", "Holm"),
    BH("bh", "Benjamini–Hochberg");

    private final String id;
    private final String title;

    MultiplicityMethod(String id, String title) {
        this.id = id;
        this.title = title;
    }

    /** The option value: {@code holm} or {@code bh}. */
    public String id() { return id; }

    /** The method's name for people: "Holm" or "Benjamini–Hochberg". */
    public String title() { return title; }

    /** Adjusted p-values, in the input order. */
    public double[] adjust(double[] p) {
        return this == HOLM ? Multiplicity.holm(p) : Multiplicity.benjaminiHochberg(p);
    }

    public static MultiplicityMethod parse(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        for (MultiplicityMethod m : values()) if (m.id.equals(t)) return m;
        throw UserInputException.usage("unknown multiplicity adjustment '" + text + "'",
                "use holm (family-wise error rate, the default) or bh (Benjamini–Hochberg false discovery rate)");
    }
}
