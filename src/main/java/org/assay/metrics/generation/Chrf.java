package org.assay.metrics.generation;

import java.util.Map;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;
import org.assay.metrics.SumStatistic;

/**
 * Corpus chrF and chrF++ ({@link ChrfScore} over counts summed across items). With several
 * references, each item contributes the counts of the reference that gives it the best
 * sentence-level chrF (the first of equal ones): a choice made once per item, before any
 * resampling.
 */
final class Chrf implements GenerationMetric {
    private static final GenerationMetrics.Info INFO = new GenerationMetrics.Info("chrf", "chrF / chrF++",
            MetricKind.OTHER, Set.of("char_order", "word_order", "beta", "lowercase"),
            "F-beta of character n-gram precision and recall (n = 1..char_order, whitespace removed), plus word "
                    + "n-grams 1..word_order for chrF++, each averaged over the orders, from counts summed over items; "
                    + "per item the reference with the best sentence chrF",
            "Popović (2015), chrF: character n-gram F-score for automatic MT evaluation, WMT; "
                    + "Popović (2017), chrF++: words helping character n-grams, WMT");

    @Override public GenerationMetrics.Info info() { return INFO; }

    @Override
    public GenerationMeasure prepare(Map<String, String> params, GenerationData data) {
        String id = INFO.id();
        int charOrder = GenerationSettings.integer(id, params, "char_order", 6, 0, 12);
        int wordOrder = GenerationSettings.integer(id, params, "word_order", 0, 0, 6);
        double beta = GenerationSettings.real(id, params, "beta", 2, 0, 100);
        boolean lowercase = GenerationSettings.flag(id, params, "lowercase", false);
        if (charOrder + wordOrder == 0) {
            throw UserInputException.usage("chrf parameters char_order and word_order are both 0",
                    "give char_order=6 (chrF) or char_order=6;word_order=2 (chrF++)");
        }
        ChrfScore score = new ChrfScore(charOrder + wordOrder, beta);
        int width = ChrfCounts.width(charOrder, wordOrder);
        int[] all = new int[data.size() * width];
        double[] sums = new double[width];
        for (int i = 0; i < data.size(); i++) {
            ChrfCounts.Prepared hyp = ChrfCounts.Prepared.of(data.hypotheses().get(i), lowercase);
            int[] best = null;
            double bestValue = Double.NEGATIVE_INFINITY;
            for (String ref : data.references().get(i)) {
                int[] row = ChrfCounts.of(hyp, ChrfCounts.Prepared.of(ref, lowercase), charOrder, wordOrder);
                for (int c = 0; c < width; c++) sums[c] = row[c];
                double v = score.value(sums);
                if (v > bestValue) {
                    best = row;
                    bestValue = v;
                }
            }
            System.arraycopy(best, 0, all, i * width, width);
        }
        SumStatistic statistic = new SumStatistic(new CountTable(all, width), score);
        String line = GenerationSettings.line(GenerationSettings.settings("char_order", charOrder,
                "word_order", wordOrder, "beta", beta, "lowercase", lowercase), data);
        return new GenerationMeasure(statistic, -1, line);
    }
}
