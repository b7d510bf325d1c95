package org.assay.metrics.generation;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.BiPredicate;
import java.util.function.UnaryOperator;

/**
 * METEOR's word alignment and fragmentation count as NLTK 3.8 computes them
 * ({@code nltk.translate.meteor_score._enum_align_words} and {@code _count_chunks}). This is NLTK's
 * greedy alignment, not the original METEOR's search for the alignment with the fewest crossings
 * (Banerjee & Lavie 2005): three stages run one after the other on the words the earlier stages
 * left unmatched,
 * <ol>
 *   <li>exact: equal lower-cased words;</li>
 *   <li>stem: equal Porter stems; the words left over stay stemmed for the next stage;</li>
 *   <li>synonym: the reference word is among the hypothesis word's WordNet synonyms.</li>
 * </ol>
 * Within a stage, hypothesis words are taken from last to first, and each is matched to the last
 * still-unmatched reference word that fits. Chunks are counted over the matches in hypothesis order:
 * a new chunk starts wherever the next match is not adjacent in both texts.
 */
final class MeteorAlignment {
    /** A word and its position in its text. */
    private record Word(int position, String text) {}

    /** A matched pair of positions. */
    private record Match(int hypothesis, int reference) {}

    private final PorterStemming stemmer;
    private final WordNetSynonyms wordNet;

    MeteorAlignment(PorterStemming stemmer, WordNetSynonyms wordNet) {
        this.stemmer = stemmer;
        this.wordNet = wordNet;
    }

    /** The number of matched words and of chunks, for lower-cased token lists. */
    record Result(int matches, int chunks) {}

    Result align(List<String> hypothesis, List<String> reference) {
        List<Word> hyp = words(hypothesis), ref = words(reference);
        List<Match> matches = new ArrayList<>();
        stage(hyp, ref, matches, String::equals);
        hyp = map(hyp, stemmer::stem);
        ref = map(ref, stemmer::stem);
        stage(hyp, ref, matches, String::equals);
        stage(hyp, ref, matches, (h, r) -> wordNet.synonyms(h).contains(r));
        matches.sort(Comparator.comparingInt(Match::hypothesis));
        return new Result(matches.size(), chunks(matches));
    }

    /** One matching stage; matched words are removed from {@code hyp} and {@code ref}. */
    private static void stage(List<Word> hyp, List<Word> ref, List<Match> matches, BiPredicate<String, String> fits) {
        for (int i = hyp.size() - 1; i >= 0; i--) {
            if (ref.isEmpty()) return;
            for (int j = ref.size() - 1; j >= 0; j--) {
                if (fits.test(hyp.get(i).text(), ref.get(j).text())) {
                    matches.add(new Match(hyp.get(i).position(), ref.get(j).position()));
                    hyp.remove(i);
                    ref.remove(j);
                    break;
                }
            }
        }
    }

    /** NLTK's {@code _count_chunks}; 1 for no matches (the score is 0 then anyway). */
    private static int chunks(List<Match> matches) {
        int chunks = 1;
        for (int i = 0; i + 1 < matches.size(); i++) {
            Match a = matches.get(i), b = matches.get(i + 1);
            if (b.hypothesis() != a.hypothesis() + 1 || b.reference() != a.reference() + 1) chunks++;
        }
        return chunks;
    }

    private static List<Word> words(List<String> tokens) {
        List<Word> out = new ArrayList<>();
        for (int i = 0; i < tokens.size(); i++) out.add(new Word(i, tokens.get(i)));
        return out;
    }

    private static List<Word> map(List<Word> words, UnaryOperator<String> f) {
        List<Word> out = new ArrayList<>();
        for (Word w : words) out.add(new Word(w.position(), f.apply(w.text())));
        return out;
    }
}
