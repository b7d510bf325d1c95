package org.assay.metrics.generation;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * WordNet's base-form search (Morphy: WordNet 3.0's morphy(7WN) exception lists and rules of
 * detachment) in the exact variant NLTK 3.8 uses for {@code wordnet.synsets(word)}
 * ({@code WordNetCorpusReader._morphy}):
 * <ol>
 *   <li>If the word is in the part of speech's exception list, the answer is those of the word and
 *       its listed base forms that are in the index, and nothing else.</li>
 *   <li>Otherwise every rule whose suffix the word ends with is applied once; the word itself and
 *       those forms that are in the index are the answer, if any are.</li>
 *   <li>Otherwise the rules are applied again to every form of the previous round until some form
 *       is in the index or no rule applies.</li>
 * </ol>
 * NLTK's noun rules add "ves" -> "f" to the man page's table; it is kept here, since the aim is
 * NLTK's synonym sets. Written here, not taken from extJWNL, because extJWNL's morphological
 * processor combines the steps differently (it also tokenizes collocations and continues past the
 * exception list); the rule set is small and published.
 */
final class Morphy {
    /** A part of speech's index and exception list. */
    interface Lexicon {
        /** Whether {@code form} is a lemma of the index. */
        boolean inIndex(String form);

        /** The base forms the exception list gives for {@code form}, or null. */
        List<String> exceptions(String form);
    }

    /** A suffix and its replacement. */
    record Rule(String suffix, String ending) {}

    static final List<Rule> NOUN = List.of(new Rule("s", ""), new Rule("ses", "s"), new Rule("ves", "f"),
            new Rule("xes", "x"), new Rule("zes", "z"), new Rule("ches", "ch"), new Rule("shes", "sh"),
            new Rule("men", "man"), new Rule("ies", "y"));
    static final List<Rule> VERB = List.of(new Rule("s", ""), new Rule("ies", "y"), new Rule("es", "e"),
            new Rule("es", ""), new Rule("ed", "e"), new Rule("ed", ""), new Rule("ing", "e"), new Rule("ing", ""));
    static final List<Rule> ADJECTIVE = List.of(new Rule("er", ""), new Rule("est", ""), new Rule("er", "e"),
            new Rule("est", "e"));
    static final List<Rule> ADVERB = List.of();

    private Morphy() {}

    /** The base forms of {@code word} in one part of speech, given its rules and lexicon. */
    static List<String> baseForms(String word, List<Rule> rules, Lexicon lexicon) {
        List<String> listed = lexicon.exceptions(word);
        if (listed != null) {
            List<String> candidates = new ArrayList<>();
            candidates.add(word);
            candidates.addAll(listed);
            return inIndex(candidates, lexicon);
        }
        Set<String> forms = apply(List.of(word), rules);
        List<String> first = new ArrayList<>();
        first.add(word);
        first.addAll(forms);
        List<String> found = inIndex(first, lexicon);
        while (found.isEmpty() && !forms.isEmpty()) {
            // NLTK keeps repeated forms between rounds; dropping them changes no answer and keeps
            // the rounds small for long runs of one letter
            forms = apply(forms, rules);
            found = inIndex(forms, lexicon);
        }
        return found;
    }

    private static Set<String> apply(Iterable<String> forms, List<Rule> rules) {
        Set<String> out = new LinkedHashSet<>();
        for (String f : forms) {
            for (Rule r : rules) {
                if (f.endsWith(r.suffix())) out.add(f.substring(0, f.length() - r.suffix().length()) + r.ending());
            }
        }
        return out;
    }

    private static List<String> inIndex(Iterable<String> forms, Lexicon lexicon) {
        Set<String> out = new LinkedHashSet<>();
        for (String f : forms) if (lexicon.inIndex(f)) out.add(f);
        return new ArrayList<>(out);
    }
}
