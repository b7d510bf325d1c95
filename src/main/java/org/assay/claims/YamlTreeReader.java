package org.assay.claims;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.assay.common.UserInputException;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.composer.Composer;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.events.CollectionStartEvent;
import org.yaml.snakeyaml.events.Event;
import org.yaml.snakeyaml.events.ScalarEvent;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;
import org.yaml.snakeyaml.parser.Parser;
import org.yaml.snakeyaml.parser.ParserImpl;
import org.yaml.snakeyaml.reader.ReaderException;
import org.yaml.snakeyaml.reader.StreamReader;
import org.yaml.snakeyaml.resolver.Resolver;

/**
 * Reads YAML with SnakeYAML's node API (composition only: no objects are ever constructed
 * from tags) into a {@link TreeNode}. SnakeYAML's {@link LoaderOptions} limit aliases, nesting
 * and size; on top of that, explicit tags other than the core ones are refused, and the
 * expanded tree is counted so that aliases within the alias limit cannot blow up either.
 */
final class YamlTreeReader {
    private static final String CORE = "tag:yaml.org,2002:";
    private static final Set<String> ALLOWED_EXPLICIT_TAGS = Set.of(
            "!", CORE + "str", CORE + "int", CORE + "float", CORE + "bool", CORE + "null",
            CORE + "map", CORE + "seq");

    private YamlTreeReader() {}

    static TreeNode read(Path file, String text) {
        LoaderOptions options = new LoaderOptions();
        options.setMaxAliasesForCollections(InputLimits.MAX_COLLECTION_ALIASES);
        options.setNestingDepthLimit(InputLimits.MAX_DEPTH);
        options.setCodePointLimit(InputLimits.MAX_FILE_BYTES);
        options.setAllowRecursiveKeys(false);
        GuardedParser parser = new GuardedParser(new ParserImpl(new StreamReader(text), options), file);
        Composer composer = new Composer(parser, new Resolver(), options);
        Node root;
        try {
            if (!composer.checkNode()) {
                throw new UserInputException(file, null, "the file is empty",
                        "write the claims as a mapping with a tables: list");
            }
            root = composer.getNode();
            if (composer.checkNode()) {
                int line = parser.peekEvent().getStartMark().getLine() + 1;
                throw new UserInputException(file, "line " + line, "the file holds more than one YAML document",
                        "keep one document: remove the '---' separator or split the file in two");
            }
        } catch (MarkedYAMLException e) {
            Mark mark = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
            int line = mark != null ? mark.getLine() + 1 : parser.lastLine();
            String context = e.getContext() == null ? "" : e.getContext() + ": ";
            throw new UserInputException(file, "line " + line, "YAML syntax error: " + context + e.getProblem(),
                    "check indentation, colons and quotes on this line and the one before", e);
        } catch (ReaderException e) {
            int line = lineOfCodePoint(text, e.getPosition());
            throw new UserInputException(file, "line " + line,
                    String.format("the file contains the control character U+%04X", e.getCodePoint()),
                    "remove it; claims files are plain text", e);
        } catch (YAMLException e) {
            throw limitError(file, parser.lastLine(), e);
        }
        return new Converter(file).convert(root, 1);
    }

    /** SnakeYAML reports its limits without a position; the parser's last event gives the line. */
    private static UserInputException limitError(Path file, int line, YAMLException e) {
        String m = String.valueOf(e.getMessage());
        String position = line > 0 ? "line " + line : null;
        if (m.startsWith("Number of aliases")) {
            return new UserInputException(file, position,
                    "too many YAML aliases to mappings or sequences (more than the limit of "
                            + InputLimits.MAX_COLLECTION_ALIASES + "); the file may be an alias bomb",
                    "write the values out instead of repeating them with *aliases", e);
        }
        if (m.startsWith("Nesting Depth")) {
            return new UserInputException(file, position,
                    "mappings and sequences are nested deeper than the limit of " + InputLimits.MAX_DEPTH + " levels",
                    "a claims file needs about six levels; check the indentation", e);
        }
        if (m.contains("code points")) {
            return new UserInputException(file, position,
                    "the file is larger than the limit of " + InputLimits.MAX_FILE_BYTES + " characters",
                    "split the claims into smaller files", e);
        }
        return new UserInputException(file, position, "cannot read the YAML: " + m,
                "check the YAML syntax near this line", e);
    }

    private static int lineOfCodePoint(String text, int codePointIndex) {
        int line = 1;
        int i = 0;
        for (int cp = 0; i < text.length() && cp < codePointIndex; cp++) {
            if (text.charAt(i) == '\n') line++;
            i += Character.charCount(text.codePointAt(i));
        }
        return line;
    }

