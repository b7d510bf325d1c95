package org.assay.data.generation;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.HashSet;
import java.util.Set;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;

/** Whitespace as Python's str.isspace() and str.split() see it (the reference libraries' texts). */
class WhitespaceTest {
    private static final JsonNode DOC = ReferenceData.load("generation.json");

    @Test
    void everyCodePointAgreesWithPythonIsspace() {
        // Python 3.11 str.isspace(), every code point (generation_reference.py, "whitespace")
        Set<Integer> python = new HashSet<>();
        DOC.get("whitespace").forEach(n -> python.add(n.asInt()));
        for (int cp = 0; cp <= Character.MAX_CODE_POINT; cp++) {
            assertThat(Whitespace.isSpace(cp)).as("U+%04X", cp).isEqualTo(python.contains(cp));
        }
        assertThat(python).contains(0xA0, 0x2007, 0x202F, 0x85, 0x1C, 0x3000).doesNotContain(0x200B, 0xFEFF);
    }

    @Test
    void splitRemoveAndBlankFollowPythonSplit() {
        // Python: "\u00a0a\tb\u3000 c\u2028".split() == ['a', 'b', 'c']  (common practice, str.split docs)
        assertThat(Whitespace.split("\u00a0a\tb\u3000 c\u2028")).containsExactly("a", "b", "c");
        assertThat(Whitespace.split(" \t ")).isEmpty();
        assertThat(Whitespace.split("a\u200Bb")).containsExactly("a\u200Bb");   // zero-width space is not whitespace
        assertThat(Whitespace.remove(" a b\u00a0c\n")).isEqualTo("abc");
        assertThat(Whitespace.isBlank("\u00a0\u2003")).isTrue();
        assertThat(Whitespace.isBlank("\u00a0.")).isFalse();
        assertThat(Whitespace.split("x\uD83D\uDE00 y")).containsExactly("x\uD83D\uDE00", "y");   // a surrogate pair stays whole
    }
}
