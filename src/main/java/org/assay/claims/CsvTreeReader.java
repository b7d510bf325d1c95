package org.assay.claims;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.dataformat.csv.CsvFactory;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.regex.Pattern;
import org.assay.common.Limit;
import org.assay.common.UserInputException;

/**
 * Reads a CSV claims file (one claim per row) with jackson-dataformat-csv into the same
 * {@link TreeNode} shape as a YAML file, so that {@link ClaimsTreeMapper} validates both alike.
 * Rows are grouped into tables by the {@code table} column; table-level columns must agree
 * across the rows of one table.
 */
final class CsvTreeReader {
    static final List<String> REQUIRED_COLUMNS = List.of(
            "table", "row", "column", "metric", "params", "value", "scale", "test_size", "runs", "pm", "pm_kind");
    static final List<String> OPTIONAL_COLUMNS = List.of("caption", "page", "margin");
    /** Columns that describe the table, not the claim: every row of a table must repeat the same text. */
    private static final List<String> TABLE_COLUMNS = List.of("caption", "test_size", "runs");
    /** Columns copied into each claim under the same name. */
    private static final List<String> CLAIM_COLUMNS =
            List.of("row", "metric", "value", "scale", "pm", "pm_kind", "page", "margin");
    private static final Pattern COLUMN_SEPARATOR = Pattern.compile(Pattern.quote(" / "));