    /** Passes events through, remembering the last line and refusing custom tags where they appear. */
    private static final class GuardedParser implements Parser {
        private final Parser inner;
        private final Path file;
        private int lastLine;

        GuardedParser(Parser inner, Path file) {
            this.inner = inner;
            this.file = file;
        }

        int lastLine() { return lastLine; }

        @Override public boolean checkEvent(Event.ID choice) { return inner.checkEvent(choice); }

        @Override public Event peekEvent() { return inner.peekEvent(); }

        @Override
        public Event getEvent() {
            Event event = inner.getEvent();
            if (event.getStartMark() != null) lastLine = event.getStartMark().getLine() + 1;
            String tag = null;
            if (event instanceof ScalarEvent s) tag = s.getTag();
            else if (event instanceof CollectionStartEvent c) tag = c.getTag();
            if (tag != null && !ALLOWED_EXPLICIT_TAGS.contains(tag)) {
                String shown = tag.startsWith(CORE) ? "!!" + tag.substring(CORE.length())
                        : tag.startsWith("!") ? tag : "!<" + tag + ">";
                throw new UserInputException(file, "line " + lastLine, "the YAML tag " + shown + " is not allowed",
                        "remove the tag; a claims file holds only plain strings, numbers, lists and mappings");
            }
            return event;
        }
    }

    /** Copies SnakeYAML nodes into a TreeNode, counting nodes as aliases get expanded. */
    private static final class Converter {
        private final Path file;
        private int nodes;
        /** Line of the top-level entry being converted: where an expansion bomb is set off. */
        private int topLine;

        Converter(Path file) { this.file = file; }

        TreeNode convert(Node node, int depth) {
            int line = node.getStartMark().getLine() + 1;
            if (depth == 2) topLine = line;
            if (++nodes > InputLimits.MAX_EXPANDED_NODES) {
                throw new UserInputException(file, "line " + topLine,
                        "the YAML expands to more than the limit of " + InputLimits.MAX_EXPANDED_NODES
                                + " values through aliases; the file may be an alias bomb",
                        "write the values out instead of repeating them with *aliases");
            }
            if (depth > InputLimits.MAX_DEPTH) {
                throw new UserInputException(file, "line " + line,
                        "values are nested deeper than the limit of " + InputLimits.MAX_DEPTH
                                + " levels (an alias may refer to a node that contains it)",
                        "remove the *alias that points back into its own anchor");
            }
            if (node instanceof ScalarNode s) {
                TreeNode.Kind kind = kindOf(s.getTag());
                return new TreeNode.Scalar(line, kind == TreeNode.Kind.NULL ? null : s.getValue(), kind);
            }
            if (node instanceof SequenceNode seq) {
                List<TreeNode> items = new ArrayList<>();
                for (Node item : seq.getValue()) items.add(convert(item, depth + 1));
                return new TreeNode.Sequence(line, items);
            }
            MappingNode map = (MappingNode) node;
            List<TreeNode.Entry> entries = new ArrayList<>();
            Map<String, Integer> firstLine = new HashMap<>();
            for (NodeTuple tuple : map.getValue()) {
                Node keyNode = tuple.getKeyNode();
                int keyLine = keyNode.getStartMark().getLine() + 1;
                if (!(keyNode instanceof ScalarNode keyScalar)) {
                    throw new UserInputException(file, "line " + keyLine, "a mapping key is not a plain name",
                            "write keys as plain names such as metric:");
                }
                String key = keyScalar.getValue();
                Integer earlier = firstLine.putIfAbsent(key, keyLine);
                if (earlier != null) {
                    throw new UserInputException(file, "line " + keyLine,
                            "the field " + key + " appears twice in one mapping (first at line " + earlier + ")",
                            "keep one of the two");
                }
                entries.add(new TreeNode.Entry(key, keyLine, convert(tuple.getValueNode(), depth + 1)));
            }
            return new TreeNode.Mapping(line, entries);
        }

        private static TreeNode.Kind kindOf(Tag tag) {
            if (Tag.NULL.equals(tag)) return TreeNode.Kind.NULL;
            if (Tag.BOOL.equals(tag)) return TreeNode.Kind.BOOLEAN;
            if (Tag.INT.equals(tag) || Tag.FLOAT.equals(tag)) return TreeNode.Kind.NUMBER;
            return TreeNode.Kind.STRING;
        }
    }
}
