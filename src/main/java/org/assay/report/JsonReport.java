package org.assay.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.assay.audit.AuditResult;
import org.assay.audit.Comparison;
import org.assay.audit.ComparisonVerdict;
import org.assay.audit.Finding;
import org.assay.audit.InputFile;
import org.assay.audit.UnauditedClaim;
import org.assay.audit.Verdict;
import org.assay.claims.Claim;
import org.assay.stats.Interval;
import org.assay.stats.MultiplicityMethod;

/**
 * report.json: the audit for machines. The schema is documented in DEVELOPERS.md
 * ("report.json schema"); bump {@link #SCHEMA_VERSION} on any incompatible change.
 * Values are on the metric's fraction scale; undefined numbers are null.
 */
public final class JsonReport {
    public static final int SCHEMA_VERSION = 1;
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private JsonReport() {}

    public static String render(AuditResult r, Provenance p) {
        ObjectNode root = JSON.createObjectNode();
        root.put("schema_version", SCHEMA_VERSION);
        ObjectNode tool = root.putObject("tool");
        tool.put("name", "assay");
        tool.put("version", p.version());
        root.set("provenance", provenance(p));
        ObjectNode s = root.putObject("settings");
        s.put("confidence", r.settings().confidence());
        s.put("interval", r.settings().interval().id());
        s.put("resamples", r.settings().resamples());
        s.put("seed", r.settings().seed());
        s.put("margin", r.margin());
        s.put("multiplicity", r.multiplicity().id());
        s.put("paired_test", r.pairedMethod().id());
        ObjectNode source = root.putObject("source");
        source.put("title", r.claims().title());
        source.put("document", r.claims().document());
        ArrayNode inputs = root.putArray("inputs");
        for (InputFile f : r.inputs()) {
            ObjectNode o = inputs.addObject();
            o.put("role", f.role());
            o.put("path", f.path().toString());
            o.put("bytes", f.bytes());
            o.put("sha256", f.sha256());
            if (f.rows() != null) {
                ObjectNode rows = o.putObject("rows");
                rows.put("read", f.rows().read());
                rows.put("used", f.rows().used());
                rows.put("set_aside", f.rows().setAside());
                if (f.rows().setAsideReason() != null) rows.put("set_aside_reason", f.rows().setAsideReason());
            }
        }
        ObjectNode counts = root.putObject("counts");
        for (Verdict v : Verdict.values()) counts.put(v.word(), r.count(v));
        ArrayNode findings = root.putArray("findings");
        for (Finding f : r.findings()) findings.add(finding(f, r.multiplicity()));
        ArrayNode unaudited = root.putArray("unaudited");
        for (UnauditedClaim u : r.unaudited()) {
            ObjectNode o = claim(u.claim());
            o.put("reason", u.reason());
            unaudited.add(o);
        }
        ArrayNode comparisons = root.putArray("comparisons");
        for (Comparison c : r.comparisons()) comparisons.add(comparison(c));
        root.set("checks", CheckReport.findings(r.checks()));
        ArrayNode warnings = root.putArray("warnings");
        r.warnings().forEach(warnings::add);
        try {
            return JSON.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** How the report was made; {@code assay audit --rerun} repeats the run from it. */
    static ObjectNode provenance(Provenance p) {
        ObjectNode o = JSON.createObjectNode();
        o.put("version", p.version());
        o.put("commit", p.commit());
        o.put("java", p.java());
        o.put("os", p.os());
        ArrayNode args = o.putArray("arguments");
        p.arguments().forEach(args::add);
        o.put("command", p.command());
        o.put("working_directory", p.workingDirectory());
        return o;
    }

    private static ObjectNode claim(Claim c) {
        ObjectNode o = JSON.createObjectNode();
        o.put("table", c.tableId());
        o.put("row", c.row());
        ArrayNode col = o.putArray("column");
        c.column().forEach(col::add);
        o.put("metric", c.metric());
        ObjectNode params = o.putObject("params");
        c.params().entrySet().stream().sorted(java.util.Map.Entry.comparingByKey())
                .forEach(e -> params.put(e.getKey(), e.getValue()));
        o.put("printed", c.value().text());
        o.put("scale", c.scale().id());
        if (c.location() != null) {
            ObjectNode loc = o.putObject("location");
            if (c.location().line() > 0) loc.put("line", c.location().line());
            if (c.location().pointer() != null) loc.put("pointer", c.location().pointer());
        }
        return o;
    }

    private static ObjectNode finding(Finding f, MultiplicityMethod multiplicity) {
        ObjectNode o = claim(f.claim());
        o.put("verdict", f.verdict().word());
        ArrayNode ci = o.putArray("claim_interval");
        num(ci, f.claimLower());
        num(ci, f.claimUpper());
        if (f.verdict() == Verdict.NOT_COMPUTABLE) {
            o.put("reason", f.reason());
            return o;
        }
        o.put("n", f.n());
        if (f.population() == null) o.putNull("test_size"); else o.put("test_size", f.population());
        num(o, "estimate", f.estimate());
        o.set("interval", interval(f.interval()));
        o.set("equivalence_interval", interval(f.equivalence()));
        ArrayNode range = o.putArray("range_if_true");
        num(range, f.rangeIfTrue()[0]);
        num(range, f.rangeIfTrue()[1]);
        num(o, "p_value", f.pValue());
        num(o, "adjusted_p_value", f.adjustedP());
        // kept for readers of earlier reports: the Holm value, null when another method was chosen
        num(o, "holm_p_value", multiplicity == MultiplicityMethod.HOLM ? f.adjustedP() : Double.NaN);
        num(o, "margin", f.margin());
        num(o, "difference", f.difference());
        o.put("direction", f.direction());
        if (f.itemsToSettle() == null) o.putNull("items_to_settle"); else o.put("items_to_settle", f.itemsToSettle());
        ArrayNode notes = o.putArray("notes");
        f.notes().forEach(notes::add);
        if (f.histogram() != null) {
            ObjectNode h = o.putObject("bootstrap_histogram");
            num(h, "lower", f.histogram().lower());
            num(h, "width", f.histogram().width());
            ArrayNode counts = h.putArray("counts");
            for (int c : f.histogram().counts()) counts.add(c);
        }
        return o;
    }

    /** One compared pair of rows on one column: the claimed gap beside the reproduced one. */
    private static ObjectNode comparison(Comparison c) {
        ObjectNode o = JSON.createObjectNode();
        Claim a = c.claimA();
        o.put("table", a.tableId());
        ArrayNode rows = o.putArray("rows");
        rows.add(a.row());
        rows.add(c.claimB().row());
        ArrayNode col = o.putArray("column");
        a.column().forEach(col::add);
        o.put("metric", a.metric());
        ObjectNode params = o.putObject("params");
        a.params().entrySet().stream().sorted(java.util.Map.Entry.comparingByKey())
                .forEach(e -> params.put(e.getKey(), e.getValue()));
        ArrayNode printed = o.putArray("printed");
        printed.add(a.value().text());
        printed.add(c.claimB().value().text());
        o.put("scale", a.scale().id());
        num(o, "claimed_gap", c.printedGap());
        ArrayNode claimed = o.putArray("claimed_gap_interval");
        num(claimed, c.claimedLower());
        num(claimed, c.claimedUpper());
        o.put("verdict", c.verdict().word());
        if (c.verdict() == ComparisonVerdict.NOT_COMPUTABLE) {
            o.put("reason", c.reason());
            return o;
        }
        o.put("n", c.n());
        if (c.population() == null) o.putNull("test_size"); else o.put("test_size", c.population());
        num(o, "reproduced_gap", c.gap());
        o.set("interval", interval(c.interval()));
        o.put("claimed_gap_in_interval", c.claimedGapInInterval());
        o.put("method", c.test());
        num(o, "p_value", c.pValue());
        num(o, "adjusted_p_value", c.adjustedP());
        if (c.discordant() != null) {
            ObjectNode d = o.putObject("discordant");
            d.put("first_only", c.discordant()[0]);
            d.put("second_only", c.discordant()[1]);
        }
        ArrayNode notes = o.putArray("notes");
        c.notes().forEach(notes::add);
        return o;
    }

    private static ObjectNode interval(Interval i) {
        ObjectNode o = JSON.createObjectNode();
        num(o, "lower", i.lower());
        num(o, "upper", i.upper());
        o.put("confidence", i.confidence());
        o.put("method", i.method());
        return o;
    }

    private static void num(ObjectNode o, String field, double v) {
        if (Double.isFinite(v)) o.put(field, v); else o.putNull(field);
    }

    private static void num(ArrayNode a, double v) {
        if (Double.isFinite(v)) a.add(v); else a.addNull();
    }
}
