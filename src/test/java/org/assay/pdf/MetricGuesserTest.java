package org.assay.pdf;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.audit.checks.MetricFacts;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Metric ids from column headers. The header abbreviations and their meanings are common practice in
 * machine-learning results tables (for example "R@K" in retrieval tables is the hit rate within the top K,
 * "MedR" the median rank of the first correct item, "B@4" BLEU with 4-grams).
 */
class MetricGuesserTest {

    /** header levels joined by '|' (top first); caption; metric id; params as k=v pairs joined by ','. */
    @ParameterizedTest(name = "[{index}] {0} / {1}")
    @CsvSource(delimiter = ';', nullValues = "null", textBlock = """
            Accuracy;null;accuracy;
            Acc.;null;accuracy;
            Acc;null;accuracy;
            ACC;null;accuracy;
            Acc (%);null;accuracy;
            Acc. (↑);null;accuracy;
            Top-1;null;accuracy;
            Accuracy|Top-1;null;accuracy;
            Top-1 Acc. (%);null;accuracy;
            Acc@1;null;accuracy;
            Top-5;null;top_k_accuracy;k=5
            Accuracy|Top-5;null;top_k_accuracy;k=5
            Top-5 Accuracy;null;top_k_accuracy;k=5
            Acc@5;null;top_k_accuracy;k=5
            Error|Top-1;null;error_rate;
            Top-1 err.;null;error_rate;
            Error rate;null;error_rate;
            Err. (%);null;error_rate;
            Balanced Accuracy;null;balanced_accuracy;
            Bal. Acc.;null;balanced_accuracy;
            Precision;null;precision;
            Prec.;null;precision;
            P;null;precision;
            Recall;null;recall;
            R;null;recall;
            F1;null;f1;
            F1-score;null;f1;
            F1 score;null;f1;
            Macro|F1;null;macro_f1;
            F1|Macro;null;macro_f1;
            Macro-F1;null;macro_f1;
            macro F1;null;macro_f1;
            F1 (macro);null;macro_f1;
            F1;Results (macro-averaged F1) on the test split.;macro_f1;
            Macro|Precision;null;macro_precision;
            Macro-averaged recall;null;macro_recall;
            Micro-F1;null;micro_f1;
            Weighted F1;null;weighted_f1;
            MaF1;null;macro_f1;
            AUC;null;roc_auc;
            AUROC;null;roc_auc;
            ROC-AUC;null;roc_auc;
            ROC AUC;null;roc_auc;
            AUC-ROC;null;roc_auc;
            AP;null;average_precision;
            mAP;null;average_precision;
            Average Precision;null;average_precision;
            mAP@10;null;map_at_k;k=10
            MAP@100;null;map_at_k;k=100
            R@1;null;recall_at_k;k=1
            R@5;null;recall_at_k;k=5
            R@10;null;recall_at_k;k=10
            R @ 10;null;recall_at_k;k=10
            Recall@10;null;recall_at_k;k=10
            Hit@1;null;recall_at_k;k=1
            Hits@10;null;recall_at_k;k=10
            H@10;null;recall_at_k;k=10
            HR@10;null;recall_at_k;k=10
            Text → Video|R@1;null;recall_at_k;k=1
            R1;Text-to-video retrieval on the held-out split.;recall_at_k;k=1
            R-Precision;null;r_precision;
            R-Prec;null;r_precision;
            MRR;null;mrr;
            MRR@10;null;mrr;k=10
            NDCG@10;null;ndcg_at_k;k=10
            nDCG@5;null;ndcg_at_k;k=5
            MnR;null;mean_rank;
            MeanR;null;mean_rank;
            Mean Rank;null;mean_rank;
            MedR;null;median_rank;
            Med r;null;median_rank;
            MdR;null;median_rank;
            RSUM;null;rsum;
            rsum;null;rsum;
            R-sum;null;rsum;
            BLEU;null;bleu;
            BLEU-4;null;bleu;
            B@4;null;bleu;
            BLEU-1;null;bleu;order=1
            B@2;null;bleu;order=2
            sacreBLEU;null;bleu;
            chrF;null;chrf;
            chrF++;null;chrf;word_order=2
            ROUGE-1;null;rouge_1;
            ROUGE-2;null;rouge_2;
            ROUGE-L;null;rouge_l;
            R-L;null;rouge_l;
            RL;null;rouge_l;
            R-1;null;rouge_1;
            R-2;null;rouge_2;
            ROUGE|R-1;null;rouge_1;
            R1;ROUGE F1 on the summarisation test set.;rouge_1;
            METEOR;null;meteor;
            METEOR score;null;meteor;
            MTR;null;meteor;
            MCC;null;mcc;
            Matthews corr. coef.;null;mcc;
            Cohen's κ;null;cohen_kappa;
            Cohen’s kappa;null;cohen_kappa;
            κ;null;cohen_kappa;
            MAE;null;mae;
            RMSE;null;rmse;
            R²;null;r2;
            R^2;null;r2;
            R2;null;r2;
            CIFAR-10|Accuracy;null;accuracy;
            Accuracy|CIFAR-10;null;accuracy;
            Clip-level|Accuracy;null;accuracy;
            \uFF21\uFF43\uFF43\uFF0E;null;accuracy;
            """)
    void headers(String path, String caption, String metric, String params) {
        MetricGuess g = MetricGuesser.guess(List.of(path.split("\\|")), caption);
        assertThat(g.metric()).as(g.reason()).isEqualTo(metric);
        assertThat(g.params()).as(g.reason()).isEqualTo(params(params));
        assertThat(g.confidence()).isBetween(0.5, 1.0);
        assertThat(g.reason()).isNotBlank();
    }

