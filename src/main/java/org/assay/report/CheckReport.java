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

/** check.json and the findings list report.json shares, for the claim-only checks. */
public final class CheckReport {
    public static final int SCHEMA_VERSION = 1;
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private CheckReport() {}

    public static String json(CheckResult r, Provenance p) {
        ObjectNode root = JSON.createObjectNode();
        root.put("schema_version", SCHEMA_VERSION);
        ObjectNode tool = root.putObject("tool");
        tool.put("name", "assay");
        tool.put("version", p.version());
        root.set("provenance", JsonReport.provenance(p));
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
