package org.assay.data;

import org.assay.common.Progress;
import org.assay.common.UserInputException;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * Reads classification predictions (CSV, TSV or JSON Lines, chosen by extension) and joins them
 * with their ground truth and, when given, checks them against the subsample manifest.
 *
 * <p>Classes are the true labels (all labels of the truth file when one is given) and the classes
 * of the probability columns; a predicted label must be one of them. When the file has no
 * predicted label but has probabilities, the prediction is their arg-max, ties going to the lowest
 * class code. Every problem is a {@link UserInputException} naming the file and line; the
 * non-fatal findings, probabilities that do not sum to one and prediction ids that differ only by
 * case, are warnings in the result.
 *
 * <p>Memory stays bounded by the per-row columns: the predictions are read once into compact
 * columns, the truth file and the manifest are streamed against their ids afterwards, and the
 * id lookup table is released before the final class codes are written.
 */
public final class ClassificationReader {
    private ClassificationReader() {}

    public static ClassificationData read(Path predictions, ReadOptions options) {
        return read(predictions, options, Progress.NONE);
    }

    /** As {@link #read(Path, ReadOptions)}, reporting the bytes of each file read to {@code progress}. */
    public static ClassificationData read(Path predictions, ReadOptions options, Progress progress) {
        LabelTable labels = new LabelTable();
        PredictionRows rows;
        BitSet truthClasses = new BitSet();
        long truthRows = -1;
        if (options.truth() == null) {
            try (Progress.Task reading = reading(progress, "reading ", predictions)) {
                rows = PredictionRows.read(predictions, options, false, labels, reading);
            }
        } else {
            try (Progress.Task readingTruth = reading(progress, "reading ", options.truth());
                 TruthFile truthFile = TruthFile.open(options.truth(), options, readingTruth)) {
                try (Progress.Task reading = reading(progress, "reading ", predictions)) {
                    rows = PredictionRows.read(predictions, options, true, labels, reading);
                }
                truthClasses = truthFile.join(rows, labels);
                truthRows = truthFile.rowsRead();
            }
        }
        if (options.manifest() != null) {
            try (Progress.Task checking = reading(progress, "checking ", options.manifest())) {
                Manifest.checkCovers(options.manifest(), rows.ids(), checking);
            }
        }
        java.util.Optional<String> caseWarning = rows.ids().caseWarning();
        rows.ids().releaseLookup();

        ClassCoding coding = ClassCoding.of(labels, classFlags(labels, rows, truthClasses));
        int k = coding.size();
        int[] truth = recode(rows.truth(), coding);
        int[] predicted = rows.predicted() == null ? null : recodePredictions(rows, coding, labels, predictions);
        ProbabilityTable probabilities = rows.probabilities() == null ? null
                : Probabilities.inClassOrder(rows, coding, labels, options);
        if (predicted == null && probabilities != null) predicted = Probabilities.argMax(probabilities);

        int positive = PositiveClass.choose(coding.classes(), options.positive(), predictions);
        if (rows.scores() != null && positive < 0) {
            throw new UserInputException(predictions, null,
                    "the score column '" + options.scoreColumn() + "' needs a positive class, and none of the classes "
                            + coding.classes() + " is one by convention",
                    "set --positive to the class the score is for");
        }
        List<String> warnings = new ArrayList<>();
        caseWarning.ifPresent(warnings::add);
        if (probabilities != null) {
            Probabilities.sumWarning(predictions, rows, probabilities).ifPresent(warnings::add);
        }
        return new ClassificationData(predictions, rows.ids().ids(), coding.classes(), truth, predicted,
                rows.scores() == null ? null : rows.scores().toArray(), probabilities, positive, List.copyOf(warnings),
                truthRows);
    }

    /** A step over {@code file} counted in bytes (0 when its size cannot be read: the reader reports that). */
    private static Progress.Task reading(Progress progress, String verb, Path file) {
        long size;
        try {
            size = Files.size(file);
        } catch (IOException | RuntimeException e) {
            size = 0;
        }
        return progress.start(verb + file.getFileName(), size);
    }

    /** Which provisional labels are classes: true labels (both sources) and probability columns. */
    private static boolean[] classFlags(LabelTable labels, PredictionRows rows, BitSet truthClasses) {
        boolean[] isClass = new boolean[labels.size()];
        IntColumn truth = rows.truth();
        for (int i = 0; i < truth.size(); i++) isClass[truth.get(i)] = true;
        for (int code : rows.probabilityClasses()) isClass[code] = true;
        truthClasses.stream().forEach(code -> isClass[code] = true);
        return isClass;
    }

    private static int[] recode(IntColumn provisional, ClassCoding coding) {
        int[] coded = new int[provisional.size()];
        for (int i = 0; i < coded.length; i++) coded[i] = coding.code(provisional.get(i));
        return coded;
    }

    private static int[] recodePredictions(PredictionRows rows, ClassCoding coding, LabelTable labels, Path file) {
        IntColumn provisional = rows.predicted();
        int[] coded = new int[provisional.size()];
        for (int i = 0; i < coded.length; i++) {
            coded[i] = coding.code(provisional.get(i));
            if (coded[i] < 0) {
                throw new UserInputException(file, RowErrors.line(rows.line(i)),
                        "predicted label '" + labels.label(provisional.get(i)) + "' is not a class of the ground truth"
                                + " or the probability columns " + coding.classes(),
                        "check the spelling, or give a truth file (--truth) that contains this class");
            }
        }
        return coded;
    }
}
