package org.assay.audit;

import org.assay.common.Progress;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.Manifest;
import org.assay.data.retrieval.RetrievalBothDirections;
import org.assay.data.retrieval.RetrievalDirection;
import org.assay.data.retrieval.RetrievalInput;

/**
 * A retrieval reproduction: one or two directions (photo→caption and caption→photo, say), each
 * serving the claims whose column path starts with its label; with two directions, a third part
 * serves the metrics that sum over both (rsum).
 *
 * @param directions one or two directions
 * @param prefixed   whether each direction serves only the claims under its label (the audit
 *                   file's {@code column:}); otherwise a single direction serves every claim
 * @param manifest   the subsample's query ids (those of the first direction), or null
 */
public record RetrievalReproduction(String tableId, String row, List<RetrievalInput> directions, boolean prefixed,
                                    Path manifest) implements Reproduction {

    public RetrievalReproduction {
        directions = List.copyOf(directions);
        if (directions.isEmpty() || directions.size() > 2) {
            throw UserInputException.usage("a retrieval reproduction has one or two directions, not " + directions.size(),
                    "list the directions you scored");
        }
        if (directions.size() == 2 && !prefixed) {
            throw new IllegalArgumentException("two directions need column prefixes");
        }
    }

    @Override
    public Outputs read(Progress progress) {
        String where = tableId == null ? "" : " for " + tableId;
        List<InputFile> inputs = new ArrayList<>();
        List<Part> parts = new ArrayList<>();
        List<RetrievalDirection> read = new ArrayList<>();
        for (RetrievalInput in : directions) {
            RetrievalDirection d = in.read();
            read.add(d);
            // the first file holds the direction's queries (score-matrix rows or columns, ranked lists); all are used
            boolean first = true;
            for (Path p : in.files()) {
                InputFile f = InputFile.of(in.label() + where, p);
                inputs.add(first ? f.withRows(RowCount.allUsed(d.size())) : f);
                first = false;
            }
        }
        if (manifest != null) {
            int listed = Manifest.read(manifest).size();
            int queries = read.get(0).size();
            if (listed != queries) {
                throw new UserInputException(manifest, null, "the manifest lists " + listed + " ids but the first direction ("
                        + directions.get(0).label() + ") has " + queries + " queries",
                        "list first the direction whose queries the manifest names, or give its manifest");
            }
            inputs.add(InputFile.of("manifest" + where, manifest).withRows(RowCount.allUsed(listed)));
        }
        for (int i = 0; i < read.size(); i++) {
            RetrievalDirection d = read.get(i);
            parts.add(new Part(prefixed ? directions.get(i).label() : null, null, d, manifest != null, d.describe()));
        }
        if (read.size() == 2) {
            parts.add(new Part(null, Set.of("rsum"), new RetrievalBothDirections(read.get(0), read.get(1)),
                    manifest != null, "both directions"));
        }
        return new Outputs(parts, inputs);
    }
}
