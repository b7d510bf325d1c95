package org.assay.audit;

import org.assay.common.Progress;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.data.ClassificationData;
import org.assay.data.ClassificationReader;
import org.assay.data.ReadOptions;

/**
 * A classification reproduction: one predictions file for one table row.
 *
 * @param options how to read it (columns, positive class, manifest, truth)
 */
public record ClassificationReproduction(String tableId, String row, Path predictions, ReadOptions options)
        implements Reproduction {

    @Override
    public Outputs read(Progress progress) {
        ClassificationData data = ClassificationReader.read(predictions, options, progress);
        String where = tableId == null ? "" : " for " + tableId;
        List<InputFile> inputs = new ArrayList<>();
        RowCount evaluated = RowCount.allUsed(data.size());
        inputs.add(InputFile.of("predictions" + where, predictions).withRows(evaluated));
        // a manifest must list exactly the evaluated ids (the reader checks), so all of them are used
        if (options.manifest() != null) inputs.add(InputFile.of("manifest" + where, options.manifest()).withRows(evaluated));
        if (options.truth() != null) {
            inputs.add(InputFile.of("truth" + where, options.truth()).withRows(new RowCount(data.truthRows(), data.size(),
                    "ids the predictions do not list (not evaluated)")));
        }
        return new Outputs(List.of(new Part(null, null, data, options.manifest() != null, "predictions")), inputs);
    }
}
