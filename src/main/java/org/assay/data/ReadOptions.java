package org.assay.data;

import java.nio.file.Path;

/**
 * How to read a classification predictions file.
 *
 * @param idColumn          column holding example ids (default {@code id})
 * @param labelColumn       column holding the true label (default {@code label}); may be absent
 *                          from the predictions file when a truth file is given
 * @param predictionColumn  column holding the predicted label (default {@code prediction})
 * @param scoreColumn       column holding the positive-class score (default {@code score})
 * @param probabilityPrefix prefix of per-class probability columns (default {@code p_})
 * @param positive          label of the positive class, or null
 * @param manifest          subsample manifest (one id per line), or null
 * @param truth             full ground-truth file (id and label columns), or null
 */
public record ReadOptions(
        String idColumn,
        String labelColumn,
        String predictionColumn,
        String scoreColumn,
        String probabilityPrefix,
        String positive,
        Path manifest,
        Path truth) {

    public static ReadOptions defaults() {
        return new ReadOptions("id", "label", "prediction", "score", "p_", null, null, null);
    }

    public ReadOptions withPositive(String p) {
        return new ReadOptions(idColumn, labelColumn, predictionColumn, scoreColumn, probabilityPrefix, p, manifest, truth);
    }

    public ReadOptions withManifest(Path m) {
        return new ReadOptions(idColumn, labelColumn, predictionColumn, scoreColumn, probabilityPrefix, positive, m, truth);
    }

    public ReadOptions withTruth(Path t) {
        return new ReadOptions(idColumn, labelColumn, predictionColumn, scoreColumn, probabilityPrefix, positive, manifest, t);
    }
}
