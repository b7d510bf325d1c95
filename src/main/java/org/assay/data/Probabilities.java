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
     * Reorders the file's probability columns into class order, in place. Every class needs a
     * column: a class without one (a label seen only in the truth) is an error, not a zero.
     */
    static ProbabilityTable inClassOrder(PredictionRows rows, ClassCoding coding, LabelTable labels, ReadOptions options) {
        int k = coding.size();
        int[] columnOfClass = new int[k];
        java.util.Arrays.fill(columnOfClass, -1);
        int[] columns = rows.probabilityClasses();
        for (int c = 0; c < columns.length; c++) columnOfClass[coding.code(columns[c])] = c;
        for (int code : labels.inOrderSeen()) {
            int cls = coding.code(code);
            if (cls >= 0 && columnOfClass[cls] < 0) {
                throw new UserInputException(labels.firstFile(code), RowErrors.line(labels.firstLine(code)),
                        "class '" + labels.label(code) + "' has no probability column '"
                                + options.probabilityPrefix() + labels.label(code) + "' in " + rows.ids().file(),
                        "add a probability column for every class, or check the spelling of this label");
            }
        }
        ProbabilityTable table = rows.probabilities();
        table.reorder(columnOfClass);
        return table;
    }

    /** The class of highest probability per row; on a tie, the lowest class code. */
    static int[] argMax(ProbabilityTable probabilities) {
        int k = probabilities.classes();
        int[] best = new int[probabilities.rows()];
        for (int row = 0; row < best.length; row++) {
            int at = 0;
            double top = probabilities.get(row, 0);
            for (int cls = 1; cls < k; cls++) {
                double p = probabilities.get(row, cls);
                if (p > top) {
                    at = cls;
                    top = p;
                }
            }
            best[row] = at;
        }
        return best;
    }

    /** One warning for all rows whose probabilities do not sum to 1 within the tolerance. */
    static Optional<String> sumWarning(Path file, PredictionRows rows, ProbabilityTable probabilities) {
        int k = probabilities.classes();
        int off = 0;
        int worst = -1;
        double worstSum = 0;
        for (int row = 0; row < rows.size(); row++) {
            double sum = 0;
            for (int cls = 0; cls < k; cls++) sum += probabilities.get(row, cls);
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
