package org.assay.metrics.generation;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import net.sf.extjwnl.JWNLException;
import net.sf.extjwnl.data.Exc;
import net.sf.extjwnl.data.IndexWord;
import net.sf.extjwnl.data.POS;
import net.sf.extjwnl.data.Synset;
import net.sf.extjwnl.data.Word;
import net.sf.extjwnl.dictionary.Dictionary;

/**
 * A word's WordNet synonyms as METEOR's synonym stage sees them in NLTK 3.8
 * ({@code nltk.translate.meteor_score._enum_wordnetsyn_match}): the lemma names of every synset of
 * every base form {@link Morphy} finds for the word, in all four parts of speech
 * ({@code wordnet.synsets(word)}), without multi-word lemmas, plus the word itself. Lemma names keep
 * their case ("Ship" would not match "ship"); adjective markers such as "(p)" are not part of them.
 *
 * <p>The data is Princeton WordNet 3.0 as packaged by extJWNL ({@code extjwnl-data-wn30}); its
 * lemmas and synsets agree with Debian's WordNet 3.0 that the reference script reads. It is loaded
 * on first use, once per process (about 0.3 s and some 40 MB), and lookups are serialized, since
 * extJWNL's file-backed dictionary is not documented as thread-safe. Answers are remembered.
 */
final class WordNetSynonyms {
    /** The WordNet version this data is, as it appears in settings lines. */
    static final String VERSION = "3.0";

    private static final POS[] PARTS_OF_SPEECH = {POS.NOUN, POS.VERB, POS.ADJECTIVE, POS.ADVERB};

    private final Dictionary dictionary;
    private final Map<POS, Map<String, List<String>>> exceptions;
    private final Map<String, Set<String>> answers = new ConcurrentHashMap<>();

    private WordNetSynonyms(Dictionary dictionary, Map<POS, Map<String, List<String>>> exceptions) {
        this.dictionary = dictionary;
        this.exceptions = exceptions;
    }

    /** Loaded by the JVM on first access, once: the holder idiom makes this lazy and thread-safe. */
    private static final class Holder {
        static final WordNetSynonyms INSTANCE = load();
    }

    static WordNetSynonyms get() { return Holder.INSTANCE; }

    private static WordNetSynonyms load() {
        try {
            Dictionary d = Dictionary.getDefaultResourceInstance();
            Map<POS, Map<String, List<String>>> exc = new EnumMap<>(POS.class);
            for (POS pos : PARTS_OF_SPEECH) exc.put(pos, exceptionList(d, pos));
            return new WordNetSynonyms(d, exc);
        } catch (JWNLException e) {
            throw new IllegalStateException("the bundled WordNet 3.0 data cannot be read: " + e.getMessage(), e);
        }
    }

    /**
     * The exception list of one part of speech, read line by line. A derived form listed on two
     * lines (noun.exc has four, adj.exc one) keeps the last line, as NLTK's dictionary does;
     * extJWNL's {@code getException} would return whichever line its binary search meets.
     */
    private static Map<String, List<String>> exceptionList(Dictionary d, POS pos) throws JWNLException {
        Map<String, List<String>> out = new HashMap<>();
        for (Iterator<Exc> it = d.getExceptionIterator(pos); it.hasNext(); ) {
            Exc e = it.next();
            // extJWNL shows the file's underscores as spaces; Morphy works on the file's spelling
            List<String> bases = new ArrayList<>();
            for (String b : e.getExceptions()) bases.add(b.replace(' ', '_'));
            out.put(e.getLemma().replace(' ', '_'), List.copyOf(bases));
        }
        return out;
    }

    /** The Princeton version number of the loaded data (3.0). */
    double versionNumber() { return dictionary.getVersion().getNumber(); }

    /** The word's synonyms, the word included (see the class comment). */
    Set<String> synonyms(String word) {
        return answers.computeIfAbsent(word, this::lookUp);
    }

    private Set<String> lookUp(String word) {
        Set<String> out = new HashSet<>();
        out.add(word);
        // no lemma contains a space or control character, and extJWNL would trim them off the query
        if (word.isEmpty() || word.chars().anyMatch(c -> c <= ' ')) return out;
        synchronized (this) {
            try {
                for (POS pos : PARTS_OF_SPEECH) {
                    for (String form : baseForms(word, pos)) {
                        IndexWord entry = dictionary.getIndexWord(pos, form);
                        for (Synset synset : entry.getSenses()) {
                            for (Word w : synset.getWords()) {
                                if (w.getLemma().indexOf(' ') < 0) out.add(w.getLemma());
                            }
                        }
                    }
                }
            } catch (JWNLException e) {
                throw new IllegalStateException("WordNet lookup of '" + word + "' failed: " + e.getMessage(), e);
            }
        }
        return Collections.unmodifiableSet(out);
    }

    /** Morphy's base forms of {@code word} in one part of speech (NLTK's {@code _morphy}). */
    synchronized List<String> baseForms(String word, POS pos) {
        Map<String, List<String>> exc = exceptions.get(pos);
        return Morphy.baseForms(word, rules(pos), new Morphy.Lexicon() {
            @Override public boolean inIndex(String form) {
                try {
                    return !form.isEmpty() && dictionary.getIndexWord(pos, form) != null;
                } catch (JWNLException e) {
                    throw new IllegalStateException("WordNet lookup of '" + form + "' failed: " + e.getMessage(), e);
                }
            }

            @Override public List<String> exceptions(String form) { return exc.get(form); }
        });
    }

    private static List<Morphy.Rule> rules(POS pos) {
        return switch (pos) {
            case NOUN -> Morphy.NOUN;
            case VERB -> Morphy.VERB;
            case ADJECTIVE -> Morphy.ADJECTIVE;
            case ADVERB -> Morphy.ADVERB;
        };
    }
}
