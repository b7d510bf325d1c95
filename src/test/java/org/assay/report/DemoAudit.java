package org.assay.report;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.assay.audit.AuditFileReader;
import org.assay.audit.AuditRequest;
import org.assay.audit.AuditResult;
import org.assay.audit.Auditor;
import org.assay.audit.EstimationSettings;
import org.assay.audit.IntervalChoice;

/** The bundled demo scenarios audited in-process (1,000 resamples, one thread), for report tests. */
final class DemoAudit {
    private DemoAudit() {}

    static final List<String> BIRDCALLS = List.of("claims.yaml", "audit.yaml", "predictions.csv", "subsample.txt");
    static final List<String> HARBOUR = List.of("claims.yaml", "audit.yaml", "scores-photo-to-caption.npy",
            "scores-caption-to-photo.npy", "relevance-photo-to-caption.json", "relevance-caption-to-photo.json",
            "subsample.txt");

    static AuditResult run(Path dir, String scenario, List<String> files) throws IOException {
        Files.createDirectories(dir);
        for (String f : files) {
            try (InputStream in = DemoAudit.class.getResourceAsStream("/examples/" + scenario + "/" + f)) {
                if (in == null) throw new IllegalStateException("missing demo file " + scenario + "/" + f);
                Files.copy(in, dir.resolve(f));
            }
        }
        AuditFileReader.AuditFile a = AuditFileReader.read(dir.resolve("audit.yaml"));
        EstimationSettings settings = new EstimationSettings(0.95, 1000, EstimationSettings.DEFAULT_SEED, 1,
                IntervalChoice.AUTO);
        return new Auditor().run(new AuditRequest(a.claims(), a.reproductions(), settings, a.marginPoints() / 100, a.notes()));
    }

    static Provenance provenance() {
        return new Provenance("test", "abc", "Java", "OS", List.of("demo"), "/work");
    }
}
