package org.assay.audit;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.util.JsonParserDelegate;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.ReadOptions;
import org.assay.data.regression.RegressionColumns;
import org.assay.data.retrieval.MatrixRanking;
import org.assay.data.retrieval.RetrievalInput;
import org.assay.data.retrieval.SentinelRule;
import org.assay.data.retrieval.TiePolicy;
import org.assay.metrics.Task;
import org.assay.stats.MultiplicityMethod;
import org.yaml.snakeyaml.error.MarkedYAMLException;

/**
 * Reads an audit file: the claims file and, per reproduced table row, the predictions and how
 * to read them. Paths are relative to the audit file's folder.
 *
 * <pre>
 * claims: claims.yaml
 * margin: 1.0            # percentage points (optional)
 * multiplicity: holm     # holm (default) or bh (optional)
 * paired_test: bootstrap # bootstrap (default) or randomization, for compared rows (optional)
 * reproductions:
 *   - table: T2
 *     row: "ChirpNet (ours)"
 *     predictions: predictions.csv
 *     manifest: manifest.txt        # optional
 *     truth: truth.csv              # optional
 *     positive: "1"                 # optional
 *     columns: {id: clip, label: species, prediction: predicted, score: score, probability_prefix: p_}
 *   - table: T4
 *     task: regression               # classification (default), retrieval or regression
 *     predictions: counts.csv
 *     columns: {id: image, target: true_count, prediction: predicted_count}
 *   - table: T3
 *     task: generation
 *     predictions: outputs.jsonl     # {"id", "hypothesis", "references": [...]} per line,
 *                                    # or a hypotheses file with references: [ref1.txt, ref2.txt]
 *   - table: T1
 *     task: retrieval
 *     ties: pessimistic              # optimistic | pessimistic (default) | average
 *     manifest: subsample.txt        # optional: the first direction's sampled query ids
 *     directions:                    # one or two
 *       - column: "Image→Text"       # claims whose column path starts with this
 *         scores: i2t.npy            # or ranked: lists.jsonl
 *         side: rows                 # rows (default) or columns hold the queries
 *         relevance: i2t.json        # or group_size: 5
 *         sentinel: -100             # auto (default), none, or the value</pre>
 */
public final class AuditFileReader {
    private static final Set<String> TOP = Set.of("claims", "margin", "reproductions", "templates", "multiplicity",
            "paired_test");
    private static final Set<String> REPRO = Set.of("table", "row", "task", "predictions", "manifest", "truth", "positive",
            "columns", "notes", "claim_notes");
    private static final Set<String> GENERATION = Set.of("table", "row", "task", "predictions", "references", "manifest",
            "notes", "claim_notes");
    private static final Set<String> RETRIEVAL = Set.of("table", "row", "task", "ties", "directions", "manifest",
            "notes", "claim_notes");
    private static final Set<String> DIRECTION = Set.of("column", "scores", "ranked", "side", "relevance", "group_size",
            "sentinel");
    /** Fields that hold one value (text or a number), never a list or a mapping. */
    private static final Set<String> SINGLE_VALUES = Set.of("claims", "margin", "templates", "multiplicity", "paired_test",
            "table", "row", "task", "predictions", "manifest", "truth", "positive", "ties", "column", "scores", "ranked",
            "side", "relevance", "group_size", "sentinel", "id", "label", "prediction", "score", "probability_prefix",
            "target");
    private static final Set<String> MAPPINGS = Set.of("columns", "claim_notes");
    private static final Set<String> COLUMNS = Set.of("id", "label", "prediction", "score", "probability_prefix");
    private static final Set<String> REGRESSION_COLUMNS = Set.of("id", "target", "prediction");

    /**
     * The parsed audit file: claims path, reproductions, a margin in points or null, the user's notes,
     * the folder of report templates to use (null: the bundled ones), and the multiplicity method and
     * paired test it names (null: not named).
     */
    public record AuditFile(Path claims, List<Reproduction> reproductions, Double marginPoints, UserNotes notes,
                            Path templates, MultiplicityMethod multiplicity, PairedMethod pairedMethod) {}

