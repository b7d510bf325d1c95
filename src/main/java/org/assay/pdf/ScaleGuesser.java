package org.assay.pdf;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.assay.claims.Scale;

/**
 * Guesses whether a column prints its values in percent ("87.4") or as fractions ("0.874").
 *
 * <p>The scale divides the printed value to reach the metric's own range ({@link Scale#factor()}), so:
 * <ul>
 * <li>metrics bounded by 1 (accuracy, F1, AUC, BLEU, MCC, R²...): a % sign in the cells or header wins; then a
 *     value above 1 means percent; then values printed "0.xx" or ".xx" mean fraction;</li>
 * <li>ranks (mean_rank, median_rank) and errors in the target's unit (mae, rmse) are printed as they are:
 *     fraction, the scale with factor 1;</li>
 * <li>rsum is a sum of Recall@K values, usually of percents (0–600): percent unless every value fits
 *     the fraction-scale range 0–6.</li>
 * </ul>
 */
public final class ScaleGuesser {
    private static final Set<String> AS_PRINTED = Set.of("mean_rank", "median_rank", "mae", "rmse");
    /** RSUM adds six Recall@K values (three K in each of two directions): at most 6 on the fraction scale. */
    private static final BigDecimal RSUM_FRACTION_MAX = BigDecimal.valueOf(6);

    private ScaleGuesser() {}

    /** The scale of a column, its metric guessed from the same header path and caption. */
    public static ScaleGuess guess(List<String> headerPath, String caption, List<ParsedCell> columnCells) {
        return guess(MetricGuesser.guess(headerPath, caption).metric(), headerPath, caption, columnCells);
    }

    /** The scale of a column of a known metric id (or {@link MetricGuess#UNKNOWN}). */
    public static ScaleGuess guess(String metric, List<String> headerPath, String caption, List<ParsedCell> columnCells) {
        List<ParsedCell> numbers = new ArrayList<>();
        for (ParsedCell c : columnCells) if (c.kind() == ParsedCell.Kind.NUMBER) numbers.add(c);
        boolean signInCells = numbers.stream().anyMatch(ParsedCell::percent);
        String header = headerPath == null ? "" : CellText.normaliseLabel(String.join(" ", headerPath));
        boolean signInHeader = header.contains("%");
        String cap = caption == null ? "" : CellText.normaliseLabel(caption).toLowerCase(Locale.ROOT);
        boolean captionPercent = cap.contains("%") || cap.matches(".*\\bper ?cent(age)?s?\\b.*");
        List<BigDecimal> values = new ArrayList<>();
        boolean allLeadingPoint = !numbers.isEmpty();
        for (ParsedCell c : numbers) {
            values.add(new BigDecimal(c.plainValue()).abs());
            String v = c.value().replaceFirst("^[-+]", "");
            allLeadingPoint &= v.startsWith("0.") || v.startsWith(".") || v.matches("1\\.0*") || v.matches("0");
        }
        BigDecimal max = values.stream().max(BigDecimal::compareTo).orElse(null);

        if (AS_PRINTED.contains(metric)) {
            boolean sign = signInCells || signInHeader;
            return new ScaleGuess(Scale.FRACTION, sign ? 0.5 : 1.0, metric + " is printed in its own unit (scale factor 1)"
                    + (sign ? "; but a % sign is printed, so it may be a relative error" : ""));
        }
        if (metric.equals("rsum")) {
            if (signInCells || signInHeader) return new ScaleGuess(Scale.PERCENT, 1.0, "a % sign is printed");
            if (max == null) return new ScaleGuess(Scale.PERCENT, 0.6, "rsum is usually a sum of percentages");
            if (max.compareTo(RSUM_FRACTION_MAX) > 0) {
                return new ScaleGuess(Scale.PERCENT, 1.0, "a value above 6 is a sum of percentages");
            }
            return new ScaleGuess(Scale.FRACTION, 0.7, "every value is at most 6: a sum of fractions");
        }

        double trust = metric.equals(MetricGuess.UNKNOWN) ? 0.5 : 1.0; // an unknown metric may not be bounded by 1
        String about = metric.equals(MetricGuess.UNKNOWN) ? " (metric unknown)" : "";
        if (signInCells) return new ScaleGuess(Scale.PERCENT, trust, "a % sign in the cells" + about);
        if (signInHeader) return new ScaleGuess(Scale.PERCENT, trust, "a % sign in the header" + about);
        if (max != null && max.compareTo(BigDecimal.ONE) > 0) {
            return new ScaleGuess(Scale.PERCENT, 0.95 * trust, "a value above 1 (" + max.toPlainString()
                    + ") cannot be a fraction of " + (about.isEmpty() ? metric : "a bounded metric") + about);
        }
        if (captionPercent) return new ScaleGuess(Scale.PERCENT, 0.8 * trust, "the caption speaks of percent" + about);
        if (max != null && allLeadingPoint) {
            // small error rates are often printed in percent without a sign ("0.8" for 0.8%)
            double c = metric.equals("error_rate") ? 0.6 : 0.9;
            return new ScaleGuess(Scale.FRACTION, c * trust, "every value is at most 1 and printed as 0.xx" + about);
        }
        if (max != null) {
            return new ScaleGuess(Scale.PERCENT, 0.4 * trust, "values at most 1 but printed without a leading 0."
                    + " — read as small percentages" + about);
        }
        return new ScaleGuess(null, 0.0, "no numbers, no % sign and no hint in the caption");
    }
}
