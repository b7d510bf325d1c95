package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import net.sf.extjwnl.data.POS;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;

/**
 * Synonym sets and Morphy base forms from extJWNL's WordNet 3.0 against NLTK 3.8 reading Debian's
 * WordNet 3.0 (wordnet.synsets as meteor_score uses it, and WordNetCorpusReader._morphy), for the
 * words of src/test/reference/meteor_rouge_reference.py: the corpus's stems, a seeded sample of
 * lemmas and inflected forms, and words that exercise exception lists listed twice, adjective
 * markers, capitalised lemma names and multi-word lemmas.
 */
class WordNetSynonymsTest {
    private static final JsonNode WORDS = ReferenceData.load("meteor_rouge.json").get("wordnet");
    private static final Map<String, POS> POS_BY_KEY = Map.of("n", POS.NOUN, "v", POS.VERB, "a", POS.ADJECTIVE, "r", POS.ADVERB);

    @Test
    void synonymSetsAreNltks() {
        WordNetSynonyms wn = WordNetSynonyms.get();
        List<String> wrong = new ArrayList<>();
        for (Iterator<String> it = WORDS.fieldNames(); it.hasNext(); ) {
            String w = it.next();
            TreeSet<String> expected = new TreeSet<>();
            WORDS.get(w).get("synonyms").forEach(x -> expected.add(x.asText()));
            if (!new TreeSet<>(wn.synonyms(w)).equals(expected)) wrong.add(w + ": " + new TreeSet<>(wn.synonyms(w)) + " vs " + expected);
        }
        assertThat(WORDS.size()).isGreaterThan(1500);
        assertThat(wrong).isEmpty();
    }

    @Test
    void baseFormsAreNltksMorphy() {
        WordNetSynonyms wn = WordNetSynonyms.get();
        List<String> wrong = new ArrayList<>();
        for (Iterator<String> it = WORDS.fieldNames(); it.hasNext(); ) {
            String w = it.next();
            for (Map.Entry<String, POS> p : POS_BY_KEY.entrySet()) {
                List<String> expected = new ArrayList<>();
                WORDS.get(w).get("base_forms").get(p.getKey()).forEach(x -> expected.add(x.asText()));
                List<String> ours = wn.baseForms(w, p.getValue());
                if (!ours.equals(expected)) wrong.add(w + "/" + p.getKey() + ": " + ours + " vs " + expected);
            }
        }
        assertThat(wrong).isEmpty();
    }

    @Test
    void theCasesThatNeedCare() {
        WordNetSynonyms wn = WordNetSynonyms.get();
        // a derived form listed twice keeps its last line, as NLTK's dictionary does: noun.exc has
        // "involucra involucre" then "involucra involucrum" (only involucre is in the index),
        // "aurar eyir" then "aurar eyrir" (only eyrir is); adj.exc "offer off" then "offer offer"
        assertThat(wn.baseForms("involucra", POS.NOUN)).isEqualTo(names("involucra", "base_forms", "n")).isEmpty();
        assertThat(wn.baseForms("aurar", POS.NOUN)).isEqualTo(names("aurar", "base_forms", "n")).containsExactly("eyrir");
        assertThat(wn.baseForms("offer", POS.ADJECTIVE)).isEqualTo(names("offer", "base_forms", "a")).isEmpty();
        // an exception entry stops the search: noun.exc's "axes ax axis" gives ax and axis, and not
        // "axe", although the rule s -> "" would find it in the index
        assertThat(wn.baseForms("axes", POS.NOUN)).isEqualTo(names("axes", "base_forms", "n"))
                .containsExactly("ax", "axis");
        // adjective markers are not part of lemma names: data.adj has "galore(ip)"
        assertThat(wn.synonyms("galore")).contains("galore").allMatch(s -> !s.contains("("));
        // lemma names keep their case ("China" among china's synonyms), multi-word lemmas are left out
        assertThat(wn.synonyms("china")).contains("China").doesNotContain("People's Republic of China");
        assertThat(names("china", "synonyms", null)).contains("China");
        assertThat(wn.versionNumber()).isEqualTo(3.0);
    }

    @Test
    void concurrentLookUpsGiveTheSameAnswers() throws Exception {
        WordNetSynonyms wn = WordNetSynonyms.get();
        List<String> words = new ArrayList<>();
        WORDS.fieldNames().forEachRemaining(words::add);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Boolean>> results = new ArrayList<>();
            for (int t = 0; t < 4; t++) {
                int offset = t * 97;
                results.add(pool.submit(() -> {
                    for (int i = 0; i < words.size(); i++) {
                        String w = words.get((i + offset) % words.size());
                        TreeSet<String> expected = new TreeSet<>();
                        WORDS.get(w).get("synonyms").forEach(x -> expected.add(x.asText()));
                        if (!new TreeSet<>(wn.synonyms(w)).equals(expected)) return false;
                    }
                    return true;
                }));
            }
            for (Future<Boolean> f : results) assertThat(f.get()).isTrue();
        } finally {
            pool.shutdown();
        }
    }

    private static List<String> names(String word, String field, String pos) {
        JsonNode n = WORDS.get(word).get(field);
        if (pos != null) n = n.get(pos);
        List<String> out = new ArrayList<>();
        n.forEach(x -> out.add(x.asText()));
        return out;
    }
}
