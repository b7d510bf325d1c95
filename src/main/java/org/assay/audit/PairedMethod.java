package org.assay.audit;

import java.util.Locale;
import org.assay.common.UserInputException;

/**
 * How a compared pair of rows is tested when its metric has no exact or closed-form paired test
 * (everything but count metrics, which get McNemar's exact test, and ROC AUC, which gets paired
 * DeLong): the paired bootstrap (the default) or approximate randomization.
 */
public enum PairedMethod {
    /** Koehn (2004), EMNLP: the same resampled items for both systems; p from the percentile interval at 0. */
    BOOTSTRAP("bootstrap"),
    /** Riezler &amp; Maxwell (2005): swap each item's pair of outputs with probability 1/2. */
    RANDOMIZATION("randomization");

    private final String id;

    PairedMethod(String id) { this.id = id; }

    public String id() { return id; }

    public static PairedMethod parse(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        for (PairedMethod m : values()) if (m.id.equals(t)) return m;
        throw UserInputException.usage("unknown paired test '" + text + "'",
                "use bootstrap (the default) or randomization (approximate randomization)");
    }
}
