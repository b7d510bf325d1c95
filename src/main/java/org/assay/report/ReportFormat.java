package org.assay.report;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;
import org.assay.common.UserInputException;

/** The report formats a command can write; {@code --format md,html,json,tex} picks any combination. */
public enum ReportFormat {
    MD, HTML, JSON, TEX;

    /** Parses "md,html" (case-insensitive; "markdown" and "latex" are accepted too). */
    public static Set<ReportFormat> parse(String text) {
        Set<ReportFormat> out = EnumSet.noneOf(ReportFormat.class);
        for (String part : text.split(",")) {
            String p = part.strip().toLowerCase(Locale.ROOT);
            switch (p) {
                case "md", "markdown" -> out.add(MD);
                case "html" -> out.add(HTML);
                case "json" -> out.add(JSON);
                case "tex", "latex" -> out.add(TEX);
                default -> throw UserInputException.usage("unknown format '" + part.strip() + "'",
                        "use any of md, html, json, tex, separated by commas (for example --format md,html)");
            }
        }
        if (out.isEmpty()) throw UserInputException.usage("--format is empty", "use for example --format md,json");
        return out;
    }
}
