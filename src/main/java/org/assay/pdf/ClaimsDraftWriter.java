package org.assay.pdf;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLGenerator;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.claims.CsvFormulaGuard;

/**
 * Writes extracted tables as a claims draft in the claims-file format (DESIGN.md), with the
 * provenance of every value: page, box, the cell as printed, marks, underline, and the confidence
 * of each guess. {@code test_size} is left null for the user to fill in. Cells that are not
 * numbers (missing marks, words) are listed under {@code other_cells} rather than dropped.
 */
public final class ClaimsDraftWriter {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    private static final YAMLMapper YAML = new YAMLMapper(YAMLFactory.builder()
            .disable(YAMLGenerator.Feature.WRITE_DOC_START_MARKER)
            .disable(YAMLGenerator.Feature.MINIMIZE_QUOTES)
            .build());
    private static final ObjectMapper JSON = new ObjectMapper();
    static final List<String> CSV_COLUMNS = List.of("table", "row", "column", "metric", "params", "value", "scale",
            "test_size", "runs", "pm", "pm_kind", "caption", "page");

    private ClaimsDraftWriter() {}

    public static String write(Extraction extraction, String format) {
        try {
            return switch (format) {
                case "json" -> JSON.writerWithDefaultPrettyPrinter().writeValueAsString(tree(extraction)) + "\n";
                case "csv" -> csv(extraction);
                default -> YAML.writerWithDefaultPrettyPrinter().writeValueAsString(tree(extraction));
            };
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot serialize the claims draft", e); // a tree of strings always serializes
        }
    }

    static ObjectNode tree(Extraction x) {
        ObjectNode root = NODES.objectNode();
        ObjectNode source = root.putObject("source");
        if (x.title() != null) source.put("title", x.title());
        source.put("document", x.file().getFileName().toString());
        ArrayNode tables = root.putArray("tables");
        List<String> ids = new ArrayList<>();
        for (ExtractedTable t : x.tables()) {
            ObjectNode table = tables.addObject();
            String id = tableId(t, ids);
            table.put("id", id);
            table.put("caption", t.caption());
            table.putNull("test_size");
            table.put("runs", 1);
            table.put("page", t.page());
            table.set("box", box(t.x0(), t.top(), t.x1(), t.bottom()));
            ArrayNode labels = table.putArray("label_columns");
            t.labelHeaders().forEach(labels::add);
            ArrayNode columns = table.putArray("columns");
            for (int c = 0; c < t.columns().size(); c++) {
                ObjectNode col = columns.addObject();
                ArrayNode path = col.putArray("header");
                t.columns().get(c).forEach(path::add);
                MetricGuess m = t.metrics().get(c);
                ScaleGuess s = t.scales().get(c);
                col.put("metric", m.metric());
                col.put("metric_confidence", round(m.confidence()));
                col.put("scale", s.scale() == null ? "unknown" : s.scale().id());
                col.put("scale_confidence", round(s.confidence()));
                col.put("why", m.reason() + "; " + s.reason());
            }
            ArrayNode rows = table.putArray("rows");
            for (List<String> r : t.rows()) {
                ArrayNode path = rows.addArray();
                r.forEach(path::add);
            }
            ArrayNode claims = table.putArray("claims");
            ArrayNode others = NODES.arrayNode();
            for (ExtractedCell cell : t.cells()) {
                int c = t.columns().indexOf(cell.columnPath());
                if (cell.parsed().kind() == ParsedCell.Kind.NUMBER) claims.add(claim(cell, t.metrics().get(c), t.scales().get(c)));
                else others.add(other(cell));
            }
            if (!others.isEmpty()) table.set("other_cells", others);
        }
        return root;
    }

