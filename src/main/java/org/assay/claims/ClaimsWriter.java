package org.assay.claims;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLGenerator;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;

/**
 * Writes a {@link ClaimsFile} as YAML or JSON that {@link ClaimsReader} reads back to the same
 * model (apart from locations). Printed values, pm and margins are written as quoted strings so
 * their decimals survive any later tool; every claim carries its own scale (no table defaults).
 */
public final class ClaimsWriter {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final YAMLMapper YAML = new YAMLMapper(YAMLFactory.builder()
            .disable(YAMLGenerator.Feature.WRITE_DOC_START_MARKER)
            .disable(YAMLGenerator.Feature.MINIMIZE_QUOTES)
            .build());

    private ClaimsWriter() {}

    public static String toYaml(ClaimsFile f) {
        return write(YAML, f);
    }

    public static String toJson(ClaimsFile f) {
        return write(JSON, f) + "\n";
    }

    private static String write(ObjectMapper mapper, ClaimsFile f) {
        try {
            return mapper.writerWithDefaultPrettyPrinter().writeValueAsString(tree(f));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot serialize claims", e); // a tree of strings always serializes
        }
    }

    static ObjectNode tree(ClaimsFile f) {
        ObjectNode root = NODES.objectNode();
        if (f.title() != null || f.document() != null) {
            ObjectNode source = root.putObject("source");
            if (f.title() != null) source.put("title", f.title());
            if (f.document() != null) source.put("document", f.document());
        }
        ArrayNode tables = root.putArray("tables");
        for (ClaimTable t : f.tables()) {
            ObjectNode table = tables.addObject();
            table.put("id", t.id());
            if (t.caption() != null) table.put("caption", t.caption());
            if (t.testSize() == null) table.putNull("test_size");
            else table.put("test_size", t.testSize().intValue());
            table.put("runs", t.runs());
            if (!t.classCounts().isEmpty()) {
                ObjectNode counts = table.putObject("class_counts");
                t.classCounts().entrySet().stream().sorted(Map.Entry.comparingByKey())
                        .forEach(e -> counts.put(e.getKey(), e.getValue().longValue()));
            }
            if (!t.compare().isEmpty()) {
                ArrayNode cmp = table.putArray("compare");
                for (List<String> pair : t.compare()) {
                    ArrayNode p = cmp.addArray();
                    pair.forEach(p::add);
                }
            }
            ArrayNode claims = table.putArray("claims");
            for (Claim c : t.claims()) claims.add(claim(c));
        }
        return root;
    }

    private static ObjectNode claim(Claim c) {
        ObjectNode n = NODES.objectNode();
        if (c.row() != null) n.put("row", c.row());
        if (!c.column().isEmpty()) {
            ArrayNode column = n.putArray("column");
            c.column().forEach(column::add);
        }
        n.put("metric", c.metric());
        if (!c.params().isEmpty()) {
            ObjectNode params = n.putObject("params");
            // Sorted so that the same claims always give the same bytes (Claim.params has no order).
            c.params().entrySet().stream().sorted(Map.Entry.comparingByKey())
                    .forEach(e -> params.put(e.getKey(), e.getValue()));
        }
        n.put("value", c.value().text());
        n.put("scale", c.scale().id());
        if (c.pm() != null) {
            n.put("pm", plain(BigDecimal.valueOf(c.pm())));
            if (c.pmKind() != null) n.put("pm_kind", c.pmKind().id());
        }
        if (c.page() != null) n.put("page", c.page().intValue());
        if (c.testSize() != null) n.put("test_size", c.testSize().intValue());
        if (c.bold()) n.put("bold", true);
        if (c.margin() != null) {
            // Claim.margin is on the fraction scale; the file states it on the value's printed scale.
            BigDecimal printed = BigDecimal.valueOf(c.margin()).multiply(BigDecimal.valueOf(c.scale().factor()));
            n.put("margin", plain(printed));
        }
        return n;
    }

    private static String plain(BigDecimal d) {
        return d.stripTrailingZeros().toPlainString();
    }
}
