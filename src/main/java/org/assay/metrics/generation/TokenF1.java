package org.assay.metrics.generation;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.assay.data.generation.GenerationData;
import org.assay.data.generation.Whitespace;
import org.assay.metrics.MetricKind;
import org.assay.metrics.UnitMean;

/**
 * The mean over items of the best token-level F1 between the hypothesis and any of its references
 * ({@link AnswerNormalizer#tokenF1}), the words taken after the SQuAD answer normalisation unless
 * {@code normalize=false} (then the texts split on whitespace).
 */
final class TokenF1 implements GenerationMetric {
    private static final GenerationMetrics.Info INFO = new GenerationMetrics.Info("token_f1", "Token F1",
            MetricKind.OTHER, Set.of("normalize"),
            "mean over items of the largest bag-of-words F1 between the normalised hypothesis and a normalised reference",
            "Rajpurkar, Zhang, Lopyrev and Liang (2016), SQuAD: 100,000+ Questions for Machine Comprehension of "
                    + "Text, EMNLP (token F1 of the v1.1 evaluation)");

    @Override public GenerationMetrics.Info info() { return INFO; }

    @Override
    public GenerationMeasure prepare(Map<String, String> params, GenerationData data) {
        boolean normalize = GenerationSettings.flag(INFO.id(), params, "normalize", true);
        double[] perItem = new double[data.size()];
        for (int i = 0; i < perItem.length; i++) {
            List<String> hyp = words(data.hypotheses().get(i), normalize);
            double best = 0;
            for (String ref : data.references().get(i)) best = Math.max(best, AnswerNormalizer.tokenF1(hyp, words(ref, normalize)));
            perItem[i] = best;
        }
        return new GenerationMeasure(UnitMean.statistic(perItem), -1,
                GenerationSettings.line(GenerationSettings.settings("normalize", normalize), data));
    }

    private static List<String> words(String text, boolean normalize) {
        return normalize ? AnswerNormalizer.words(text) : Whitespace.split(text);
    }
}
