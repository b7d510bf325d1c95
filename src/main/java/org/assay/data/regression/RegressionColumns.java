package org.assay.data.regression;

/**
 * Which columns of a regression predictions file hold what.
 *
 * @param id         example ids (default {@code id})
 * @param target     the true value (default {@code target})
 * @param prediction the predicted value (default {@code prediction})
 */
public record RegressionColumns(String id, String target, String prediction) {

    public static RegressionColumns defaults() {
        return new RegressionColumns("id", "target", "prediction");
    }
}
