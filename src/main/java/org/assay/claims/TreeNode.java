package org.assay.claims;

import java.util.List;

/**
 * The parsed shape of a claims file before validation, with the 1-based line of every node.
 * YAML, JSON and CSV are all read into this tree so that one mapper validates them alike;
 * the parser libraries' own trees do not keep line numbers.
 */
sealed interface TreeNode {
    /** 1-based line where the node starts, or 0 when unknown. */
    int line();

    /** A key/value mapping; entries keep the file's order and the line of each key. */
    record Mapping(int line, List<Entry> entries) implements TreeNode {
        public Mapping {
            entries = List.copyOf(entries);
        }

        Entry entry(String key) {
            for (Entry e : entries) if (e.key().equals(key)) return e;
            return null;
        }
    }

    record Entry(String key, int keyLine, TreeNode value) {}

    record Sequence(int line, List<TreeNode> items) implements TreeNode {
        public Sequence {
            items = List.copyOf(items);
        }
    }

    /** A leaf: {@code text} is the raw text as written (null only for {@link Kind#NULL}). */
    record Scalar(int line, String text, Kind kind) implements TreeNode {}

    /** What the parser made of a scalar; numbers keep their original text. */
    enum Kind { STRING, NUMBER, BOOLEAN, NULL }
}
