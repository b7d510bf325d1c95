package org.assay.metrics.generation;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;
import org.assay.metrics.UnitMean;

/**
 * METEOR (Banerjee & Lavie 2005, "METEOR: An Automatic Metric for MT Evaluation with Improved
 * Correlation with Human Judgments", ACL Workshop on Intrinsic and Extrinsic Evaluation Measures)
 * as NLTK 3.8's {@code nltk.translate.meteor_score} computes it, with its greedy staged alignment
 * ({@link MeteorAlignment}: exact, Porter stem, WordNet 3.0 synonym). With m matched words, a
 * hypothesis of t words and a reference of r words: P = m / t, R = m / r,
 * F_mean = P R / (alpha P + (1 - alpha) R), penalty = gamma (chunks / m)^beta, and the score is
 * F_mean (1 - penalty); 0 when nothing matches or a text is empty. The defaults alpha = 0.9,
 * beta = 3, gamma = 0.5 are Banerjee & Lavie's F_mean = 10PR / (R + 9P) and penalty
 * 0.5 (chunks / matches)^3 (from memory), and NLTK's defaults: the commonly used values.
 *
 * <p>Tokens: the text is lower-cased and split by {@code tokenize} (default none: on whitespace,
 * punctuation staying attached). An item with several references scores the maximum over them (as
 * NLTK's {@code meteor_score}); the corpus value is the mean of the item scores, since NLTK's score
 * is sentence-level and is averaged over sentences in practice.
 *
 * <p>Stemming differs from NLTK's default in one respect: NLTK's {@code PorterStemmer()} runs in its
 * NLTK_EXTENSIONS mode ("dying" -> "die"); ours is the original algorithm ({@link PorterStemming};
 * "dying" -> "dy"), the same as NLTK's {@code PorterStemmer(mode=ORIGINAL_ALGORITHM)}.
 */
final class Meteor implements GenerationMetric {
    private static final GenerationMetrics.Info INFO = new GenerationMetrics.Info("meteor", "METEOR", MetricKind.OTHER,
            Set.of("tokenize", "alpha", "beta", "gamma", "wordnet"),
            "harmonic-type mean of unigram precision and recall, F = PR / (alpha P + (1 - alpha) R), times "
                    + "1 - gamma (chunks / matches)^beta, with words matched greedily by exact form, Porter stem "
                    + "and WordNet 3.0 synonym as NLTK 3.8 does; lower-cased; the maximum over an item's "
                    + "references, averaged over items",
            "Banerjee & Lavie (2005) METEOR, ACL Workshop on Intrinsic and Extrinsic Evaluation Measures for "
                    + "MT and/or Summarization; alignment as nltk.translate.meteor_score (NLTK 3.8)");

    @Override public GenerationMetrics.Info info() { return INFO; }

    @Override
    public GenerationMeasure prepare(Map<String, String> params, GenerationData data) {
        String id = INFO.id();
        Tokenizer tokenizer = Tokenizer.parse(params.getOrDefault("tokenize", Tokenizer.NONE.id()));
        double alpha = GenerationSettings.real(id, params, "alpha", 0.9, 0, 1);
        double beta = GenerationSettings.real(id, params, "beta", 3, 0, 100);
        double gamma = GenerationSettings.real(id, params, "gamma", 0.5, 0, 1);
        GenerationSettings.choice(id, params, "wordnet", WordNetSynonyms.VERSION, List.of(WordNetSynonyms.VERSION));
        MeteorAlignment aligner = new MeteorAlignment(new PorterStemming(), WordNetSynonyms.get());
        double[] perItem = new double[data.size()];
        for (int i = 0; i < perItem.length; i++) {
            List<String> hyp = tokenizer.tokens(data.hypotheses().get(i), true);
            double best = 0;
            for (String ref : data.references().get(i)) {
                List<String> refTokens = tokenizer.tokens(ref, true);
                best = Math.max(best, score(aligner.align(hyp, refTokens), hyp.size(), refTokens.size(), alpha, beta, gamma));
            }
            perItem[i] = best;
        }
        String line = GenerationSettings.line(GenerationSettings.settings("tokenize", tokenizer.id(), "alpha", alpha,
                "beta", beta, "gamma", gamma, "wordnet", WordNetSynonyms.VERSION), data);
        return new GenerationMeasure(UnitMean.statistic(perItem), -1, line);
    }

    /** NLTK's {@code single_meteor_score} from an alignment, in its order of operations. */
    static double score(MeteorAlignment.Result a, int hypothesisLength, int referenceLength, double alpha, double beta,
                        double gamma) {
        if (a.matches() == 0 || hypothesisLength == 0 || referenceLength == 0) return 0;
        double precision = (double) a.matches() / hypothesisLength;
        double recall = (double) a.matches() / referenceLength;
        double fmean = precision * recall / (alpha * precision + (1 - alpha) * recall);
        double penalty = gamma * Math.pow((double) a.chunks() / a.matches(), beta);
        return (1 - penalty) * fmean;
    }
}
