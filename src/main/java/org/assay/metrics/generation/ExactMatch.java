package org.assay.metrics.generation;

import java.util.Map;
import java.util.Set;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;
import org.assay.metrics.CellStatistic;
import org.assay.metrics.OneHotUnitTable;

/**
 * The share of items whose hypothesis equals one of its references, after the SQuAD answer
 * normalisation ({@link AnswerNormalizer}) unless {@code normalize=false} (then the texts must be
 * identical, character for character). A count metric: every item is a success or not.
 */
final class ExactMatch implements GenerationMetric {
    private static final GenerationMetrics.Info INFO = new GenerationMetrics.Info("exact_match", "Exact match",
            MetricKind.COUNT, Set.of("normalize"),
            "share of items whose normalised hypothesis equals some normalised reference (lower-cased, punctuation "
                    + "and articles removed, whitespace collapsed)",
            "Rajpurkar, Zhang, Lopyrev and Liang (2016), SQuAD: 100,000+ Questions for Machine Comprehension of "
                    + "Text, EMNLP (answer normalisation of the v1.1 evaluation)");

    @Override public GenerationMetrics.Info info() { return INFO; }

    @Override
    public GenerationMeasure prepare(Map<String, String> params, GenerationData data) {
        boolean normalize = GenerationSettings.flag(INFO.id(), params, "normalize", true);
        int[] cell = new int[data.size()];
        long successes = 0;
        for (int i = 0; i < cell.length; i++) {
            String hyp = normalize ? AnswerNormalizer.normalize(data.hypotheses().get(i)) : data.hypotheses().get(i);
            for (String ref : data.references().get(i)) {
                if (hyp.equals(normalize ? AnswerNormalizer.normalize(ref) : ref)) {
                    cell[i] = 1;
                    successes++;
                    break;
                }
            }
        }
        CellStatistic statistic = new CellStatistic(new OneHotUnitTable(cell, 2), sums -> {
            double total = sums[0] + sums[1];
            return total == 0 ? Double.NaN : sums[1] / total;
        });
        return new GenerationMeasure(statistic, successes,
                GenerationSettings.line(GenerationSettings.settings("normalize", normalize), data));
    }
}
