package org.assay.metrics.retrieval;

import org.assay.stats.Resampled;

/**
 * A retrieval metric bound to one data set.
 *
 * @param statistic     the metric over the query as resampling unit; its estimate is the value.
 *                      Null when the metric is not computable.
 * @param outcome       for count metrics (recall_at_k): per query, whether it was a hit, for
 *                      exact binomial / hypergeometric intervals; null otherwise
 * @param notComputable why the data cannot give this metric (for example K beyond the scored
 *                      depth), or null when it can
 */
public record RetrievalMeasure(Resampled statistic, boolean[] outcome, String notComputable) {

    static RetrievalMeasure notComputable(String why) { return new RetrievalMeasure(null, null, why); }

    public boolean computable() { return notComputable == null; }

    /** The metric's value; throws when it is not computable, so a caller cannot score it silently. */
    public double value() {
        if (statistic == null) throw new IllegalStateException("not computable: " + notComputable);
        return statistic.estimate();
    }

    /** For count metrics: the number of queries with outcome true; -1 otherwise. */
    public long successes() {
        if (outcome == null) return -1;
        long k = 0;
        for (boolean b : outcome) if (b) k++;
        return k;
    }
}
