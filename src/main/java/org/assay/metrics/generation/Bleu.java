package org.assay.metrics.generation;

import java.util.Map;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;
import org.assay.metrics.SumStatistic;

/**
 * Corpus BLEU: n-gram matches, n-gram totals and lengths summed over items, then one BLEU value
 * ({@link BleuScore}). A resample re-weights the items' counts; nothing is re-tokenized.
 */
final class Bleu implements GenerationMetric {
    private static final GenerationMetrics.Info INFO = new GenerationMetrics.Info("bleu", "BLEU", MetricKind.OTHER,
            BleuSettings.PARAMS,
            "brevity penalty times the geometric mean of the clipped n-gram precisions, n = 1..order, "
                    + "from counts summed over all items",
            "Papineni, Roukos, Ward and Zhu (2002), BLEU: a method for automatic evaluation of machine translation, "
                    + "ACL; smoothing: Chen and Cherry (2014), WMT");

    @Override public GenerationMetrics.Info info() { return INFO; }

    @Override
    public GenerationMeasure prepare(Map<String, String> params, GenerationData data) {
        BleuSettings s = BleuSettings.read(INFO.id(), params, BleuSmoothing.NONE);
        SumStatistic statistic = new SumStatistic(s.counts(data), new BleuScore(s.order(), s.smoothing()));
        return new GenerationMeasure(statistic, -1, s.line(data));
    }
}
