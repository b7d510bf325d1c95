package org.assay.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.audit.checks.CheckFinding;
import org.assay.audit.checks.CheckKind;
import org.assay.audit.checks.CheckResult;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;

/** check.md, check.json and reviewer-comments.md for the claim-only checks. */
public final class CheckReport {
    public static final int SCHEMA_VERSION = 1;
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private CheckReport() {}

    public static String markdown(CheckResult r, String version) {
        Map<String, String> v = new LinkedHashMap<>();
        v.put("title", MarkdownReport.cell(title(r)));
        v.put("claims_file", MarkdownReport.cell(String.valueOf(r.claims().file())));
        v.put("version", version);
        v.put("summary", summary(r));
        v.put("tables", findingsByTable(r));
        return Templates.fill(Templates.load("check.md"), v);
    }

    /** The section the audit report includes. */
    static String section(CheckResult r) {
        return "## Claim-only checks\n\nThe printed values checked on their own, without the predictions (see `assay check`).\n\n"
                + summary(r) + "\n" + findingsByTable(r);
    }

    private static String title(CheckResult r) {
        return r.claims().title() != null ? r.claims().title() : String.valueOf(r.claims().file().getFileName());
    }

    static String summary(CheckResult r) {
        StringBuilder sb = new StringBuilder("| Finding | Count |\n|---|---:|\n");
        for (CheckKind k : CheckKind.values()) sb.append("| ").append(k.word()).append(" | ").append(r.count(k)).append(" |\n");
        sb.append("\nChecks run: ");
        List<String> parts = new ArrayList<>();
        r.checksRun().entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> parts.add(e.getKey() + " " + e.getValue()));
        sb.append(parts.isEmpty() ? "none" : String.join(", ", parts)).append(".\n");
        return sb.toString();
    }

    static String findingsByTable(CheckResult r) {
        StringBuilder sb = new StringBuilder();
        for (ClaimTable t : r.claims().tables()) {
            List<CheckFinding> fs = r.findings().stream().filter(f -> f.tableId().equals(t.id())).toList();
            sb.append("### Table ").append(MarkdownReport.cell(t.id()));
            if (t.caption() != null) sb.append(": ").append(MarkdownReport.cell(t.caption()));
            sb.append("\n\n");
            if (fs.isEmpty()) {
                sb.append("No findings.\n\n");
                continue;
            }
            for (CheckKind k : CheckKind.values()) {
                for (CheckFinding f : fs) {
                    if (f.kind() != k) continue;
                    sb.append("- **").append(k.word()).append("** `").append(f.id()).append("`: ")
                            .append(MarkdownReport.cell(f.message()));
                    if (f.suggestion() != null && k != CheckKind.NOT_CHECKED) {
                        sb.append(" *Suggestion:* ").append(MarkdownReport.cell(f.suggestion())).append('.');
                    } else if (f.suggestion() != null) {
                        sb.append(" To check it, ").append(MarkdownReport.cell(f.suggestion())).append('.');
                    }
                    sb.append('\n');
                }
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /** Short, specific, polite comments a reviewer can paste: problems first, then missing facts. */
    public static String reviewerComments(CheckResult r) {
        StringBuilder sb = new StringBuilder();
        int i = 1;
        for (CheckFinding f : r.problems()) {
            sb.append(i++).append(". ").append(f.message());
            if (f.suggestion() != null) sb.append(" Could the authors ").append(lowerFirst(f.suggestion())).append('?');
            sb.append(" [").append(f.id()).append("]\n\n");
        }
        for (ClaimTable t : r.claims().tables()) {
            boolean sizeMissing = r.findings().stream().anyMatch(f -> f.tableId().equals(t.id())
                    && f.kind() == CheckKind.NOT_CHECKED && f.message().contains("test_size unknown"));
            if (sizeMissing) {
                sb.append(i++).append(". Table ").append(t.id()).append(" does not state how many test items its values "
                        + "were computed on. Could the authors add the test-set size, so that readers can judge the "
                        + "precision of the values and the size of the differences?\n\n");
            }
        }
        if (i == 1) sb.append("The claim-only checks found nothing to raise.\n\n");
        Map<String, String> v = new LinkedHashMap<>();
        v.put("title", title(r));
        v.put("comments", sb.toString());
        return Templates.fill(Templates.load("reviewer-comments.md"), v);
    }

    private static String lowerFirst(String s) {
        return s.isEmpty() ? s : Character.toLowerCase(s.charAt(0)) + s.substring(1);
    }

    public static String json(CheckResult r, String version) {
        ObjectNode root = JSON.createObjectNode();
        root.put("schema_version", SCHEMA_VERSION);
        ObjectNode tool = root.putObject("tool");
        tool.put("name", "assay");
        tool.put("version", version);
        root.put("claims_file", String.valueOf(r.claims().file()));
        ObjectNode counts = root.putObject("counts");
        for (CheckKind k : CheckKind.values()) counts.put(k.word(), r.count(k));
        ObjectNode run = root.putObject("checks_run");
        r.checksRun().entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> run.put(e.getKey(), e.getValue()));
        root.set("findings", findings(r));
        try {
            return JSON.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    static ArrayNode findings(CheckResult r) {
        ArrayNode arr = JSON.createArrayNode();
        for (CheckFinding f : r.findings()) {
            ObjectNode o = arr.addObject();
            o.put("id", f.id());
            o.put("rule", f.rule());
            o.put("kind", f.kind().word());
            o.put("table", f.tableId());
            ArrayNode claims = o.putArray("claims");
            for (Claim c : f.claims()) {
                ObjectNode cn = claims.addObject();
                cn.put("row", c.row());
                ArrayNode col = cn.putArray("column");
                c.column().forEach(col::add);
                cn.put("metric", c.metric());
                cn.put("printed", c.value().text());
                cn.put("scale", c.scale().id());
                if (c.location() != null && c.location().line() > 0) cn.put("line", c.location().line());
            }
            o.put("message", f.message());
            if (f.suggestion() == null) o.putNull("suggestion"); else o.put("suggestion", f.suggestion());
            o.set("details", JSON.valueToTree(f.details()));
        }
        return arr;
    }
}