    /** A factory with the limits in force (they can change between commands). */
    private static CsvFactory factory() {
        return CsvFactory.builder()
                .enable(CsvParser.Feature.WRAP_AS_ARRAY)
                .enable(CsvParser.Feature.SKIP_EMPTY_LINES)
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxDocumentLength(Limit.CLAIMS_BYTES.value()).build())
                .build();
    }

    private record Row(int line, List<String> cells) {}

    /** A table being assembled from its rows; {@code firstLine} is the line its first row came from. */
    private static final class TableRows {
        final int firstLine;
        final Map<String, String> tableCells;
        final List<TreeNode> claims = new ArrayList<>();

        TableRows(int firstLine, Map<String, String> tableCells) {
            this.firstLine = firstLine;
            this.tableCells = tableCells;
        }
    }

    private CsvTreeReader() {}

    static TreeNode read(Path file, String text) {
        List<Row> rows = rows(file, text);
        if (rows.isEmpty()) {
            throw new UserInputException(file, null, "the file is empty",
                    "start with the header line " + String.join(",", REQUIRED_COLUMNS));
        }
        Row header = rows.get(0);
        Map<String, Integer> index = header(file, header);
        if (rows.size() == 1) {
            throw new UserInputException(file, "line " + header.line(), "the file has a header but no claims",
                    "add one row per claim below the header");
        }
        Map<String, TableRows> tables = new LinkedHashMap<>();
        for (Row row : rows.subList(1, rows.size())) {
            if (row.cells().size() != header.cells().size()) {
                throw new UserInputException(file, "line " + row.line(),
                        "the row has " + row.cells().size() + " cells but the header has "
                                + header.cells().size() + " columns",
                        "give every row one cell per header column; quote cells that contain commas");
            }
            Map<String, String> cells = new HashMap<>();
            index.forEach((name, i) -> cells.put(name, row.cells().get(i).strip()));
            String id = cells.get("table");
            if (id.isEmpty()) {
                throw new UserInputException(file, "line " + row.line(), "the table cell is empty",
                        "fill the table column with the id of the table the claim belongs to");
            }
            Map<String, String> tableCells = new LinkedHashMap<>();
            for (String c : TABLE_COLUMNS) if (cells.containsKey(c)) tableCells.put(c, cells.get(c));
            TableRows table = tables.computeIfAbsent(id, k -> new TableRows(row.line(), tableCells));
            for (String c : tableCells.keySet()) {
                String mine = tableCells.get(c);
                String theirs = table.tableCells.get(c);
                if (!Objects.equals(mine, theirs)) {
                    throw new UserInputException(file, "line " + row.line(),
                            "rows of table " + id + " disagree on " + c + ": \"" + mine + "\" here but \""
                                    + theirs + "\" at line " + table.firstLine,
                            "give every row of a table the same " + c);
                }
            }
            table.claims.add(claim(file, row.line(), cells));
        }
        List<TreeNode> tableNodes = new ArrayList<>();
        tables.forEach((id, t) -> {
            List<TreeNode.Entry> entries = new ArrayList<>();
            entries.add(entry("id", t.firstLine, id));
            t.tableCells.forEach((c, v) -> entries.add(entry(c, t.firstLine, v)));
            entries.add(new TreeNode.Entry("claims", t.firstLine, new TreeNode.Sequence(t.firstLine, t.claims)));
            tableNodes.add(new TreeNode.Mapping(t.firstLine, entries));
        });
        return new TreeNode.Mapping(header.line(), List.of(
                new TreeNode.Entry("tables", header.line(), new TreeNode.Sequence(header.line(), tableNodes))));
    }

    private static TreeNode claim(Path file, int line, Map<String, String> cells) {
        List<TreeNode.Entry> entries = new ArrayList<>();
        for (String c : CLAIM_COLUMNS) if (cells.containsKey(c)) entries.add(entry(c, line, cells.get(c)));
        String column = cells.get("column");
        if (!column.isEmpty()) {
            List<TreeNode> parts = new ArrayList<>();
            for (String part : COLUMN_SEPARATOR.split(column)) {
                parts.add(new TreeNode.Scalar(line, part.strip(), TreeNode.Kind.STRING));
            }
            entries.add(new TreeNode.Entry("column", line, new TreeNode.Sequence(line, parts)));
        }
        String params = cells.get("params");
        if (!params.isEmpty()) entries.add(new TreeNode.Entry("params", line, params(file, line, params)));
        return new TreeNode.Mapping(line, entries);
    }

    /** Decodes {@code key=value;key=value}. */
    private static TreeNode params(Path file, int line, String cell) {
        List<TreeNode.Entry> entries = new ArrayList<>();
        Map<String, Boolean> seen = new HashMap<>();
        for (String pair : cell.split(";", -1)) {
            if (pair.isBlank()) continue; // tolerate a trailing ';'
            int eq = pair.indexOf('=');
            String key = eq < 0 ? "" : pair.substring(0, eq).strip();
            String value = eq < 0 ? "" : pair.substring(eq + 1).strip();
            if (key.isEmpty() || value.isEmpty()) {
                throw new UserInputException(file, "line " + line,
                        "params \"" + cell + "\" has the entry \"" + pair.strip() + "\", which is not key=value",
                        "write params as key=value;key=value, for example k=5;positive=bird");
            }
            if (seen.put(key, Boolean.TRUE) != null) {
                throw new UserInputException(file, "line " + line,
                        "params \"" + cell + "\" gives " + key + " twice", "keep one value for " + key);
            }
            entries.add(entry(key, line, value));
        }
        return new TreeNode.Mapping(line, entries);
    }

    private static TreeNode.Entry entry(String key, int line, String cell) {
        TreeNode value = cell.isEmpty()
                ? new TreeNode.Scalar(line, null, TreeNode.Kind.NULL)
                : new TreeNode.Scalar(line, cell, TreeNode.Kind.STRING);
        return new TreeNode.Entry(key, line, value);
    }

    private static Map<String, Integer> header(Path file, Row header) {
        Map<String, Integer> index = new LinkedHashMap<>();
        List<String> allowed = new ArrayList<>(REQUIRED_COLUMNS);
        allowed.addAll(OPTIONAL_COLUMNS);
        if (header.cells().size() == 1) {
            // A spreadsheet saved with another separator gives one long header cell; say so, not "unknown column".
            String only = header.cells().get(0);
            for (String separator : List.of(";", "\t", "|")) {
                if (only.contains(separator)) {
                    String shown = separator.equals("\t") ? "tabs" : "'" + separator + "'";
                    throw new UserInputException(file, "line " + header.line(),
                            "the header is a single cell: the file is separated by " + shown + ", not commas",
                            "save it as CSV with commas between cells (quote cells that contain commas)");
                }
            }
        }
        for (int i = 0; i < header.cells().size(); i++) {
            String name = header.cells().get(i).strip();
            if (!allowed.contains(name)) {
                throw new UserInputException(file, "line " + header.line(),
                        "unknown column \"" + name + "\" in the header",
                        "allowed columns are " + String.join(", ", allowed));
            }
            if (index.put(name, i) != null) {
                throw new UserInputException(file, "line " + header.line(),
                        "the header names the column " + name + " twice", "keep one " + name + " column");
            }
        }
        List<String> missing = REQUIRED_COLUMNS.stream().filter(c -> !index.containsKey(c)).toList();
        if (!missing.isEmpty()) {
            throw new UserInputException(file, "line " + header.line(),
                    "the header lacks the column" + (missing.size() > 1 ? "s " : " ") + String.join(", ", missing),
                    "the header needs " + String.join(",", REQUIRED_COLUMNS)
                            + "; caption, page and margin are optional; leave cells empty where unknown");
        }
        return index;
    }

    private static List<Row> rows(Path file, String text) {
        List<Row> rows = new ArrayList<>();
        try (JsonParser parser = factory().createParser(text)) {
            try {
                // WRAP_AS_ARRAY gives one outer array holding one array per row. The location of a
                // row's START_ARRAY is stale, so a row's line is that of its first cell.
                if (parser.nextToken() != JsonToken.START_ARRAY) return rows;
                while (parser.nextToken() == JsonToken.START_ARRAY) {
                    int line = 0;
                    List<String> cells = new ArrayList<>();
                    while (parser.nextToken() != JsonToken.END_ARRAY) {
                        if (cells.isEmpty()) line = parser.currentTokenLocation().getLineNr();
                        cells.add(CsvFormulaGuard.unguard(parser.getText()));   // '=x written by the draft writer reads as =x
                    }
                    rows.add(new Row(line, cells));
                }
            } catch (JsonProcessingException e) {
                JsonLocation where = e.getLocation() != null ? e.getLocation() : parser.currentLocation();
                throw new UserInputException(file, "line " + where.getLineNr(),
                        "CSV syntax error: " + e.getOriginalMessage(),
                        "check the quotes on this line: a quoted cell must end with a closing \"", e);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e); // reading from a String: only parse errors, handled above
        }
        return rows;
    }
}
