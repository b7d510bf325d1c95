package org.assay.metrics.generation;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;

/**
 * The text-generation metrics. Each works over per-item sufficient statistics (clipped n-gram
 * matches and lengths for BLEU, character n-gram counts for chrF, one score per item for ROUGE
 * and METEOR), so a resampled corpus score is a weighted sum and nothing is re-tokenized inside
 * the resampling loop (DESIGN.md principle 1).
 */
public final class GenerationMetrics {
    private GenerationMetrics() {}

    /** What a metric is, which parameters it takes and where its definition comes from. */
    public record Info(String id, String title, MetricKind kind, Set<String> params, String definition,
                       String reference) {}

    /** Every generation metric, in the order reports list them. */
    private static final List<GenerationMetric> METRICS = List.of(
            new Bleu(), new SentenceBleu(), new Chrf(), new RougeN(1), new RougeN(2), new RougeL(), new Meteor(),
            new ExactMatch(), new TokenF1()
    );

    public static List<Info> all() { return METRICS.stream().map(GenerationMetric::info).toList(); }

    public static GenerationMeasure prepare(String id, Map<String, String> params, GenerationData data) {
        for (GenerationMetric m : METRICS) {
            if (m.info().id().equals(id)) {
                GenerationSettings.checkKnown(m.info(), params);
                return m.prepare(params, data);
            }
        }
        throw UserInputException.usage("unknown generation metric '" + id + "'",
                "use one of: " + String.join(", ", METRICS.stream().map(m -> m.info().id()).toList()));
    }
}