    private static Map<String, String> params(String pairs) {
        Map<String, String> m = new LinkedHashMap<>();
        if (pairs != null) Arrays.stream(pairs.split(",")).map(p -> p.split("=")).forEach(p -> m.put(p[0], p[1]));
        return m;
    }

    @Test
    void exactHeaderIsSureAndUpperLevelOrCaptionLessSo() {
        assertThat(MetricGuesser.guess(List.of("Accuracy"), null).confidence()).isEqualTo(1.0);
        assertThat(MetricGuesser.guess(List.of("Accuracy", "CIFAR-10"), null).confidence()).isEqualTo(0.9);
        MetricGuess caption = MetricGuesser.guess(List.of("CIFAR-10"), "Top-1 accuracy (%) on three test sets.");
        assertThat(caption.metric()).isEqualTo("accuracy");
        assertThat(caption.confidence()).isEqualTo(0.6);
        // an averaging that only the caption names is a little less sure than one in the header
        assertThat(MetricGuesser.guess(List.of("F1"), "macro-averaged F1").confidence()).isEqualTo(0.9);
        assertThat(MetricGuesser.guess(List.of("Macro", "F1"), null).confidence()).isEqualTo(1.0);
    }

    @Test
    void captionWithSeveralMetricsDecidesNothing() {
        MetricGuess g = MetricGuesser.guess(List.of("Birds", "Frogs"), "Top-1 and top-5 accuracy, and macro F1.");
        assertThat(g.metric()).isEqualTo(MetricGuess.UNKNOWN);
        assertThat(g.confidence()).isZero();
    }

    @Test
    void captionTopFiveAccuracyIsNotAlsoPlainAccuracy() {
        MetricGuess g = MetricGuesser.guess(List.of("Birds"), "Top-5 accuracy on the bird-call test set.");
        assertThat(g.metric()).isEqualTo("top_k_accuracy");
        assertThat(g.params()).containsExactly(Map.entry("k", "5"));
    }

    @Test
    void chrfPlusPlusIsChrfWithLessConfidence() {
        assertThat(MetricGuesser.guess(List.of("chrF++"), null).confidence())
                .isLessThan(MetricGuesser.guess(List.of("chrF"), null).confidence());
    }

