package org.assay.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

/**
 * Compares two report.json documents of the same audit: everything the audit concluded (settings,
 * findings, claims not audited, checks, warnings, and every input's role, size and SHA-256) must be
 * equal; how and where the run was made (the provenance block, input paths) may differ.
 */
public final class ReportComparison {
    private ReportComparison() {}

    /** The differences, one line each; empty when the results are identical. */
    public static List<String> differences(JsonNode before, JsonNode after) {
        JsonNode a = comparable(before), b = comparable(after);
        List<String> out = new ArrayList<>();
        diff("", a, b, out);
        return out;
    }

    private static JsonNode comparable(JsonNode report) {
        ObjectNode copy = report.deepCopy();
        copy.remove("provenance");
        copy.remove("tool");
        JsonNode inputs = copy.get("inputs");
        if (inputs instanceof ArrayNode arr) {
            for (JsonNode i : arr) if (i instanceof ObjectNode o) o.remove("path");
        }
        return copy;
    }

    private static void diff(String at, JsonNode a, JsonNode b, List<String> out) {
        if (out.size() >= 50) return;   // enough to see what changed
        if (a == null || b == null || a.getNodeType() != b.getNodeType()) {
            out.add((at.isEmpty() ? "/" : at) + ": " + text(a) + " before, " + text(b) + " now");
            return;
        }
        if (a.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> it = a.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                diff(at + "/" + e.getKey(), e.getValue(), b.get(e.getKey()), out);
            }
            for (Iterator<String> it = b.fieldNames(); it.hasNext(); ) {
                String k = it.next();
                if (!a.has(k)) out.add(at + "/" + k + ": absent before, " + text(b.get(k)) + " now");
            }
        } else if (a.isArray()) {
            if (a.size() != b.size()) {
                out.add(at + ": " + a.size() + " entries before, " + b.size() + " now");
                return;
            }
            for (int i = 0; i < a.size(); i++) diff(at + "/" + i, a.get(i), b.get(i), out);
        } else if (!a.equals(b)) {
            out.add(at + ": " + text(a) + " before, " + text(b) + " now");
        }
    }

    private static String text(JsonNode n) {
        if (n == null) return "absent";
        String s = n.toString();
        return s.length() > 80 ? s.substring(0, 77) + "..." : s;
    }
}
