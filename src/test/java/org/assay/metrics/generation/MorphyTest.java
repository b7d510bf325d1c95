package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The search order of NLTK 3.8's WordNetCorpusReader._morphy on a tiny invented lexicon, cases
 * hand-derived from that function's definition (exception list first and alone; then one round
 * of rules with the word itself; then further rounds until something is found).
 */
class MorphyTest {
    private static Morphy.Lexicon lexicon(Set<String> index, Map<String, List<String>> exceptions) {
        return new Morphy.Lexicon() {
            @Override public boolean inIndex(String form) { return index.contains(form); }
            @Override public List<String> exceptions(String form) { return exceptions.get(form); }
        };
    }

    @Test
    void anExceptionEntryIsTheWholeAnswer() {
        // "geese" is listed: only it and its listed base forms are tried, never the rules' "geese" -> "gees"
        Morphy.Lexicon lex = lexicon(Set.of("goose", "gees", "geese"), Map.of("geese", List.of("goose")));
        assertThat(Morphy.baseForms("geese", Morphy.NOUN, lex)).containsExactly("geese", "goose");
    }

    @Test
    void theFirstRoundKeepsTheWordAndEveryRuleThatHits() {
        // "boxes" -> rules give "boxe" (s), "box" (xes); the word itself is tried first
        Morphy.Lexicon lex = lexicon(Set.of("boxes", "box"), Map.of());
        assertThat(Morphy.baseForms("boxes", Morphy.NOUN, lex)).containsExactly("boxes", "box");
        // verbs: "loved" -> "love" (ed -> e) and "lov" (ed -> "")
        assertThat(Morphy.baseForms("loved", Morphy.VERB, lexicon(Set.of("love", "lov"), Map.of())))
                .containsExactly("love", "lov");
    }

    @Test
    void laterRoundsRunOnlyWhenNothingWasFound() {
        // "dresses": round 1 gives "dresse" (s), "dress" (ses); neither is in the index here, so
        // round 2 applies the rules again: "dresse" -> "dress"? no rule; "dress" -> "dres" (s)
        Morphy.Lexicon lex = lexicon(Set.of("dres"), Map.of());
        assertThat(Morphy.baseForms("dresses", Morphy.NOUN, lex)).containsExactly("dres");
        // a hit in round 1 stops the search even though round 2 would find more
        Morphy.Lexicon both = lexicon(Set.of("dress", "dres"), Map.of());
        assertThat(Morphy.baseForms("dresses", Morphy.NOUN, both)).containsExactly("dress");
        // adverbs have no rules: only the word itself
        assertThat(Morphy.baseForms("fastest", Morphy.ADVERB, lexicon(Set.of("fast"), Map.of()))).isEmpty();
        // a long run of one letter ends (the forms shrink every round)
        assertThat(Morphy.baseForms("s".repeat(60), Morphy.NOUN, lexicon(Set.of(), Map.of()))).isEmpty();
    }
}
