package org.assay.metrics.regression;

import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.regression.RegressionData;
import org.assay.stats.Resampled;

/**
 * The regression metrics, each a {@link Resampled} over examples (the resampling unit).
 * Definitions follow scikit-learn's {@code sklearn.metrics} and scipy's {@code scipy.stats},
 * the references the tests compare against. None takes parameters.
 */
public final class RegressionMetrics {
    private RegressionMetrics() {}

    /** What a metric is and where its definition comes from, for the registry and reports. */
    public record Info(String id, String title, String definition, String reference) {}

    private static final List<Info> INFO = List.of(
            new Info("mae", "Mean absolute error",
                    "mean of |target - prediction| over the examples",
                    "definition as in scikit-learn sklearn.metrics.mean_absolute_error"),
            new Info("rmse", "Root mean squared error",
                    "square root of the mean of (target - prediction)^2 over the examples",
                    "definition as in scikit-learn sklearn.metrics.mean_squared_error(squared=False)"),
            new Info("r2", "Coefficient of determination",
                    "1 - sum (target - prediction)^2 / sum (target - mean target)^2; undefined when the target is constant",
                    "definition as in scikit-learn sklearn.metrics.r2_score(force_finite=False)"),
            new Info("pearson", "Pearson correlation",
                    "Pearson's product-moment correlation of prediction and target",
                    "Pearson (1895) Proc. R. Soc. Lond. 58:240-242; definition as in scipy.stats.pearsonr"),
            new Info("spearman", "Spearman rank correlation",
                    "Pearson correlation of the mid-ranks of prediction and target (ties share their mean rank)",
                    "Spearman (1904) Am. J. Psychol. 15:72-101; definition as in scipy.stats.spearmanr"));

    /** The metric ids, in a fixed order. */
    public static List<String> ids() {
        return INFO.stream().map(Info::id).toList();
    }

    public static Info info(String id) {
        return INFO.stream().filter(i -> i.id().equals(id)).findFirst().orElseThrow(() -> unknown(id));
    }

    /**
     * Binds metric {@code id} to {@code data}. Fails with a {@link UserInputException} for an
     * unknown id, any parameter (none is taken), or data on which the metric is undefined
     * (a constant target for r2; a constant target or prediction for the correlations).
     */
    public static Resampled prepare(String id, Map<String, String> params, RegressionData data) {
        Info info = info(id);
        if (!params.isEmpty()) {
            throw UserInputException.usage("metric " + id + " takes no parameter '" + params.keySet().iterator().next() + "'",
                    "remove it");
        }
        Resampled statistic = switch (id) {
            case "mae" -> ErrorMeans.meanAbsoluteError(data);
            case "rmse" -> ErrorMeans.rootMeanSquaredError(data);
            case "r2" -> Determination.of(data);
            case "pearson" -> PearsonCorrelation.of(data.prediction(), data.target());
            case "spearman" -> new SpearmanStatistic(data.prediction(), data.target());
            default -> throw unknown(id);
        };
        if (!Double.isFinite(statistic.estimate())) {
            throw new UserInputException(data.source(), null,
                    info.title() + " (" + id + ") is undefined on these " + data.size() + " examples: "
                            + (id.equals("r2") ? "the target is constant" : "the target or the prediction is constant"),
                    "evaluate on examples whose values vary, or report an error metric (mae, rmse) instead");
        }
        return statistic;
    }

    private static UserInputException unknown(String id) {
        return UserInputException.usage("unknown regression metric '" + id + "'",
                "use one of: " + String.join(", ", ids()));
    }
}
