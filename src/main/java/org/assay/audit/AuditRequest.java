package org.assay.audit;

import java.nio.file.Path;
import java.util.List;
import org.assay.stats.MultiplicityMethod;

/**
 * Everything an audit needs.
 *
 * @param claims         claims file
 * @param reproductions  one entry per reproduced table row
 * @param settings       estimation settings
 * @param margin         default equivalence margin on the fraction scale (0.01 = one percentage point)
 * @param notes          the user's notes for the replication notes
 * @param multiplicity   how p-values are adjusted across the audit's claims, and across its comparisons (Holm by default)
 * @param pairedMethod   the test of compared rows whose metric has no exact or DeLong paired test (bootstrap by default)
 */
public record AuditRequest(Path claims, List<Reproduction> reproductions, EstimationSettings settings, double margin,
                           UserNotes notes, MultiplicityMethod multiplicity, PairedMethod pairedMethod) {
    public AuditRequest(Path claims, List<Reproduction> reproductions, EstimationSettings settings, double margin) {
        this(claims, reproductions, settings, margin, UserNotes.none());
    }

    public AuditRequest(Path claims, List<Reproduction> reproductions, EstimationSettings settings, double margin,
                        UserNotes notes) {
        this(claims, reproductions, settings, margin, notes, MultiplicityMethod.HOLM, PairedMethod.BOOTSTRAP);
    }

    public AuditRequest {
        reproductions = List.copyOf(reproductions);
        if (multiplicity == null) multiplicity = MultiplicityMethod.HOLM;
        if (pairedMethod == null) pairedMethod = PairedMethod.BOOTSTRAP;
        if (!(margin > 0 && margin < 1)) {
            throw org.assay.common.UserInputException.usage("margin " + margin * 100 + " points is outside (0, 100)",
                    "use for example --margin 1 (one percentage point)");
        }
    }
}
