package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads classification predictions (CSV, TSV or JSON Lines, chosen by extension) and joins them
 * with their ground truth and, when given, checks them against the subsample manifest.
 *
 * <p>Classes are the true labels (all labels of the truth file when one is given) and the classes
 * of the probability columns; a predicted label must be one of them. When the file has no
 * predicted label but has probabilities, the prediction is their arg-max, ties going to the lowest
 * class code. Every problem is a {@link UserInputException} naming the file and line; the only
 * non-fatal finding, probabilities that do not sum to one, is a warning in the result.
 */
public final class ClassificationReader {
    private ClassificationReader() {}

    public static ClassificationData read(Path predictions, ReadOptions options) {
        LabelTable labels = new LabelTable();
        TruthFile truthFile = options.truth() == null ? null : TruthFile.read(options.truth(), options, labels);
        PredictionRows rows = PredictionRows.read(predictions, options, truthFile, labels);
        if (options.manifest() != null) Manifest.read(options.manifest()).checkCovers(rows.ids());

        ClassCoding coding = ClassCoding.of(labels, classFlags(labels, rows, truthFile));
        int k = coding.size();
        int[] truth = recode(rows.truth(), coding);
        int[] predicted = rows.predicted() == null ? null : recodePredictions(rows, coding, labels, predictions);
        double[] probabilities = rows.probabilities() == null ? null
                : Probabilities.inClassOrder(rows, coding, labels, options);
        if (predicted == null && probabilities != null) predicted = Probabilities.argMax(probabilities, k);

        int positive = PositiveClass.choose(coding.classes(), options.positive(), predictions);
        if (rows.scores() != null && positive < 0) {
            throw new UserInputException(predictions, null,
                    "the score column '" + options.scoreColumn() + "' needs a positive class, and none of the classes "
                            + coding.classes() + " is one by convention",
                    "set --positive to the class the score is for");
        }
        List<String> warnings = new ArrayList<>();
        if (probabilities != null) {
            Probabilities.sumWarning(predictions, rows, probabilities, k).ifPresent(warnings::add);
        }
        return new ClassificationData(predictions, rows.ids().toArray(), coding.classes(), truth, predicted,
                rows.scores(), probabilities, positive, List.copyOf(warnings));
    }

    /** Which provisional labels are classes: true labels (both sources) and probability columns. */
    private static boolean[] classFlags(LabelTable labels, PredictionRows rows, TruthFile truthFile) {
        boolean[] isClass = new boolean[labels.size()];
        for (int code : rows.truth()) isClass[code] = true;
        for (int code : rows.probabilityClasses()) isClass[code] = true;
        if (truthFile != null) for (int i = 0; i < truthFile.size(); i++) isClass[truthFile.label(i)] = true;
        return isClass;
    }

    private static int[] recode(int[] provisional, ClassCoding coding) {
        int[] coded = new int[provisional.length];
        for (int i = 0; i < coded.length; i++) coded[i] = coding.code(provisional[i]);
        return coded;
    }

    private static int[] recodePredictions(PredictionRows rows, ClassCoding coding, LabelTable labels, Path file) {
        int[] provisional = rows.predicted();
        int[] coded = new int[provisional.length];
        for (int i = 0; i < coded.length; i++) {
            coded[i] = coding.code(provisional[i]);
            if (coded[i] < 0) {
                throw new UserInputException(file, RowErrors.line(rows.line(i)),
                        "predicted label '" + labels.label(provisional[i]) + "' is not a class of the ground truth"
                                + " or the probability columns " + coding.classes(),
                        "check the spelling, or give a truth file (--truth) that contains this class");
            }
        }
        return coded;
    }
}
