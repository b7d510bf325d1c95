package org.assay.data.generation;

import java.nio.file.Path;
import java.util.List;
import org.assay.data.EvaluationData;

/**
 * Text-generation outputs, one item per index: its id, the system's hypothesis and one or more
 * references (the number may differ between items). The item is the resampling unit. Texts are
 * kept exactly as read (no trimming, no tokenization): every metric tokenizes them once, with
 * its own settings, before any resampling.
 *
 * @param source     the file read (the hypotheses file for parallel text files)
 * @param ids        one distinct id per item
 * @param hypotheses one hypothesis per item
 * @param references per item, its references (at least one each)
 * @param warnings   non-fatal findings met while reading
 */
public record GenerationData(Path source, List<String> ids, List<String> hypotheses, List<List<String>> references,
                             List<String> warnings) implements EvaluationData {

    public GenerationData {
        ids = List.copyOf(ids);
        hypotheses = List.copyOf(hypotheses);
        references = references.stream().map(List::copyOf).toList();
        warnings = List.copyOf(warnings);
        if (ids.size() != hypotheses.size() || hypotheses.size() != references.size()) {
            throw new IllegalArgumentException("ids, hypotheses and references differ in length: "
                    + ids.size() + ", " + hypotheses.size() + ", " + references.size());
        }
        for (int i = 0; i < references.size(); i++) {
            if (references.get(i).isEmpty()) throw new IllegalArgumentException("item " + ids.get(i) + " has no reference");
        }
    }

    @Override public int size() { return hypotheses.size(); }

    /** The same items in another order or with repeats: {@code index[j]} is the item placed at j. */
    public GenerationData select(int[] index) {
        List<String> i2 = new java.util.ArrayList<>(), h2 = new java.util.ArrayList<>();
        List<List<String>> r2 = new java.util.ArrayList<>();
        for (int j = 0; j < index.length; j++) {
            i2.add(ids.get(index[j]) + (j == 0 ? "" : "#" + j));
            h2.add(hypotheses.get(index[j]));
            r2.add(references.get(index[j]));
        }
        return new GenerationData(source, i2, h2, r2, warnings);
    }
}
