package org.assay.audit;

import java.util.List;
import java.util.Map;
import org.assay.stats.Interval;

/**
 * One metric measured on a predictions file, without any claim.
 *
 * @param notComputable why these outputs cannot give the metric (then value is NaN and interval
 *                      null), or null when it was computed
 */
public record Measurement(String metric, Map<String, String> params, long n, Long population, double value,
                          Interval interval, double standardError, List<String> notes, String notComputable) {

    public Measurement(String metric, Map<String, String> params, long n, Long population, double value,
                       Interval interval, double standardError, List<String> notes) {
        this(metric, params, n, population, value, interval, standardError, notes, null);
    }

    static Measurement notComputable(String metric, Map<String, String> params, long n, Long population, String why) {
        return new Measurement(metric, params, n, population, Double.NaN, null, Double.NaN, List.of(), why);
    }

    public boolean computed() { return notComputable == null; }
}
