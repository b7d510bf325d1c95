package org.assay.metrics.generation;

import java.util.HashMap;
import java.util.Map;
import org.tartarus.snowball.ext.PorterStemmer;

/**
 * Porter's suffix-stripping stemmer (Porter 1980, "An algorithm for suffix stripping", Program
 * 14(3):130-137) as written in Snowball ({@code porter.sbl}, shipped in Lucene 9's analysis
 * module). Snowball's version follows the published algorithm except that step 1b undoubles only
 * bb, dd, ff, gg, mm, nn, pp, rr and tt: "revving" stems to "revv" where the paper (and NLTK's
 * ORIGINAL_ALGORITHM mode) give "rev". {@code PorterStemmingTest} lists the words found.
 *
 * <p>Not thread-safe (the Snowball object is stateful): one instance per metric preparation. Stems
 * are remembered, since a corpus repeats its words.
 */
final class PorterStemming {
    private final PorterStemmer snowball = new PorterStemmer();
    private final Map<String, String> seen = new HashMap<>();

    /** The stem of a lower-case word. */
    String stem(String word) {
        return seen.computeIfAbsent(word, w -> {
            snowball.setCurrent(w);
            snowball.stem();
            return snowball.getCurrent();
        });
    }
}
