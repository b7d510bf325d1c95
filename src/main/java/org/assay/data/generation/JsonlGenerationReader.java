package org.assay.data.generation;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.assay.common.UserInputException;
import org.assay.data.UniqueIds;

/**
 * One item per line: {@code {"id": ..., "hypothesis": "...", "references": ["...", ...]}}. The id is
 * a string or a whole number; other fields are ignored. Blank lines are skipped, as in every
 * JSON Lines file the project reads.
 */
final class JsonlGenerationReader {
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();
    private static final String EXAMPLE = "{\"id\": \"s1\", \"hypothesis\": \"...\", \"references\": [\"...\"]}";

    private final Path file;
    private int line;

    private JsonlGenerationReader(Path file) {
        this.file = file;
    }

    static GenerationData read(Path file) {
        return new JsonlGenerationReader(file).readAll();
    }

    private GenerationData readAll() {
        UniqueIds unique = new UniqueIds(file);
        List<String> ids = new ArrayList<>(), hypotheses = new ArrayList<>();
        List<List<String>> references = new ArrayList<>();
        List<Integer> emptyAt = new ArrayList<>();
        // line by line: only what is extracted stays, never the whole file's text as well
        TextLines.forEach(file, "outputs file", text -> {
            line++;
            if (Whitespace.isBlank(text)) return;
            JsonNode item = parse(text);
            String id = id(item);
            unique.add(id, line);
            String hypothesis = hypothesis(item);
            if (Whitespace.isBlank(hypothesis)) emptyAt.add(line);
            ids.add(id);
            hypotheses.add(hypothesis);
            references.add(references(item));
        });
        if (ids.isEmpty()) {
            throw new UserInputException(file, null, "the outputs file is empty",
                    "check that this is the right file and that it was written completely; each line holds " + EXAMPLE);
        }
        List<String> warnings = new ArrayList<>();
        String empty = GenerationReader.emptyHypotheses(emptyAt, ids.size());
        if (empty != null) warnings.add(file + ": " + empty);
        unique.caseWarning().ifPresent(warnings::add);
        return new GenerationData(file, ids, hypotheses, references, warnings);
    }

    private JsonNode parse(String text) {
        JsonNode node;
        try {
            node = MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            // Jackson counts lines within the one line it was given; the file line is ours.
            throw error("not valid JSON: " + e.getOriginalMessage(), "write one complete JSON object per line", e);
        }
        if (!node.isObject()) {
            throw error("expected a JSON object, found " + kind(node), "write one object per line, such as " + EXAMPLE);
        }
        return node;
    }

    private String id(JsonNode item) {
        JsonNode id = item.get("id");
        if (id == null) throw error("field 'id' is missing", "give every item an id, such as \"id\": \"s1\"");
        if (id.isTextual()) return id.textValue();
        if (id.isIntegralNumber()) return id.asText();
        throw error("field 'id' must be a string or a whole number, found " + kind(id), "write the id as a string, such as \"s1\"");
    }

    private String hypothesis(JsonNode item) {
        JsonNode h = item.get("hypothesis");
        if (h == null) {
            throw error("field 'hypothesis' is missing",
                    "give every item its output text under \"hypothesis\" (\"\" for an empty output)");
        }
        if (!h.isTextual()) {
            throw error("field 'hypothesis' must be a string, found " + kind(h), "write the output text as a JSON string");
        }
        return h.textValue();
    }

    private List<String> references(JsonNode item) {
        JsonNode r = item.get("references");
        if (r == null) {
            throw error("field 'references' is missing", item.has("reference")
                    ? "rename 'reference' to 'references' and make it an array, such as \"references\": [\"...\"]"
                    : "give every item its reference texts as \"references\": [\"...\"]");
        }
        if (!r.isArray()) {
            throw error("field 'references' must be an array of strings, found " + kind(r),
                    "write it as an array, such as \"references\": [\"...\"], even for one reference");
        }
        if (r.isEmpty()) throw error("field 'references' is an empty array", "give every item at least one reference");
        List<String> out = new ArrayList<>();
        for (int k = 0; k < r.size(); k++) {
            JsonNode ref = r.get(k);
            if (!ref.isTextual()) {
                throw error("references[" + k + "] must be a string, found " + kind(ref), "write every reference as a JSON string");
            }
            if (Whitespace.isBlank(ref.textValue())) {
                throw error("references[" + k + "] is empty", "remove empty references; every item needs at least one non-empty reference");
            }
            out.add(ref.textValue());
        }
        return out;
    }

    private static String kind(JsonNode node) {
        String type = node.getNodeType().toString().toLowerCase(Locale.ROOT);
        return switch (type) {
            case "array", "object" -> "an " + type;
            case "null" -> "null";
            default -> "a " + type + " (" + node + ")";
        };
    }

    private UserInputException error(String problem, String fix) {
        return new UserInputException(file, "line " + line, problem, fix);
    }

    private UserInputException error(String problem, String fix, Throwable cause) {
        return new UserInputException(file, "line " + line, problem, fix, cause);
    }
}
