package org.assay.metrics.generation;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.IntStream;
import org.assay.data.generation.GenerationData;

/** The parameters of corpus and sentence BLEU, read once, and the per-item counts they give. */
record BleuSettings(Tokenizer tokenizer, boolean lowercase, BleuSmoothing smoothing, int order) {
    static final Set<String> PARAMS = Set.of("tokenize", "lowercase", "smoothing", "order");
    static final int MAX_ORDER = 9;

    static BleuSettings read(String metric, Map<String, String> params, BleuSmoothing defaultSmoothing) {
        String tokenize = GenerationSettings.choice(metric, params, "tokenize", Tokenizer.V13A.id(),
                List.of(Tokenizer.V13A.id(), Tokenizer.NONE.id(), Tokenizer.CHAR.id()));
        boolean lowercase = GenerationSettings.flag(metric, params, "lowercase", false);
        String smoothing = GenerationSettings.choice(metric, params, "smoothing", defaultSmoothing.id(), BleuSmoothing.ids());
        int order = GenerationSettings.integer(metric, params, "order", 4, 1, MAX_ORDER);
        return new BleuSettings(Tokenizer.parse(tokenize), lowercase, BleuSmoothing.of(smoothing), order);
    }

    /**
     * Every item tokenized once and reduced to its {@link BleuCounts} row. Items are independent and
     * each writes only its own row, so they are counted in parallel (the common fork-join pool) with
     * the same result in any order; tokenizing and counting n-grams is most of a large corpus's time.
     */
    CountTable counts(GenerationData data) {
        int width = BleuCounts.width(order);
        int[] all = new int[data.size() * width];
        IntStream.range(0, data.size()).parallel().forEach(i -> {
            List<String> hyp = tokenizer.tokens(data.hypotheses().get(i), lowercase);
            List<List<String>> refs = new ArrayList<>();
            for (String r : data.references().get(i)) refs.add(tokenizer.tokens(r, lowercase));
            System.arraycopy(BleuCounts.of(hyp, refs, order), 0, all, i * width, width);
        });
        return new CountTable(all, width);
    }

    String line(GenerationData data) {
        return GenerationSettings.line(GenerationSettings.settings("tokenize", tokenizer.id(), "lowercase", lowercase,
                "smoothing", smoothing.id(), "order", order), data);
    }
}
