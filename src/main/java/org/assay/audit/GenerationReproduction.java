package org.assay.audit;

import org.assay.common.Progress;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.data.Manifest;
import org.assay.data.generation.GenerationData;
import org.assay.data.generation.GenerationReader;

/**
 * A text-generation reproduction: a JSON Lines file of items with their references, or a
 * hypotheses file read line by line with one file per reference set.
 *
 * @param outputs    the JSON Lines file or the hypotheses file
 * @param references the reference files (empty for JSON Lines)
 * @param manifest   the sampled item ids, or null
 */
public record GenerationReproduction(String tableId, String row, Path outputs, List<Path> references, Path manifest)
        implements Reproduction {

    public GenerationReproduction {
        references = List.copyOf(references);
    }

    @Override
    public Outputs read(Progress progress) {
        GenerationData data = GenerationReader.read(outputs, references);
        String where = tableId == null ? "" : " for " + tableId;
        List<InputFile> inputs = new ArrayList<>();
        // every item is used: parallel files must have equal line counts and a manifest must list exactly the items
        RowCount items = RowCount.allUsed(data.size());
        inputs.add(InputFile.of((references.isEmpty() ? "outputs" : "hypotheses") + where, outputs).withRows(items));
        for (int i = 0; i < references.size(); i++) {
            inputs.add(InputFile.of("references " + (i + 1) + where, references.get(i)).withRows(items));
        }
        if (manifest != null) {
            Manifest.checkCovers(manifest, outputs, data.ids());
            inputs.add(InputFile.of("manifest" + where, manifest).withRows(items));
        }
        String what = data.size() + " items" + (references.isEmpty() ? "" : ", " + references.size() + " reference files");
        return new Outputs(List.of(new Part(null, null, data, manifest != null, what)), inputs);
    }
}
