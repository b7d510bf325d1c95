package org.assay.audit;

import java.nio.file.Path;
import java.util.List;

/**
 * Everything an audit needs.
 *
 * @param claims         claims file
 * @param reproductions  one entry per reproduced table row
 * @param settings       estimation settings
 * @param margin         default equivalence margin on the fraction scale (0.01 = one percentage point)
 * @param notes          the user's notes for the replication notes
 */
public record AuditRequest(Path claims, List<Reproduction> reproductions, EstimationSettings settings, double margin,
                           UserNotes notes) {
    public AuditRequest(Path claims, List<Reproduction> reproductions, EstimationSettings settings, double margin) {
        this(claims, reproductions, settings, margin, UserNotes.none());
    }

    public AuditRequest {
        reproductions = List.copyOf(reproductions);
        if (!(margin > 0 && margin < 1)) {
            throw org.assay.common.UserInputException.usage("margin " + margin * 100 + " points is outside (0, 100)",
                    "use for example --margin 1 (one percentage point)");
        }
    }
}
