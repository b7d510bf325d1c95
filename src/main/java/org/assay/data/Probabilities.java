package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.Optional;

/** Per-class probabilities: reordering to class codes, arg-max, and the sum-to-one check. */
final class Probabilities {
    /**
     * Allowed distance of a row's sum from 1 before it is reported. Probabilities are usually
     * written rounded (to 4-6 decimals), so a row of K rounded values can miss 1 by K half-units;
     * 0.001 tolerates that for any realistic K while still catching logits or unnormalised scores.
     */
    static final double SUM_TOLERANCE = 1e-3;

    private Probabilities() {}

    /**
     * Reorders the file's probability columns into class order. Every class needs a column: a
     * class without one (a label seen only in the truth) is an error, not a zero.
     */
    static double[] inClassOrder(PredictionRows rows, ClassCoding coding, LabelTable labels, ReadOptions options) {
        int k = coding.size();
        int[] columnOfClass = new int[k];
        java.util.Arrays.fill(columnOfClass, -1);
        int[] columns = rows.probabilityClasses();
        for (int c = 0; c < columns.length; c++) columnOfClass[coding.code(columns[c])] = c;
        for (int code = 0; code < labels.size(); code++) {
            int cls = coding.code(code);
            if (cls >= 0 && columnOfClass[cls] < 0) {
                throw new UserInputException(labels.firstFile(code), RowErrors.line(labels.firstLine(code)),
                        "class '" + labels.label(code) + "' has no probability column '"
                                + options.probabilityPrefix() + labels.label(code) + "' in " + rows.ids().file(),
                        "add a probability column for every class, or check the spelling of this label");
            }
        }
        double[] source = rows.probabilities();
        double[] ordered = new double[source.length];
        for (int row = 0; row < rows.size(); row++) {
            for (int cls = 0; cls < k; cls++) ordered[row * k + cls] = source[row * k + columnOfClass[cls]];
        }
        return ordered;
    }

    /** The class of highest probability per row; on a tie, the lowest class code. */
    static int[] argMax(double[] probabilities, int k) {
        int[] best = new int[probabilities.length / k];
        for (int row = 0; row < best.length; row++) {
            int at = 0;
            for (int cls = 1; cls < k; cls++) {
                if (probabilities[row * k + cls] > probabilities[row * k + at]) at = cls;
            }
            best[row] = at;
        }
        return best;
    }

    /** One warning for all rows whose probabilities do not sum to 1 within the tolerance. */
    static Optional<String> sumWarning(Path file, PredictionRows rows, double[] probabilities, int k) {
        int off = 0;
        int worst = -1;
        double worstSum = 0;
        for (int row = 0; row < rows.size(); row++) {
            double sum = 0;
            for (int cls = 0; cls < k; cls++) sum += probabilities[row * k + cls];
            double distance = Math.abs(sum - 1);
            if (distance > SUM_TOLERANCE) {
                off++;
                if (worst < 0 || distance > Math.abs(worstSum - 1)) {
                    worst = row;
                    worstSum = sum;
                }
            }
        }
        if (off == 0) return Optional.empty();
        return Optional.of("WARNING " + file + ", line " + rows.line(worst) + ": probabilities do not sum to 1 (within "
                + SUM_TOLERANCE + ") in " + off + " of " + rows.size() + " rows; the furthest, on line "
                + rows.line(worst) + ", sums to " + String.format(java.util.Locale.ROOT, "%.6g", worstSum)
                + " (check that these are probabilities, not logits or scores)");
    }
}
