package org.assay.audit;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import org.assay.common.UserInputException;
import org.assay.metrics.MetricKind;

/** The interval methods a user can ask for; {@code AUTO} picks by metric kind (DESIGN.md principle 4). */
public enum IntervalChoice {
    AUTO("auto"),
    EXACT("exact"),
    WALD("wald"),
    WILSON("wilson"),
    CLOPPER_PEARSON("clopper-pearson"),
    JEFFREYS("jeffreys"),
    AGRESTI_COULL("agresti-coull"),
    DELONG("delong"),
    PERCENTILE("percentile"),
    BASIC("basic"),
    BCA("bca");

    private final String id;

    IntervalChoice(String id) { this.id = id; }

    public String id() { return id; }

    public boolean isProportion() {
        return this == EXACT || this == WALD || this == WILSON || this == CLOPPER_PEARSON
                || this == JEFFREYS || this == AGRESTI_COULL;
    }

    public boolean isBootstrap() { return this == PERCENTILE || this == BASIC || this == BCA; }

    /** The method actually used for a metric of this kind. */
    public IntervalChoice resolve(MetricKind kind, String metricId) {
        if (this == AUTO) {
            return switch (kind) {
                case COUNT -> EXACT;
                case ROC_AUC -> DELONG;
                case OTHER -> BCA;
            };
        }
        if (isProportion() && kind != MetricKind.COUNT) {
            throw UserInputException.usage("interval " + id + " applies to count metrics (accuracy, error rate, top-k), not "
                    + metricId, "use --interval bca, percentile or basic (or delong for roc_auc)");
        }
        if (this == DELONG && kind != MetricKind.ROC_AUC) {
            throw UserInputException.usage("interval delong applies to roc_auc only, not " + metricId,
                    "use --interval auto");
        }
        return this;
    }

    public static IntervalChoice fromId(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        for (IntervalChoice c : values()) if (c.id.equals(t)) return c;
        throw UserInputException.usage("unknown interval method '" + text + "'",
                "choose one of " + Arrays.stream(values()).map(IntervalChoice::id).collect(Collectors.joining(", ")));
    }

    /** The bootstrap interval this choice names (BCa for any choice that is not a bootstrap method). */
    org.assay.stats.Interval of(org.assay.stats.BootstrapDistribution distribution, double confidence) {
        return switch (this) {
            case PERCENTILE -> distribution.percentile(confidence);
            case BASIC -> distribution.basic(confidence);
            default -> distribution.bca(confidence);
        };
    }
}
