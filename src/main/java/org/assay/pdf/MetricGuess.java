package org.assay.pdf;

import java.util.Map;

/**
 * The metric a table column most likely reports, as {@link MetricGuesser} read it from the header and
 * caption.
 *
 * @param metric     a metric id of the claims model ("accuracy", "recall_at_k", ...), or {@link #UNKNOWN}
 * @param params     its parameters ({@code k} for the @K metrics), empty when none
 * @param confidence in [0, 1]; 0 for an unknown metric
 * @param reason     one sentence saying what the guess rests on, for the claims draft
 */
public record MetricGuess(String metric, Map<String, String> params, double confidence, String reason) {
    public static final String UNKNOWN = "unknown";

    public MetricGuess {
        params = Map.copyOf(params);
    }

    static MetricGuess unknown(String reason) { return new MetricGuess(UNKNOWN, Map.of(), 0.0, reason); }

    public boolean known() { return !metric.equals(UNKNOWN); }
}