    private static ObjectNode claim(ExtractedCell cell, MetricGuess m, ScaleGuess s) {
        ObjectNode n = NODES.objectNode();
        n.put("row", String.join(" / ", cell.rowPath()));
        ArrayNode column = n.putArray("column");
        cell.columnPath().forEach(column::add);
        n.put("metric", m.metric());
        if (!m.params().isEmpty()) {
            ObjectNode params = n.putObject("params");
            m.params().entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> params.put(e.getKey(), e.getValue()));
        }
        ParsedCell p = cell.parsed();
        n.put("value", p.plainValue());
        n.put("scale", scaleOf(cell, s));
        if (p.pm() != null) {
            n.put("pm", p.plainPm());
            n.put("pm_kind", "unknown");
        }
        if (cell.bold()) n.put("bold", true);
        n.put("page", cell.page());
        n.put("cell", cell.printed());
        n.set("box", box(cell.x0(), cell.top(), cell.x1(), cell.bottom()));
        if (cell.underline()) n.put("underline", true);
        if (!cell.markers().isEmpty()) {
            ArrayNode marks = n.putArray("markers");
            cell.markers().forEach(marks::add);
        }
        n.put("confidence", round(Math.min(cell.confidence(), Math.min(m.confidence(), s.confidence()))));
        return n;
    }

    private static ObjectNode other(ExtractedCell cell) {
        ObjectNode n = NODES.objectNode();
        n.put("row", String.join(" / ", cell.rowPath()));
        ArrayNode column = n.putArray("column");
        cell.columnPath().forEach(column::add);
        n.put("cell", cell.printed());
        n.put("kind", cell.parsed().kind().name().toLowerCase(java.util.Locale.ROOT));
        n.put("page", cell.page());
        n.set("box", box(cell.x0(), cell.top(), cell.x1(), cell.bottom()));
        return n;
    }

    /** A printed % sign settles the scale; a column with nothing to go on defaults to percent (the usual print). */
    private static String scaleOf(ExtractedCell cell, ScaleGuess s) {
        if (cell.parsed().percent() || s.scale() == null) return "percent";
        return s.scale().id();
    }

    static String tableId(ExtractedTable t, List<String> taken) {
        String base = "T" + t.number();
        String id = base;
        for (int k = 2; taken.contains(id); k++) id = base + "-" + k;
        taken.add(id);
        return id;
    }

    private static ArrayNode box(double x0, double top, double x1, double bottom) {
        ArrayNode a = NODES.arrayNode();
        for (double v : new double[] {x0, top, x1, bottom}) a.add(BigDecimal.valueOf(v).setScale(1, RoundingMode.HALF_EVEN));
        return a;
    }

    private static BigDecimal round(double v) {
        return BigDecimal.valueOf(v).setScale(2, RoundingMode.HALF_EVEN);
    }

    private static String csv(Extraction x) throws JsonProcessingException {
        CsvSchema.Builder schema = CsvSchema.builder().setUseHeader(true);
        CSV_COLUMNS.forEach(schema::addColumn);
        List<Map<String, String>> rows = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        for (ExtractedTable t : x.tables()) {
            String id = tableId(t, ids);
            for (ExtractedCell cell : t.cells()) {
                if (cell.parsed().kind() != ParsedCell.Kind.NUMBER) continue;
                int c = t.columns().indexOf(cell.columnPath());
                MetricGuess m = t.metrics().get(c);
                Map<String, String> r = new LinkedHashMap<>();
                r.put("table", id);
                r.put("row", String.join(" / ", cell.rowPath()));
                r.put("column", String.join(" / ", cell.columnPath()));
                r.put("metric", m.metric());
                StringBuilder params = new StringBuilder();
                m.params().entrySet().stream().sorted(Map.Entry.comparingByKey())
                        .forEach(e -> params.append(params.length() == 0 ? "" : ";").append(e.getKey()).append('=').append(e.getValue()));
                r.put("params", params.toString());
                r.put("value", cell.parsed().plainValue());
                r.put("scale", scaleOf(cell, t.scales().get(c)));
                r.put("test_size", "");
                r.put("runs", "1");
                r.put("pm", cell.parsed().pm() == null ? "" : cell.parsed().plainPm());
                r.put("pm_kind", cell.parsed().pm() == null ? "" : "unknown");
                r.put("caption", t.caption());
                r.put("page", Integer.toString(cell.page()));
                // labels come from someone else's PDF: no cell may open as a formula in a spreadsheet
                r.replaceAll((column, value) -> CsvFormulaGuard.guard(value));
                rows.add(r);
            }
        }
        return new CsvMapper().writer(schema.build()).writeValueAsString(rows);
    }
}
