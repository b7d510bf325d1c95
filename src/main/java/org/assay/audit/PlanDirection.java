package org.assay.audit;

import java.util.Locale;
import org.assay.common.UserInputException;

/** Which wrong claims a plan should be able to catch: a true value below the claim, above it, or either. */
public enum PlanDirection {
    LOWER, HIGHER, EITHER;

    public String id() { return name().toLowerCase(Locale.ROOT); }

    public static PlanDirection parse(String text) {
        for (PlanDirection d : values()) if (d.id().equals(text.strip().toLowerCase(Locale.ROOT))) return d;
        throw UserInputException.usage("unknown --direction '" + text + "'", "use lower, higher or either");
    }

    boolean lower() { return this != HIGHER; }

    boolean higher() { return this != LOWER; }
}
