package org.assay.report;

import java.util.Map;
import org.assay.audit.AuditResult;

/**
 * Adds the SVG plots to an audit model for the HTML report: a forest plot per table
 * ({@code forest_svg}) and, for bootstrap-based claims, a histogram of the resampled values
 * ({@code histogram_svg}). The SVG is built by assay with every text escaped, so templates place it
 * raw with {@code {{{...}}}}.
 */
final class HtmlPlots {
    private HtmlPlots() {}

    static Map<String, Object> withPlots(Map<String, Object> model, AuditResult r) {
        return model;   // the plots are added in the next step
    }
}
