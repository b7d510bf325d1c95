package org.assay.metrics.generation;

import java.util.List;
import java.util.Map;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.MetricKind;
import org.assay.metrics.UnitMean;

/**
 * ROUGE-L at the sentence level (Lin 2004, "ROUGE: A Package for Automatic Evaluation of
 * Summaries", §3.1): with LCS the length of the longest common subsequence of the hypothesis and
 * reference tokens, R = LCS / |reference|, P = LCS / |hypothesis| and their F-measure
 * ({@link RougeMeasure}). Each text is one sequence: the summary-level union-LCS over sentence
 * splits (§3.2) is not offered. An item with several references scores the maximum over them; the
 * corpus value is the mean of the item scores. Tokens as in {@link RougeSettings}.
 */
final class RougeL implements GenerationMetric {
    private static final GenerationMetrics.Info INFO = new GenerationMetrics.Info("rouge_l", "ROUGE-L", MetricKind.OTHER,
            RougeSettings.PARAMS,
            "longest common subsequence of hypothesis and reference tokens as an F-measure (beta = 1; "
                    + "measure=precision or recall for the others), each text one sequence, the maximum over an "
                    + "item's references, averaged over items; lower-cased runs of letters and digits, Porter "
                    + "stems with stem=true",
            "Lin (2004) ROUGE: A Package for Automatic Evaluation of Summaries, ACL Workshop Text "
                    + "Summarization Branches Out, §3.1");

    @Override public GenerationMetrics.Info info() { return INFO; }

    @Override
    public GenerationMeasure prepare(Map<String, String> params, GenerationData data) {
        RougeSettings settings = RougeSettings.read(INFO.id(), params);
        PorterStemming stemmer = new PorterStemming();
        double[] perItem = new double[data.size()];
        for (int i = 0; i < perItem.length; i++) {
            List<String> hyp = settings.tokens(data.hypotheses().get(i), stemmer);
            double best = 0;
            for (String ref : data.references().get(i)) {
                List<String> refTokens = settings.tokens(ref, stemmer);
                best = Math.max(best, settings.measure().of(lcs(hyp, refTokens), hyp.size(), refTokens.size()));
            }
            perItem[i] = best;
        }
        return new GenerationMeasure(UnitMean.statistic(perItem), -1, settings.line(data));
    }

    /** Length of the longest common subsequence, by the usual dynamic programme over two rows. */
    static int lcs(List<String> a, List<String> b) {
        int[] previous = new int[b.size() + 1], current = new int[b.size() + 1];
        for (String x : a) {
            for (int j = 1; j <= b.size(); j++) {
                current[j] = x.equals(b.get(j - 1)) ? previous[j - 1] + 1 : Math.max(previous[j], current[j - 1]);
            }
            int[] t = previous; previous = current; current = t;
        }
        return previous[b.size()];
    }
}
