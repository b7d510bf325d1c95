package org.assay.claims;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.assay.common.Limit;
import org.assay.common.UserInputException;

/**
 * Reads JSON with Jackson's streaming parser into a {@link TreeNode} with line numbers.
 * Number tokens keep their text exactly as written ({@link JsonParser#getText()}), so
 * {@code 87.40} stays "87.40". Nesting depth and size are capped by Jackson's
 * {@link StreamReadConstraints}, so a hostile file fails with a message, not a stack overflow.
 */
final class JsonTreeReader {
    /** A factory with the limits in force (they can change between commands). */
    private static JsonFactory factory() {
        return JsonFactory.builder()
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxNestingDepth(Limit.DEPTH.intValue())
                        .maxDocumentLength(Limit.CLAIMS_BYTES.value())
                        .build())
                .build();
    }

    private JsonTreeReader() {}

    static TreeNode read(Path file, String text) {
        try (JsonParser parser = factory().createParser(text)) {
            try {
                if (parser.nextToken() == null) {
                    throw new UserInputException(file, null, "the file is empty",
                            "write the claims as a JSON object with a \"tables\" array");
                }
                TreeNode root = readValue(file, parser);
                if (parser.nextToken() != null) {
                    throw new UserInputException(file, position(parser, parser.currentTokenLocation()),
                            "there is more after the end of the JSON document",
                            "keep one JSON object in the file");
                }
                return root;
            } catch (StreamConstraintsException e) {
                String m = String.valueOf(e.getOriginalMessage());
                Limit limit = m.contains("nesting depth") || m.contains("Depth") ? Limit.DEPTH : Limit.CLAIMS_BYTES;
                UserInputException u = limit.exceeded(file, position(parser, parser.currentLocation()),
                        "the JSON is " + (limit == Limit.DEPTH ? "nested too deeply (a claims file needs about six levels)"
                                : "too long"));
                u.initCause(e);
                throw u;
            } catch (JsonProcessingException e) {
                JsonLocation where = e.getLocation() != null ? e.getLocation() : parser.currentLocation();
                throw new UserInputException(file, position(parser, where),
                        "JSON syntax error: " + e.getOriginalMessage(),
                        "check commas, quotes and brackets near this point", e);
            }
        } catch (IOException e) {
            // Reading from a String: only parse errors, handled above, can occur here.
            throw new UncheckedIOException(e);
        }
    }

    private static String position(JsonParser parser, JsonLocation where) {
        String pointer = parser.getParsingContext().pathAsPointer().toString();
        String line = where == null || where.getLineNr() <= 0 ? null : "line " + where.getLineNr();
        if (pointer.isEmpty()) return line;
        return line == null ? pointer : pointer + " (" + line + ")";
    }

    /** Reads the value whose first token is current. Recursion depth is bounded by maxNestingDepth. */
    private static TreeNode readValue(Path file, JsonParser parser) throws IOException {
        int line = parser.currentTokenLocation().getLineNr();
        JsonToken token = parser.currentToken();
        switch (token) {
            case START_OBJECT -> {
                List<TreeNode.Entry> entries = new ArrayList<>();
                Map<String, Integer> firstLine = new HashMap<>();
                while (parser.nextToken() == JsonToken.FIELD_NAME) {
                    String key = parser.currentName();
                    int keyLine = parser.currentTokenLocation().getLineNr();
                    Integer earlier = firstLine.putIfAbsent(key, keyLine);
                    if (earlier != null) {
                        throw new UserInputException(file, position(parser, parser.currentTokenLocation()),
                                "the field \"" + key + "\" appears twice in one object (first at line " + earlier + ")",
                                "keep one of the two");
                    }
                    parser.nextToken();
                    entries.add(new TreeNode.Entry(key, keyLine, readValue(file, parser)));
                }
                return new TreeNode.Mapping(line, entries);
            }
            case START_ARRAY -> {
                List<TreeNode> items = new ArrayList<>();
                while (parser.nextToken() != JsonToken.END_ARRAY) items.add(readValue(file, parser));
                return new TreeNode.Sequence(line, items);
            }
            case VALUE_STRING -> { return new TreeNode.Scalar(line, parser.getText(), TreeNode.Kind.STRING); }
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> {
                return new TreeNode.Scalar(line, parser.getText(), TreeNode.Kind.NUMBER);
            }
            case VALUE_TRUE, VALUE_FALSE -> {
                return new TreeNode.Scalar(line, parser.getText(), TreeNode.Kind.BOOLEAN);
            }
            case VALUE_NULL -> { return new TreeNode.Scalar(line, null, TreeNode.Kind.NULL); }
            default -> throw new IllegalStateException("unexpected JSON token " + token);
        }
    }
}
