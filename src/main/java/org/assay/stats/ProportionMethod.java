package org.assay.stats;

import java.util.Arrays;
import java.util.stream.Collectors;
import org.assay.common.UserInputException;

/** The proportion interval methods a user can choose, by the id used on the command line. */
public enum ProportionMethod {
    WALD("wald", new WaldInterval()),
    WILSON("wilson", new WilsonInterval()),
    CLOPPER_PEARSON("clopper-pearson", new ClopperPearsonInterval()),
    JEFFREYS("jeffreys", new JeffreysInterval()),
    AGRESTI_COULL("agresti-coull", new AgrestiCoullInterval());

    private final String id;
    private final ProportionInterval interval;

    ProportionMethod(String id, ProportionInterval interval) {
        this.id = id;
        this.interval = interval;
    }

    public String id() { return id; }

    public ProportionInterval interval() { return interval; }

    /** The method with this id (case-insensitive); a usage error listing the valid ids otherwise. */
    public static ProportionMethod fromId(String id) {
        for (ProportionMethod m : values()) {
            if (m.id.equalsIgnoreCase(id == null ? "" : id.trim())) return m;
        }
        String valid = Arrays.stream(values()).map(ProportionMethod::id).collect(Collectors.joining(", "));
        throw UserInputException.usage("unknown proportion interval method '" + id + "'",
                "use one of: " + valid);
    }
}