    private static final YAMLFactory YAML = new YAMLFactory();
    /** A key given twice would otherwise silently keep the last value. */
    private static final ObjectMapper MAPPER = new ObjectMapper(YAML)
            .enable(DeserializationFeature.FAIL_ON_READING_DUP_TREE_KEY);
    private static final java.util.regex.Pattern DUPLICATE = java.util.regex.Pattern.compile("^Duplicate field '([^']*)'");
    private static final String CORE_TAG = "tag:yaml.org,2002:";
    private static final Set<String> CORE_TAGS = Set.of(CORE_TAG + "str", CORE_TAG + "int", CORE_TAG + "float",
            CORE_TAG + "bool", CORE_TAG + "null", CORE_TAG + "map", CORE_TAG + "seq");

    private AuditFileReader() {}

    /**
     * Refuses YAML tags other than the core ones and aliases. Jackson drops tags and reads an alias
     * as its anchor's name, so {@code claims: !include other.yaml} or {@code predictions: *p} would
     * otherwise be read as something the user did not write.
     */
    private static final class GuardedYaml extends JsonParserDelegate {
        private final Path file;

        GuardedYaml(Path file, JsonParser parser) {
            super(parser);
            this.file = file;
        }

        @Override
        public JsonToken nextToken() throws IOException {
            JsonToken token = super.nextToken();
            if (token == null || token == JsonToken.FIELD_NAME || !(delegate instanceof YAMLParser yaml)) return token;
            String where = "line " + yaml.currentTokenLocation().getLineNr();
            if (yaml.isCurrentAlias()) {
                throw new UserInputException(file, where, "YAML aliases (*" + yaml.getText() + ") are not allowed in an audit file",
                        "write the value out instead of referring to an &anchor");
            }
            String tag = yaml.getTypeId();
            if (tag != null && !CORE_TAGS.contains(tag) && !tag.isEmpty()) {
                String shown = tag.startsWith(CORE_TAG) ? "!!" + tag.substring(CORE_TAG.length()) : "!" + tag;
                throw new UserInputException(file, where, "the YAML tag " + shown + " is not allowed in an audit file",
                        "remove the tag; an audit file holds only plain text, numbers, lists and mappings");
            }
            return token;
        }
    }

