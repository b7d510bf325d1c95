package org.assay.claims;

import java.util.List;
import java.util.Map;

/**
 * One printed number of a results table, with what it claims to be.
 *
 * @param tableId  id of the table it belongs to
 * @param row      row label (for example the method name)
 * @param column   column header path, top to bottom
 * @param metric   canonical metric id ({@code accuracy}, {@code macro_f1}, {@code roc_auc}...)
 * @param params   metric parameters as strings ({@code k: "5"}, {@code positive: "bird"}); never null
 * @param value    the printed value
 * @param scale    percent or fraction
 * @param pm       printed ± value on the same scale as {@code value}, or null
 * @param pmKind   what {@code pm} means, or null when {@code pm} is null
 * @param page     page in the source document, or null
 * @param margin   per-claim equivalence margin on the fraction scale, or null for the audit's default
 * @param location where the claim was read from, for error messages and provenance
 * @param testSize items this one value was computed on when it differs from the table's
 *                 (a retrieval direction with its own query count), or null
 * @param bold     whether the value is printed in bold (the table's "best")
 */
public record Claim(
        String tableId,
        String row,
        List<String> column,
        String metric,
        Map<String, String> params,
        PrintedValue value,
        Scale scale,
        Double pm,
        PmKind pmKind,
        Integer page,
        Double margin,
        SourceLocation location,
        Integer testSize,
        boolean bold) {

    public Claim {
        column = List.copyOf(column);
        params = Map.copyOf(params);
    }

    /** A claim with no size override and not bold. */
    public Claim(String tableId, String row, List<String> column, String metric, Map<String, String> params,
                 PrintedValue value, Scale scale, Double pm, PmKind pmKind, Integer page, Double margin,
                 SourceLocation location) {
        this(tableId, row, column, metric, params, value, scale, pm, pmKind, page, margin, location, null, false);
    }

    /** Items this value was computed on: the claim's own size, else the table's; null when unknown. */
    public Integer testSizeIn(ClaimTable table) { return testSize != null ? testSize : table.testSize(); }

    /** "Ours / Clip-level / Accuracy" style label for reports. */
    public String label() {
        StringBuilder sb = new StringBuilder(row == null ? "" : row);
        for (String c : column) sb.append(sb.length() == 0 ? "" : " / ").append(c);
        return sb.toString();
    }
}
