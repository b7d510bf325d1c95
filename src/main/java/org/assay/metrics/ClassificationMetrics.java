package org.assay.metrics;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.ClassificationData;
import org.assay.data.ProbabilityTable;

/**
 * The classification metrics. Each is defined over per-example statistics: a correct flag
 * (count metrics), a confusion-matrix cell (everything computed from the confusion matrix),
 * or a score and a class for ROC AUC. Definitions follow scikit-learn's
 * {@code sklearn.metrics}, the reference the tests compare against.
 */
final class ClassificationMetrics {
    private ClassificationMetrics() {}

    private static final String SKLEARN = "definition as in scikit-learn sklearn.metrics";

    static List<MetricDefinition> all() {
        List<MetricDefinition> list = new ArrayList<>();
        list.add(new MetricDefinition("accuracy", "Accuracy", MetricKind.COUNT, "example",
                "fraction of examples whose predicted label equals the true label",
                SKLEARN + ".accuracy_score", Set.of(), (d, data, p) -> count(d, data, correctFlags(d, data))));
        list.add(new MetricDefinition("error_rate", "Error rate", MetricKind.COUNT, "example",
                "fraction of examples whose predicted label differs from the true label (1 - accuracy)",
                "common practice", Set.of(), (d, data, p) -> count(d, data, invert(correctFlags(d, data)))));
        list.add(new MetricDefinition("top_k_accuracy", "Top-k accuracy", MetricKind.COUNT, "example",
                "fraction of examples whose true class is among the k classes of highest probability; "
                        + "a class tied with the true class counts as ranked above it",
                SKLEARN + ".top_k_accuracy_score", Set.of("k"), ClassificationMetrics::topK));
        list.add(confusion("balanced_accuracy", "Balanced accuracy",
                "mean recall over the classes present in the truth",
                "Brodersen et al. (2010) ICPR; " + SKLEARN + ".balanced_accuracy_score",
                ConfusionMatrix::balancedAccuracy));
        for (String what : List.of("precision", "recall", "f1")) {
            ConfusionMatrix.PerClass f = switch (what) {
                case "precision" -> ConfusionMatrix::precision;
                case "recall" -> ConfusionMatrix::recall;
                default -> ConfusionMatrix::f1;
            };
            String title = what.equals("f1") ? "F1" : Character.toUpperCase(what.charAt(0)) + what.substring(1);
            list.add(new MetricDefinition(what, title + " (positive class)", MetricKind.OTHER, "example",
                    title + " of the positive class (name it with params positive, or --positive)",
                    SKLEARN + "." + what + "_score(average='binary')", Set.of("positive"),
                    (d, data, p) -> {
                        int pos = positiveClass(d, data, p);
                        OneHotUnitTable table = confusionTable(d, data);
                        int k = data.classCount();
                        return new PreparedMetric(d, new CellStatistic(table, m -> f.of(m, k, pos)), -1, null, null);
                    }));
            list.add(confusion("macro_" + what, "Macro " + title,
                    "unweighted mean of per-class " + title + " over the classes present in truth or predictions",
                    SKLEARN + "." + what + "_score(average='macro')", (m, k) -> ConfusionMatrix.macro(m, k, f)));
            list.add(confusion("micro_" + what, "Micro " + title,
                    title + " from TP, FP and FN pooled over classes (equals accuracy for single-label data)",
                    SKLEARN + "." + what + "_score(average='micro')", ConfusionMatrix::micro));
            list.add(confusion("weighted_" + what, "Weighted " + title,
                    "per-class " + title + " averaged with weights equal to each class's true count",
                    SKLEARN + "." + what + "_score(average='weighted')", (m, k) -> ConfusionMatrix.weighted(m, k, f)));
        }
        list.add(confusion("mcc", "Matthews correlation",
                "Matthews correlation coefficient, multiclass form of Gorodkin (2004)",
                "Matthews (1975) Biochim. Biophys. Acta 405:442-451; " + SKLEARN + ".matthews_corrcoef",
                ConfusionMatrix::matthews));
        list.add(confusion("cohen_kappa", "Cohen's kappa",
                "agreement between predicted and true labels beyond chance",
                "Cohen (1960) Educ. Psychol. Meas. 20:37-46; " + SKLEARN + ".cohen_kappa_score",
                ConfusionMatrix::cohenKappa));
        list.add(new MetricDefinition("roc_auc", "ROC AUC", MetricKind.ROC_AUC, "example",
                "area under the ROC curve of the positive-class score; ties count one half",
                "Hanley & McNeil (1982) Radiology 143:29-36; " + SKLEARN + ".roc_auc_score",
                Set.of("positive"), ClassificationMetrics::rocAuc));
        return list;
    }

    private interface MatrixFunction { double of(double[] m, int k); }

    private static MetricDefinition confusion(String id, String title, String definition, String reference,
                                              MatrixFunction f) {
        return new MetricDefinition(id, title, MetricKind.OTHER, "example", definition, reference, Set.of(),
                (d, data, p) -> {
                    OneHotUnitTable table = confusionTable(d, data);
                    int k = data.classCount();
                    return new PreparedMetric(d, new CellStatistic(table, m -> f.of(m, k)), -1, null, null);
                });
    }

