package org.assay.data.retrieval;

import java.nio.file.Path;
import java.util.List;
import org.assay.data.EvaluationData;

/**
 * One retrieval direction as the metrics and the audit see it: the ranks of each query's
 * relevant candidates, the file they came from, and what was noticed while reading it. The query
 * is the resampling unit.
 *
 * @param source   the score matrix or ranked-list file
 * @param ranks    the ranks, tie policy and scored depth
 * @param warnings non-fatal findings (a detected sentinel, say)
 */
public record RetrievalDirection(Path source, RetrievalData ranks, List<String> warnings) implements EvaluationData {
    public RetrievalDirection {
        warnings = List.copyOf(warnings);
    }

    @Override public int size() { return ranks.queries(); }

    /** How the ranks were made, for reports: "photo→caption: 150 queries × 6000 candidates, pessimistic ties, scored to depth 24". */
    public String describe() {
        return ranks.direction() + ": " + ranks.queries() + " queries × " + ranks.candidates() + " candidates, "
                + ranks.ties().name().toLowerCase(java.util.Locale.ROOT) + " ties"
                + (ranks.depth() < ranks.candidates() ? ", ranked only to depth " + ranks.depth()
                        + (ranks.sentinel() == null ? "" : " (sentinel " + SentinelRule.plain(ranks.sentinel()) + " below it)") : "");
    }

}
