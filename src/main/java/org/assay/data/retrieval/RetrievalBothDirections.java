package org.assay.data.retrieval;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.data.EvaluationData;

/**
 * Both directions of a cross-modal retrieval evaluation, for metrics that sum over the two
 * (rsum). The resampling units are the first direction's queries followed by the second's.
 */
public record RetrievalBothDirections(RetrievalDirection first, RetrievalDirection second) implements EvaluationData {
    @Override public Path source() { return first.source(); }

    @Override public int size() { return first.size() + second.size(); }

    @Override
    public List<String> warnings() {
        List<String> all = new ArrayList<>(first.warnings());
        all.addAll(second.warnings());
        return all;
    }
}
