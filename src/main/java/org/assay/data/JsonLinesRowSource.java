package org.assay.data;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.cfg.JsonNodeFeature;
import org.assay.common.Limit;
import org.assay.common.UserInputException;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One JSON object per line (JSON Lines), parsed a line at a time with Jackson databind.
 *
 * <p>A field named {@value #PROBABILITIES} holding an object {@code {class: p}} is flattened into
 * fields {@code <prefix><class>}, so it reads like the {@code p_<class>} columns of a CSV file.
 * The first object fixes the set of fields; every later line must have the same ones (the
 * analogue of a ragged row). Numbers keep the text they were written with ({@code 1.0} stays
 * {@code "1.0"}), so labels compare as written. A score or probability written as a JSON string
 * ({@code "0.9"}) is accepted like the number: many exporters quote numbers, the text is the same
 * either way, and it is then parsed as strictly as a CSV field ({@link NumberField}: "NaN", "0,9"
 * or "high" are still errors naming the line), as the regression reader does. Blank lines are skipped.
 */
final class JsonLinesRowSource implements RowSource {
    static final String PROBABILITIES = "probabilities";

    private final Path file;
    private final BufferedReader reader;
    private final ReadOptions options;
    private final ObjectMapper mapper = JsonMapper.builder(JsonFactory.builder()
                    .streamReadConstraints(StreamReadConstraints.builder()
                            .maxNestingDepth(Limit.DEPTH.intValue())
                            .maxStringLength(Limit.LINE_CHARS.intValue()).build())
                    .build())
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .disable(JsonNodeFeature.STRIP_TRAILING_BIGDECIMAL_ZEROES)
            .build();
    private final List<String> columns;
    private final Map<String, Integer> index = new LinkedHashMap<>();
    private final int headerLine;
    private String[] current;
    private Map<String, String> pending;   // the first object, read ahead to learn the columns
    private int lineNumber;
    private int line;
    private long rows;

    JsonLinesRowSource(Path file, Reader reader, ReadOptions options) {
        this.file = file;
        this.reader = new BufferedReader(reader);
        this.options = options;
        pending = readObject();
        if (pending == null) throw RowErrors.empty(file, "file");
        headerLine = lineNumber;
        columns = List.copyOf(pending.keySet());
        if (Limit.COLUMNS.exceededBy(columns.size())) {
            throw Limit.COLUMNS.exceeded(file, RowErrors.line(headerLine), "the first object has " + columns.size() + " fields");
        }
        for (int i = 0; i < columns.size(); i++) index.put(columns.get(i), i);
    }

    @Override public Path file() { return file; }
    @Override public List<String> columns() { return columns; }
    @Override public int line() { return line; }
    @Override public int headerLine() { return headerLine; }
    @Override public String value(int column) { return current[column]; }

    @Override
    public boolean next() {
        Map<String, String> fields = pending != null ? pending : readObject();
        pending = null;
        if (fields == null) return false;
        line = lineNumber;
        if (Limit.ROWS.exceededBy(++rows)) {
            throw Limit.ROWS.exceeded(file, RowErrors.line(line), "the file has more than " + Limit.ROWS.value() + " rows");
        }
        String[] values = new String[columns.size()];
        for (Map.Entry<String, String> field : fields.entrySet()) {
            Integer at = index.get(field.getKey());
            if (at == null) {
                throw new UserInputException(file, RowErrors.line(line),
                        "field '" + field.getKey() + "' is not on line " + headerLine
                                + ", the first object",
                        "give every line the same fields");
            }
            values[at] = field.getValue();
        }
        for (int i = 0; i < values.length; i++) {
            if (values[i] == null) {
                throw new UserInputException(file, RowErrors.line(line),
                        "field '" + columns.get(i) + "' is missing; line " + headerLine + " has it",
                        "give every line the same fields");
            }
        }
        current = values;
        return true;
    }

    /** Reads the next non-blank line as a flat field map; null at the end of the file. */
    private Map<String, String> readObject() {
        String text;
        try {
            do {
                text = reader.readLine();
                if (text == null) return null;
                lineNumber++;
            } while (text.isBlank());
        } catch (IOException e) {
            throw RowErrors.unreadable(file, e);
        }
        JsonNode node;
        try {
            node = mapper.readTree(text);
        } catch (StreamConstraintsException e) {
            throw Limit.DEPTH.exceeded(file, RowErrors.line(lineNumber), "the JSON on this line is nested too deeply");
        } catch (JsonProcessingException e) {
            // Jackson counts lines within the one line it was given; report the file line.
            throw new UserInputException(file, RowErrors.line(lineNumber),
                    "not valid JSON: " + e.getOriginalMessage(),
                    "write one complete JSON object per line", e);
        } catch (NumberFormatException e) {
            // Floats are read as BigDecimal; an exponent beyond its int range (1e2147483648) fails here, not as JSON.
            throw new UserInputException(file, RowErrors.line(lineNumber),
                    "a number cannot be read: " + e.getMessage(),
                    "write numbers as plain decimals, such as 0.25", e);
        }
        if (!node.isObject()) {
            throw new UserInputException(file, RowErrors.line(lineNumber),
                    "expected a JSON object, found " + node.getNodeType().toString().toLowerCase(),
                    "write one JSON object per line, such as {\"id\": \"x1\", \"label\": \"cat\", ...}");
        }
        Map<String, String> fields = new LinkedHashMap<>();
        for (Map.Entry<String, JsonNode> field : node.properties()) {
            if (field.getKey().equals(PROBABILITIES) && field.getValue().isObject()) {
                for (Map.Entry<String, JsonNode> entry : field.getValue().properties()) {
                    String name = options.probabilityPrefix() + entry.getKey();
                    String path = PROBABILITIES + "." + entry.getKey();
                    if (fields.containsKey(name)) {
                        throw new UserInputException(file, RowErrors.line(lineNumber),
                                "class '" + entry.getKey() + "' has a probability both in '" + name
                                        + "' and in '" + path + "'",
                                "give each class's probability once");
                    }
                    fields.put(name, scalar(path, entry.getValue()));
                }
            } else {
                String name = field.getKey();
                if (fields.containsKey(name)) {
                    throw new UserInputException(file, RowErrors.line(lineNumber),
                            "field '" + name + "' is given twice (also inside '" + PROBABILITIES + "')",
                            "give each class's probability once");
                }
                fields.put(name, scalar(name, field.getValue()));
            }
        }
        return fields;
    }

    /** The text of a scalar field; "" for null. */
    private String scalar(String name, JsonNode value) {
        if (value.isNull()) return "";
        if (value.isContainerNode()) {
            throw new UserInputException(file, RowErrors.line(lineNumber),
                    "field '" + name + "' holds " + (value.isArray() ? "an array" : "an object")
                            + " where a single value belongs",
                    "write a string or a number there");
        }
        // Big decimals with trailing zeros kept keep the written scale: BigDecimal("1.0").toString() is "1.0".
        return value.isBigDecimal() ? value.decimalValue().toString() : value.asText();
    }

    @Override
    public void close() {
        try {
            reader.close();
        } catch (IOException e) {
            throw RowErrors.unreadable(file, e);
        }
    }

}
