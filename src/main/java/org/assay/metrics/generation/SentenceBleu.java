package org.assay.metrics.generation;

import java.util.Arrays;
import java.util.Map;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;
import org.assay.metrics.UnitMean;

/**
 * The mean over items of each item's own BLEU ({@link BleuScore} on that item's counts alone),
 * smoothed by default with the NIST geometric sequence, as sentence-level BLEU usually is. Each
 * item's value is computed once; a resample is a weighted mean.
 */
final class SentenceBleu implements GenerationMetric {
    private static final GenerationMetrics.Info INFO = new GenerationMetrics.Info("sentence_bleu",
            "Sentence BLEU (mean)", MetricKind.OTHER, BleuSettings.PARAMS,
            "mean over items of each item's smoothed BLEU against its references",
            "Papineni, Roukos, Ward and Zhu (2002), ACL; smoothing: Chen and Cherry (2014), A Systematic "
                    + "Comparison of Smoothing Techniques for Sentence-Level BLEU, WMT");

    @Override public GenerationMetrics.Info info() { return INFO; }

    @Override
    public GenerationMeasure prepare(Map<String, String> params, GenerationData data) {
        BleuSettings s = BleuSettings.read(INFO.id(), params, BleuSmoothing.EXP);
        CountTable counts = s.counts(data);
        BleuScore score = new BleuScore(s.order(), s.smoothing());
        double[] perItem = new double[counts.units()];
        double[] row = new double[counts.width()];
        for (int i = 0; i < perItem.length; i++) {
            Arrays.fill(row, 0);
            counts.addUnit(i, 1, row);
            perItem[i] = score.value(row);
        }
        return new GenerationMeasure(UnitMean.statistic(perItem), -1, s.line(data));
    }
}
