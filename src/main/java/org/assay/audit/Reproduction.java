package org.assay.audit;

import java.util.List;
import java.util.Set;
import org.assay.claims.Claim;
import org.assay.common.Progress;
import org.assay.data.EvaluationData;

/**
 * One reproduction to audit: the outputs a user produced for one row of one claims table, of any
 * task. Reading them gives one or more parts; each part serves the claims whose column path starts
 * with its prefix (a retrieval direction, say), or every claim of the row when it has none.
 */
public interface Reproduction {
    /** Claims table the outputs reproduce; null when the claims file has one table. */
    String tableId();

    /** Row label of the reproduced method; null when the table has one row. */
    String row();

    /** Reads the outputs from their files. */
    default Outputs read() { return read(Progress.NONE); }

    /** Reads the outputs from their files, reporting how far reading large files has got. */
    Outputs read(Progress progress);

    /**
     * @param columnPrefix  first column-path element of the claims this part serves, or null for all
     * @param metrics       metric ids this part alone serves (rsum over both directions), or null for any
     * @param manifestGiven whether a subsample manifest vouched for the units
     * @param description   what the part is, for the report ("photo→caption queries, pessimistic ties")
     */
    record Part(String columnPrefix, Set<String> metrics, EvaluationData data, boolean manifestGiven,
                String description) {}

    record Outputs(List<Part> parts, List<InputFile> inputs) {
        public Outputs {
            parts = List.copyOf(parts);
            inputs = List.copyOf(inputs);
        }

        /** The part that serves a claim, or null when none does. */
        public Part partFor(Claim c) {
            for (Part p : parts) if (p.metrics() != null && p.metrics().contains(c.metric())) return p;
            String first = c.column().isEmpty() ? null : c.column().get(0);
            for (Part p : parts) {
                if (p.metrics() == null && p.columnPrefix() != null && p.columnPrefix().equals(first)) return p;
            }
            for (Part p : parts) if (p.metrics() == null && p.columnPrefix() == null) return p;
            return null;
        }
    }
}
