package org.assay.audit;

import org.assay.common.Progress;
import java.nio.file.Path;
import java.util.List;
import org.assay.data.regression.RegressionColumns;
import org.assay.data.regression.RegressionData;
import org.assay.data.regression.RegressionReader;

/** A regression reproduction: one predictions file (id, target, prediction) for one table row. */
public record RegressionReproduction(String tableId, String row, Path predictions, RegressionColumns columns)
        implements Reproduction {

    @Override
    public Outputs read(Progress progress) {
        RegressionData data = RegressionReader.read(predictions, columns, progress);
        String where = tableId == null ? "" : " for " + tableId;
        return new Outputs(List.of(new Part(null, null, data, false, "predictions")),
                List.of(InputFile.of("predictions" + where, predictions).withRows(RowCount.allUsed(data.size()))));
    }
}