    public static AuditFile read(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new UserInputException(file, null, "audit file not found", "check the path");
        }
        JsonNode root;
        try (JsonParser parser = new GuardedYaml(file, YAML.createParser(file.toFile()))) {
            root = MAPPER.readTree(parser);
        } catch (UserInputException e) {
            throw e;
        } catch (JsonProcessingException e) {
            java.util.regex.Matcher duplicate = DUPLICATE.matcher(e.getOriginalMessage());
            if (duplicate.find()) {
                throw new UserInputException(file, line(e), "the key '" + duplicate.group(1)
                        + "' is given twice in one mapping", "keep one of the two");
            }
            String problem = e.getOriginalMessage().lines().findFirst().orElse("").strip();
            String position = line(e);
            if (e.getCause() instanceof MarkedYAMLException m) {
                problem = (m.getContext() == null ? "" : m.getContext() + ": ") + m.getProblem();
                if (m.getProblemMark() != null) position = "line " + (m.getProblemMark().getLine() + 1);
            }
            throw new UserInputException(file, position, "not a valid audit file: " + problem,
                    "check the indentation, colons and brackets near this line; see 'assay audit --help' for the format");
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read: " + e.getMessage(), "check the file");
        }
        if (root == null || !root.isObject()) {
            throw new UserInputException(file, null, "the audit file is empty or not a mapping",
                    "start it with 'claims: FILE' and 'reproductions:'");
        }
        Path base = file.toAbsolutePath().getParent();
        checkFields(file, root, TOP, "");
        Path claims = path(file, base, root, "claims", "");
        if (claims == null) throw new UserInputException(file, null, "missing 'claims:'", "name the claims file");
        Double margin = null;
        if (root.has("margin")) {
            if (!root.get("margin").isNumber()) {
                throw new UserInputException(file, "/margin", "margin must be a number of points", "for example margin: 1.0");
            }
            margin = root.get("margin").asDouble();
            if (!(margin > 0 && margin < 100)) {
                throw new UserInputException(file, "/margin", "margin " + root.get("margin").asText()
                        + " points is outside (0, 100)", "for example margin: 1.0 (one percentage point)");
            }
        }
        JsonNode list = root.get("reproductions");
        if (list == null || !list.isArray() || list.isEmpty()) {
            throw new UserInputException(file, "/reproductions", "no reproductions listed",
                    "add a list entry with at least 'predictions: FILE'");
        }
        List<Reproduction> out = new ArrayList<>();
        UserNotes notes = UserNotes.none();
        for (int i = 0; i < list.size(); i++) {
            JsonNode r = list.get(i);
            String at = "/reproductions/" + i;
            if (!r.isObject()) throw new UserInputException(file, at, "each reproduction must be a mapping", null);
            notes = notes.with(notes(file, r, at));
            Task task = r.has("task") ? task(file, at, r.get("task").asText()) : Task.CLASSIFICATION;
            if (task == Task.RETRIEVAL) {
                out.add(retrieval(file, base, r, at));
                continue;
            }
            if (task == Task.GENERATION) {
                out.add(generation(file, base, r, at));
                continue;
            }
            checkFields(file, r, REPRO, at);
            Path predictions = path(file, base, r, "predictions", at);
            if (predictions == null) throw new UserInputException(file, at, "missing 'predictions:'", "name the predictions file");
            if (task == Task.REGRESSION) {
                out.add(regression(file, r, at, predictions));
                continue;
            }
            if (task != Task.CLASSIFICATION) {
                throw new UserInputException(file, at + "/task", "task '" + task.id() + "' cannot be audited yet",
                        "use classification, retrieval, generation or regression");
            }
            ReadOptions o = ReadOptions.defaults();
            JsonNode cols = r.get("columns");
            String id = o.idColumn(), label = o.labelColumn(), pred = o.predictionColumn(), score = o.scoreColumn(),
                    prefix = o.probabilityPrefix();
            if (cols != null) {
                checkFields(file, cols, COLUMNS, at + "/columns");
                id = text(cols, "id", id);
                label = text(cols, "label", label);
                pred = text(cols, "prediction", pred);
                score = text(cols, "score", score);
                prefix = text(cols, "probability_prefix", prefix);
            }
            o = new ReadOptions(id, label, pred, score, prefix, text(r, "positive", null),
                    path(file, base, r, "manifest", at), path(file, base, r, "truth", at));
            out.add(new ClassificationReproduction(text(r, "table", null), text(r, "row", null), predictions, o));
        }
        Path templates = null;
        if (root.has("templates")) {
            templates = base.resolve(root.get("templates").asText()).normalize();
            if (!Files.isDirectory(templates)) {
                throw new UserInputException(file, "/templates", "template folder not found: " + templates,
                        "give the folder 'assay init' wrote (relative to the audit file), or remove the line");
            }
        }
        MultiplicityMethod multiplicity = null;
        if (root.has("multiplicity")) {
            try {
                multiplicity = MultiplicityMethod.parse(root.get("multiplicity").asText());
            } catch (UserInputException e) {
                throw new UserInputException(file, "/multiplicity", e.problem(), e.fix());
            }
        }
        PairedMethod paired = null;
        if (root.has("paired_test")) {
            try {
                paired = PairedMethod.parse(root.get("paired_test").asText());
            } catch (UserInputException e) {
                throw new UserInputException(file, "/paired_test", e.problem(), e.fix());
            }
        }
        return new AuditFile(claims, out, margin, notes, templates, multiplicity, paired);
    }

    private static Task task(Path file, String at, String text) {
        try {
            return Task.parse(text);
        } catch (UserInputException e) {
            throw new UserInputException(file, at + "/task", e.problem(), e.fix());
        }
    }

    private static Reproduction regression(Path file, JsonNode r, String at, Path predictions) {
        for (String f : List.of("manifest", "truth", "positive")) {
            if (r.has(f)) throw new UserInputException(file, at + "/" + f, "'" + f + "' is not used by regression", "remove it");
        }
        RegressionColumns d = RegressionColumns.defaults();
        String id = d.id(), target = d.target(), prediction = d.prediction();
        JsonNode cols = r.get("columns");
        if (cols != null) {
            checkFields(file, cols, REGRESSION_COLUMNS, at + "/columns");
            id = text(cols, "id", id);
            target = text(cols, "target", target);
            prediction = text(cols, "prediction", prediction);
        }
        return new RegressionReproduction(text(r, "table", null), text(r, "row", null), predictions,
                new RegressionColumns(id, target, prediction));
    }

    /** {@code notes:} (text) and {@code claim_notes:} (column path to text) of one reproduction. */
    private static UserNotes notes(Path file, JsonNode r, String at) {
        String table = text(r, "table", UserNotes.UNNAMED_TABLE);
        java.util.Map<String, String> tables = new java.util.LinkedHashMap<>();
        java.util.Map<String, String> claims = new java.util.LinkedHashMap<>();
        JsonNode n = r.get("notes");
        if (n != null && !n.isNull()) {
            if (!n.isTextual()) {
                throw new UserInputException(file, at + "/notes", "notes must be text", "write notes: \"...\" (a string)");
            }
            tables.put(table, n.asText());
        }
        JsonNode c = r.get("claim_notes");
        if (c != null && !c.isNull()) {
            if (!c.isObject()) {
                throw new UserInputException(file, at + "/claim_notes", "claim_notes must map column paths to text",
                        "for example claim_notes: {\"Accuracy\": \"computed with the released checkpoint\"}");
            }
            for (Iterator<String> it = c.fieldNames(); it.hasNext(); ) {
                String key = it.next();
                if (!c.get(key).isTextual()) {
                    throw new UserInputException(file, at + "/claim_notes/" + key, "a claim note must be text", null);
                }
                claims.put(key, c.get(key).asText());
            }
        }
        return new UserNotes(tables, claims.isEmpty() ? java.util.Map.of() : java.util.Map.of(table, claims));
    }

    /** A generation row: a JSON Lines file with references, or a hypotheses file and reference files. */
    private static Reproduction generation(Path file, Path base, JsonNode r, String at) {
        checkFields(file, r, GENERATION, at);
        Path outputs = path(file, base, r, "predictions", at);
        if (outputs == null) {
            throw new UserInputException(file, at, "missing 'predictions:'",
                    "name the outputs: a .jsonl file with id, hypothesis and references, or a hypotheses file");
        }
        List<Path> references = new ArrayList<>();
        JsonNode refs = r.get("references");
        if (refs != null) {
            if (!refs.isArray()) {
                throw new UserInputException(file, at + "/references", "references must be a list of files",
                        "for example references: [ref-a.txt, ref-b.txt]");
            }
            for (int i = 0; i < refs.size(); i++) {
                Path p = base.resolve(refs.get(i).asText()).normalize();
                if (!Files.isRegularFile(p)) {
                    throw new UserInputException(file, at + "/references/" + i, "file not found: " + p,
                            "check the path (relative to the audit file)");
                }
                references.add(p);
            }
        }
        try {
            return new GenerationReproduction(text(r, "table", null), text(r, "row", null), outputs, references,
                    path(file, base, r, "manifest", at));
        } catch (UserInputException e) {
            throw new UserInputException(file, at, e.problem(), e.fix());
        }
    }

    /** A retrieval row: one or two directions, each a score matrix or ranked lists with its relevance. */
    private static Reproduction retrieval(Path file, Path base, JsonNode r, String at) {
        checkFields(file, r, RETRIEVAL, at);
        TiePolicy ties = TiePolicy.DEFAULT;
        if (r.has("ties")) {
            try {
                ties = TiePolicy.parse(r.get("ties").asText());
            } catch (UserInputException e) {
                throw new UserInputException(file, at + "/ties", e.problem(), e.fix());
            }
        }
        JsonNode list = r.get("directions");
        if (list == null || !list.isArray() || list.isEmpty() || list.size() > 2) {
            throw new UserInputException(file, at + "/directions", "a retrieval reproduction lists one or two directions",
                    "add 'directions:' with, per direction, 'column:', 'scores:' and 'relevance:'");
        }
        List<RetrievalInput> inputs = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            JsonNode d = list.get(i);
            String dat = at + "/directions/" + i;
            if (!d.isObject()) throw new UserInputException(file, dat, "each direction must be a mapping", null);
            checkFields(file, d, DIRECTION, dat);
            String column = text(d, "column", null);
            if (column == null && list.size() == 2) {
                throw new UserInputException(file, dat + "/column", "with two directions each needs 'column:'",
                        "give the first element of the column path of the claims it serves, for example column: \"Image→Text\"");
            }
            MatrixRanking.Side side = MatrixRanking.Side.ROWS;
            if (d.has("side")) {
                String sideText = d.get("side").asText().strip().toLowerCase(java.util.Locale.ROOT);
                if (!sideText.equals("rows") && !sideText.equals("columns")) {
                    throw new UserInputException(file, dat + "/side", "side is '" + sideText + "'",
                            "use rows (queries are the matrix rows, the default) or columns");
                }
                side = sideText.equals("rows") ? MatrixRanking.Side.ROWS : MatrixRanking.Side.COLUMNS;
            }
            Integer group = null;
            if (d.has("group_size")) {
                if (!d.get("group_size").canConvertToInt()) {
                    throw new UserInputException(file, dat + "/group_size", "group_size must be a whole number", "for example group_size: 5");
                }
                group = d.get("group_size").asInt();
            }
            SentinelRule sentinel = SentinelRule.detect();
            if (d.has("sentinel")) sentinel = sentinel(file, dat + "/sentinel", d.get("sentinel").asText());
            try {
                inputs.add(new RetrievalInput(column == null ? "queries" : column, path(file, base, d, "scores", dat), side,
                        path(file, base, d, "ranked", dat), path(file, base, d, "relevance", dat), false, group, ties, sentinel));
            } catch (UserInputException e) {
                throw new UserInputException(file, dat, e.problem(), e.fix());
            }
        }
        boolean prefixed = inputs.size() == 2 || text(list.get(0), "column", null) != null;
        return new RetrievalReproduction(text(r, "table", null), text(r, "row", null), inputs, prefixed,
                path(file, base, r, "manifest", at));
    }

    /** "auto" (detect a repeated minimum), "none", or the sentinel value itself. */
    public static SentinelRule sentinel(Path file, String at, String text) {
        String t = text.strip().toLowerCase(java.util.Locale.ROOT);
        if (t.equals("auto")) return SentinelRule.detect();
        if (t.equals("none")) return SentinelRule.none();
        try {
            return SentinelRule.value(Double.parseDouble(t));
        } catch (NumberFormatException e) {
            throw new UserInputException(file, at, "sentinel is '" + text + "'",
                    "use auto (the default), none, or the value that fills unscored candidates, such as -100");
        }
    }

    private static void checkFields(Path file, JsonNode node, Set<String> allowed, String at) {
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String f = it.next();
            if (!allowed.contains(f)) {
                throw new UserInputException(file, at + "/" + f, "unknown field '" + f + "'",
                        "allowed here: " + String.join(", ", new java.util.TreeSet<>(allowed)));
            }
            // Jackson reads a list or mapping as the text "" where one value belongs, which would name the
            // audit file's own folder as a path or an empty column name: refuse the shape here instead.
            JsonNode v = node.get(f);
            if (SINGLE_VALUES.contains(f) && v.isContainerNode()) {
                throw new UserInputException(file, at + "/" + f, f + " is a " + (v.isArray() ? "list" : "mapping")
                        + " where one value belongs", "write one value, for example " + f + ": " + example(f));
            }
            if (MAPPINGS.contains(f) && !v.isObject() && !v.isNull()) {
                throw new UserInputException(file, at + "/" + f, f + " must be a mapping of names to values",
                        "for example " + f + ": " + (f.equals("columns") ? "{id: clip, label: species}"
                                : "{\"Accuracy\": \"a note\"}"));
            }
        }
    }

    private static String example(String field) {
        return switch (field) {
            case "claims" -> "claims.yaml";
            case "predictions", "truth", "scores", "ranked", "relevance" -> "predictions.csv";
            case "manifest" -> "manifest.txt";
            case "margin" -> "1.0";
            default -> "\"...\"";
        };
    }

    private static String text(JsonNode n, String field, String fallback) {
        JsonNode v = n.get(field);
        return v == null || v.isNull() ? fallback : v.asText();
    }

    private static Path path(Path file, Path base, JsonNode n, String field, String at) {
        String t = text(n, field, null);
        if (t == null) return null;
        Path p = base.resolve(t).normalize();
        if (!Files.isRegularFile(p)) {
            throw new UserInputException(file, at + "/" + field, "file not found: " + p, "check the path (relative to the audit file)");
        }
        return p;
    }

    private static String line(JsonProcessingException e) {
        return e.getLocation() == null ? null : "line " + e.getLocation().getLineNr();
    }
}
