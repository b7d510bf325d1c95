package org.assay.audit.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.commons.text.similarity.LevenshteinDistance;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;
import org.assay.metrics.MetricDefinition;
import org.assay.metrics.MetricRegistry;

/**
 * A claim whose metric id assay does not know (a typo such as {@code acuracy}, or {@code unknown}
 * left by {@code assay extract}) passes every other rule unnoticed, because those rules only apply
 * to metrics whose range and definition they know. This rule says so for each such claim, with the
 * nearest known id when one is close, instead of leaving the claim unchecked in silence.
 */
final class KnownMetricRule implements CheckRule {
    static final String NAME = "metric";
    /** What {@code assay extract} writes when it cannot tell the metric from the header. */
    private static final String EXTRACT_PLACEHOLDER = "unknown";

    @Override public String name() { return NAME; }

    @Override
    public List<CheckFinding> check(ClaimTable table, Tally tally) {
        List<CheckFinding> out = new ArrayList<>();
        for (Claim c : table.claims()) {
            tally.ran(NAME);
            if (MetricRegistry.knows(c.metric())) continue;
            String nearest = nearest(c.metric());
            String message = (c.metric().equals(EXTRACT_PLACEHOLDER)
                    ? "not checked: no metric is set for " + Claims.quote(c) + " (extract could not tell it from the header)"
                    : "not checked: the metric '" + c.metric() + "' of " + Claims.quote(c) + " is not one assay knows"
                            + (nearest == null ? "" : " (perhaps " + nearest + ")"))
                    + "; set metric: at " + c.location().describe() + " of the claims file to have it checked.";
            String suggestion = "state which metric this column reports";
            out.add(CheckFinding.of(NAME, CheckKind.NOT_CHECKED, table.id(), List.of(c), message, suggestion, Map.of()));
        }
        return out;
    }

    /** The known id within two edits of {@code id}, or null (common practice: a typo is one or two edits). */
    static String nearest(String id) {
        LevenshteinDistance distance = new LevenshteinDistance(2);
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (MetricDefinition d : MetricRegistry.all()) {
            int dist = distance.apply(id, d.id());
            if (dist >= 0 && dist < bestDistance) {
                best = d.id();
                bestDistance = dist;
            }
        }
        return best;
    }
}