    /** Misspellings: near the name by Jaro–Winkler, with a confidence below an exact match. */
    @ParameterizedTest
    @CsvSource(delimiter = ';', textBlock = """
            Accuarcy;accuracy
            Acurracy;accuracy
            Precison;precision
            Recal;recall
            Balanced Acuracy;balanced_accuracy
            Meteorr;meteor
            """)
    void nearSpellings(String header, String metric) {
        MetricGuess g = MetricGuesser.guess(List.of(header), null);
        assertThat(g.metric()).as(g.reason()).isEqualTo(metric);
        assertThat(g.confidence()).isBetween(0.6, 0.7);
        assertThat(g.reason()).contains("near spelling");
    }

    @Test
    void similarityConfidenceFollowsTheSimilarity() {
        // Jaro–Winkler("accuarcy", "accuracy") is higher than for "acurracy" (one transposition vs two edits)
        double transposed = MetricGuesser.guess(List.of("Accuarcy"), null).confidence();
        double doubled = MetricGuesser.guess(List.of("Acurracy"), null).confidence();
        assertThat(transposed).isGreaterThan(doubled);
        assertThat(transposed).isCloseTo(0.7 * new org.apache.commons.text.similarity.JaroWinklerSimilarity()
                .apply("accuarcy", "accuracy"), within(1e-12));
    }

    /**
     * Headers that name no metric, or a metric with no id here. The caption's metric is not pinned on
     * a cost, calibration or difference column, and word error rate (edits per word) is not the
     * per-item error_rate (common practice).
     */
    @ParameterizedTest
    @CsvSource(delimiter = ';', nullValues = "null", textBlock = """
            Prediction;null
            Params (M);null
            Avg.;null
            Dataset;null
            Top-5 error;null
            WER;null
            AP50;null
            mAP@0.5;null
            P@10;null
            ;null
            Brier;Calibration of the reader, accuracy as fractions
            ECE;Accuracy and calibration error
            ∆Acc;Test accuracy against the baseline
            Gain;Test accuracy
            Latency (ms);Test accuracy (%) of each variant
            GFLOPs;Accuracy per budget
            RTF;Word error rate (%) of the encoders
            Clean;Word error rate (%) of the encoders
            StudioRead;WER (%) on four invented sets
            """)
    void unknownHeaders(String header, String caption) {
        MetricGuess g = MetricGuesser.guess(header == null ? List.of() : List.of(header), caption);
        assertThat(g.metric()).as(g.reason()).isEqualTo(MetricGuess.UNKNOWN);
        assertThat(g.confidence()).isZero();
        assertThat(g.params()).isEmpty();
        assertThat(g.reason()).isNotBlank();
    }

    @Test
    void topFiveErrorSaysWhyItIsUnknown() {
        assertThat(MetricGuesser.guess(List.of("Error", "Top-5"), null).reason()).contains("top_k_accuracy");
    }

    /** The two lists cannot drift: every id the guesser returns is one the claim-only checks know. */
    @Test
    void everyReturnedIdIsKnownToMetricFacts() {
        assertThat(MetricGuesser.metricIds()).isNotEmpty()
                .allSatisfy(id -> assertThat(MetricFacts.of(id)).as(id).isNotNull());
    }

    @Test
    void metricIdsCoverWhatTheHeaderTableReturns() {
        // the ids the parametrised table above meets must all be in metricIds(), so the drift test sees them
        for (String id : List.of("accuracy", "top_k_accuracy", "error_rate", "balanced_accuracy", "macro_f1",
                "micro_f1", "weighted_f1", "macro_precision", "macro_recall", "roc_auc", "average_precision",
                "map_at_k", "recall_at_k", "r_precision", "mrr", "ndcg_at_k", "mean_rank", "median_rank", "rsum",
                "bleu", "chrf", "rouge_1", "rouge_2", "rouge_l", "meteor", "mcc", "cohen_kappa", "mae", "rmse", "r2")) {
            assertThat(MetricGuesser.metricIds()).contains(id);
        }
    }
}
