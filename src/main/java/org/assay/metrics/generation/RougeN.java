package org.assay.metrics.generation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;
import org.assay.metrics.UnitMean;

/**
 * ROUGE-N (Lin 2004, "ROUGE: A Package for Automatic Evaluation of Summaries", §2): the n-grams a
 * hypothesis shares with a reference, each counted at most as often as it occurs in both (clipped
 * counts), over the reference's n-grams (recall), the hypothesis's n-grams (precision), or their
 * F-measure ({@link RougeMeasure}). Lin's formula is the recall; reporting the F-measure by default
 * follows common practice. An item with several references scores the maximum over them;
 * the corpus value is the mean of the item scores. Tokens as in {@link RougeSettings}.
 */
final class RougeN implements GenerationMetric {
    private final int n;
    private final GenerationMetrics.Info info;

    RougeN(int n) {
        this.n = n;
        this.info = new GenerationMetrics.Info("rouge_" + n, "ROUGE-" + n, MetricKind.OTHER, RougeSettings.PARAMS,
                "clipped " + n + "-gram overlap between hypothesis and reference as an F-measure (beta = 1; "
                        + "measure=precision or recall for the others), the maximum over an item's references, "
                        + "averaged over items; lower-cased runs of letters and digits, Porter stems with stem=true",
                "Lin (2004) ROUGE: A Package for Automatic Evaluation of Summaries, ACL Workshop Text "
                        + "Summarization Branches Out, §2");
    }

    @Override public GenerationMetrics.Info info() { return info; }

    @Override
    public GenerationMeasure prepare(Map<String, String> params, GenerationData data) {
        RougeSettings settings = RougeSettings.read(info.id(), params);
        PorterStemming stemmer = new PorterStemming();
        double[] perItem = new double[data.size()];
        for (int i = 0; i < perItem.length; i++) {
            List<String> hyp = settings.tokens(data.hypotheses().get(i), stemmer);
            Map<String, Integer> hypGrams = ngrams(hyp);
            double best = 0;
            for (String ref : data.references().get(i)) {
                List<String> refTokens = settings.tokens(ref, stemmer);
                best = Math.max(best, score(settings.measure(), hypGrams, count(hyp), ngrams(refTokens), count(refTokens)));
            }
            perItem[i] = best;
        }
        return new GenerationMeasure(UnitMean.statistic(perItem), -1, settings.line(data));
    }

    private double score(RougeMeasure measure, Map<String, Integer> hyp, int hypCount, Map<String, Integer> ref,
                         int refCount) {
        int overlap = 0;
        for (Map.Entry<String, Integer> e : hyp.entrySet()) overlap += Math.min(e.getValue(), ref.getOrDefault(e.getKey(), 0));
        return measure.of(overlap, hypCount, refCount);
    }

    private int count(List<String> tokens) { return Math.max(0, tokens.size() - n + 1); }

    /** Each n-gram (tokens joined by a space, which no token contains) with its count. */
    private Map<String, Integer> ngrams(List<String> tokens) {
        Map<String, Integer> out = new HashMap<>();
        for (int i = 0; i + n <= tokens.size(); i++) out.merge(String.join(" ", tokens.subList(i, i + n)), 1, Integer::sum);
        return out;
    }
}
