package org.assay.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.audit.AuditResult;
import org.assay.audit.Finding;

/**
 * Adds the SVG plots to an audit model for the HTML report: a forest plot per table
 * ({@code forest_svg}) and, for bootstrap-based claims, a histogram of the resampled values
 * ({@code histogram_svg}, with {@code has_histogram}). The SVG is built by assay with every text
 * escaped, so templates place it raw with {@code {{{...}}}}. The model given is left as it was: the
 * plots go into a deep copy, so the Markdown and LaTeX reports never see them.
 */
final class HtmlPlots {
    private HtmlPlots() {}

    static Map<String, Object> withPlots(Map<String, Object> model, AuditResult r) {
        Map<String, Object> copy = deepCopy(model);
        for (Object t : (List<?>) copy.get("tables")) {
            @SuppressWarnings("unchecked")
            Map<String, Object> table = (Map<String, Object>) t;
            String id = (String) table.get("id");
            // ReportModel lists a table's claims in the order of AuditResult.findings()
            List<Finding> findings = r.findings().stream().filter(f -> f.claim().tableId().equals(id)).toList();
            List<?> claims = (List<?>) table.get("claims");
            if (claims.size() != findings.size()) {
                throw new IllegalStateException("table " + id + " has " + claims.size() + " claims in the model but "
                        + findings.size() + " findings");
            }
            String title = "Table " + id + (Boolean.TRUE.equals(table.get("has_caption")) ? ": " + table.get("caption") : "");
            table.put("forest_svg", ForestPlot.render(title, findings));
            for (int i = 0; i < claims.size(); i++) {
                @SuppressWarnings("unchecked")
                Map<String, Object> claim = (Map<String, Object>) claims.get(i);
                Finding f = findings.get(i);
                if (!f.claim().label().equals(claim.get("label"))) {
                    throw new IllegalStateException("claim " + i + " of table " + id + " is '" + claim.get("label")
                            + "' in the model but '" + f.claim().label() + "' in the findings");
                }
                boolean has = f.histogram() != null && f.histogram().counts().length > 0;
                claim.put("has_histogram", has);
                claim.put("histogram_svg", has ? BootstrapHistogram.render(f) : "");
            }
        }
        return copy;
    }

    /** A copy of a model of maps, lists and immutable leaves (strings, booleans), with new maps and lists throughout. */
    static Map<String, Object> deepCopy(Map<String, Object> model) {
        Map<String, Object> out = new LinkedHashMap<>();
        for (Map.Entry<String, Object> e : model.entrySet()) out.put(e.getKey(), copyValue(e.getValue()));
        return out;
    }

    @SuppressWarnings("unchecked")
    private static Object copyValue(Object v) {
        if (v instanceof Map<?, ?> m) return deepCopy((Map<String, Object>) m);
        if (v instanceof List<?> l) {
            List<Object> out = new ArrayList<>(l.size());
            for (Object o : l) out.add(copyValue(o));
            return out;
        }
        return v;
    }
}