    private static int[] requirePredicted(MetricDefinition d, ClassificationData data) {
        if (data.predicted() == null) {
            throw new UserInputException(data.source(), null,
                    "metric " + d.id() + " needs predicted labels, but the file has no prediction column "
                            + "and no per-class probability columns",
                    "add a prediction column (or name it with --prediction-column)");
        }
        return data.predicted();
    }

    static OneHotUnitTable confusionTable(MetricDefinition d, ClassificationData data) {
        int[] pred = requirePredicted(d, data);
        int k = data.classCount();
        int[] cell = new int[data.size()];
        for (int i = 0; i < cell.length; i++) cell[i] = data.truth()[i] * k + pred[i];
        return new OneHotUnitTable(cell, k * k);
    }

    private static boolean[] correctFlags(MetricDefinition d, ClassificationData data) {
        int[] pred = requirePredicted(d, data);
        boolean[] ok = new boolean[data.size()];
        for (int i = 0; i < ok.length; i++) ok[i] = pred[i] == data.truth()[i];
        return ok;
    }

    private static boolean[] invert(boolean[] flags) {
        boolean[] out = new boolean[flags.length];
        for (int i = 0; i < flags.length; i++) out[i] = !flags[i];
        return out;
    }

    /** A count metric: cell 1 holds the successes, cell 0 the failures; value = successes / units. */
    private static PreparedMetric count(MetricDefinition d, ClassificationData data, boolean[] success) {
        int[] cell = new int[success.length];
        long k = 0;
        for (int i = 0; i < cell.length; i++) {
            cell[i] = success[i] ? 1 : 0;
            k += cell[i];
        }
        CellStatistic s = new CellStatistic(new OneHotUnitTable(cell, 2), ClassificationMetrics::proportion);
        return new PreparedMetric(d, s, k, null, null);
    }

    static double proportion(double[] sums) {
        double n = sums[0] + sums[1];
        return n == 0 ? Double.NaN : sums[1] / n;
    }

    private static PreparedMetric topK(MetricDefinition d, ClassificationData data, Map<String, String> params) {
        String kText = params.get("k");
        if (kText == null) {
            throw UserInputException.usage("metric top_k_accuracy needs parameter k", "for example params: {k: 5}");
        }
        int k;
        try {
            k = Integer.parseInt(kText.trim());
        } catch (NumberFormatException e) {
            throw UserInputException.usage("top_k_accuracy parameter k is not an integer: " + kText, "use k: 5");
        }
        int classes = data.classCount();
        if (k < 1 || k > classes) {
            throw UserInputException.usage("top_k_accuracy k=" + k + " is outside 1.." + classes, "choose k within the class count");
        }
        ProbabilityTable p = data.probabilities();
        if (p == null) {
            throw new UserInputException(data.source(), null, "top_k_accuracy needs per-class probability columns",
                    "add p_<class> columns");
        }
        boolean[] hit = new boolean[data.size()];
        for (int i = 0; i < hit.length; i++) {
            int t = data.truth()[i];
            double pt = p.get(i, t);
            int above = 0;
            for (int c = 0; c < classes; c++) if (c != t && p.get(i, c) >= pt) above++;
            hit[i] = above < k;
        }
        return count(d, data, hit);
    }

    private static int positiveClass(MetricDefinition d, ClassificationData data, Map<String, String> params) {
        String named = params.get("positive");
        if (named != null) {
            int idx = data.classes().indexOf(named);
            if (idx < 0) {
                throw UserInputException.usage("positive class '" + named + "' of metric " + d.id() + " is not a class",
                        "classes are: " + String.join(", ", data.classes()));
            }
            return idx;
        }
        if (data.positive() < 0) {
            throw new UserInputException(data.source(), null, "metric " + d.id() + " needs a positive class",
                    "name it with --positive (classes: " + String.join(", ", data.classes()) + ")");
        }
        return data.positive();
    }

    private static PreparedMetric rocAuc(MetricDefinition d, ClassificationData data, Map<String, String> params) {
        int pos = positiveClass(d, data, params);
        double[] scores;
        if (data.scores() != null && pos == data.positive()) {
            scores = data.scores();
        } else if (data.probabilities() != null) {
            scores = new double[data.size()];
            for (int i = 0; i < scores.length; i++) scores[i] = data.probabilities().get(i, pos);
        } else {
            throw new UserInputException(data.source(), null, "roc_auc needs a score column or per-class probabilities",
                    "add a score column (or name it with --score-column)");
        }
        boolean[] positive = new boolean[data.size()];
        int nPos = 0;
        for (int i = 0; i < positive.length; i++) {
            positive[i] = data.truth()[i] == pos;
            if (positive[i]) nPos++;
        }
        if (nPos == 0 || nPos == positive.length) {
            throw new UserInputException(data.source(), null,
                    "roc_auc is undefined: the data hold " + (nPos == 0 ? "no positive" : "no negative") + " examples",
                    "evaluate on a sample that contains both classes");
        }
        return new PreparedMetric(d, new RocAucStatistic(scores, positive), -1, scores, positive);
    }
}
