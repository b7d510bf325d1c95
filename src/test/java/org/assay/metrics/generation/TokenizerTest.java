package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;

/**
 * The tokenizers. 13a is compared with NLTK 3.8's NISTTokenizer (non-international mode), which
 * implements the mteval-v13a rules, on every invented text of the reference corpora; the places
 * where NLTK departs from the mteval rules are tested one by one.
 */
class TokenizerTest {

    @Test
    void v13aMatchesNltkNistTokenizerOnTheReferenceTexts() {
        // generation_reference.py: NISTTokenizer().tokenize(text, lowercase=...), NLTK 3.8
        JsonNode cases = GenerationReference.DOC.get("tokenizer").get("cases");
        assertThat(cases.size()).isGreaterThan(200);
        for (JsonNode c : cases) {
            String text = c.get("text").asText();
            boolean lower = c.get("lowercase").asBoolean();
            assertThat(Tokenizer.V13A.tokens(text, lower)).as("%s (lowercase=%s)", text, lower)
                    .isEqualTo(GenerationReference.strings(c.get("nltk")));
        }
    }

    @Test
    void v13aRulesOnHandExamples() {
        // the mteval-v13a rules (common practice): period and comma stay inside numbers, a dash after a digit splits
        assertThat(Tokenizer.V13A.tokens("Costs $1,200.50 in 2019-2020, e-mail: x.y", false))
                .containsExactly("Costs", "$", "1,200.50", "in", "2019", "-", "2020", ",", "e-mail", ":", "x", ".", "y");
        assertThat(Tokenizer.V13A.tokens("Ends 3.", false)).containsExactly("Ends", "3", ".");
        assertThat(Tokenizer.V13A.tokens("It's &quot;OK&quot; &amp; fine <skipped>", true))
                .containsExactly("it's", "\"", "ok", "\"", "&", "fine");
    }

    @Test
    void v13aDivergesFromNltkOnDoubleEscapesOtherEntitiesAndLineEndHyphens() {
        JsonNode divergent = GenerationReference.DOC.get("tokenizer").get("divergent");
        // mteval-v13a unescapes &amp; before &lt; and &gt;, so "&amp;lt;" becomes "<" (the script's
        // order of substitutions); NLTK 3.8 unescapes once, with XML rules.
        assertDiverges(divergent.get(0), List.of("<", "b", ">", "is", "escaped", "twice"));
        // mteval-v13a knows only &quot; &amp; &lt; &gt;; NLTK also unescapes &apos; &#124; &#91; &#93;
        assertDiverges(divergent.get(1), List.of("it", "&", "apos", ";", "s", "here"));
        assertDiverges(divergent.get(2), List.of("a", "&", "#", "124", ";", "b", "&", "#", "91", ";", "c", "&", "#", "93", ";"));
        // mteval-v13a joins end-of-line hyphenation ("-\n" removed); NLTK 3.8 keeps "co-"
        assertDiverges(divergent.get(3), List.of("a", "cooperative", "line", "break"));
    }

    private static void assertDiverges(JsonNode c, List<String> ours) {
        String text = c.get("text").asText();
        assertThat(Tokenizer.V13A.tokens(text, false)).as(text).isEqualTo(ours);
        assertThat(GenerationReference.strings(c.get("nltk"))).as("NLTK on " + text).isNotEqualTo(ours);
    }

    @Test
    void noneSplitsOnUnicodeWhitespaceLikePythonSplit() {
        // Python 3: "a\u00a0b\u3000c\td  e".split() == ['a', 'b', 'c', 'd', 'e']
        assertThat(Tokenizer.NONE.tokens("a\u00a0b\u3000c\td  e", false)).containsExactly("a", "b", "c", "d", "e");
        assertThat(Tokenizer.NONE.tokens(" The Cat. ", true)).containsExactly("the", "cat.");
        assertThat(Tokenizer.NONE.tokens("   ", false)).isEmpty();
    }

    @Test
    void charGivesEveryNonSpaceCodePoint() {
        assertThat(Tokenizer.CHAR.tokens("Ab c\u00a0\uD83D\uDE00!", false)).containsExactly("A", "b", "c", "\uD83D\uDE00", "!");
        assertThat(Tokenizer.CHAR.tokens("ÄB", true)).containsExactly("ä", "b");
    }

    @Test
    void lowercasingHappensAfterUnescapingIn13a() {
        // as in the mteval rules: "&QUOT;" is not an entity, so lower-casing leaves "&", "quot", ";"
        assertThat(Tokenizer.V13A.tokens("A&QUOT;b", true)).containsExactly("a", "&", "quot", ";", "b");
    }

    @Test
    void unknownTokenizerIsAUsageError() {
        assertThatThrownBy(() -> Tokenizer.parse("14")).isInstanceOf(UserInputException.class)
                .hasMessageContaining("unknown tokenizer '14'").hasMessageContaining("none, 13a or char");
        assertThat(Tokenizer.parse(" 13A ")).isEqualTo(Tokenizer.V13A);
    }
}
