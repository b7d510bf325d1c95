package org.assay.metrics;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.assay.data.generation.GenerationData;
import org.assay.data.retrieval.RetrievalData;
import org.assay.data.retrieval.RetrievalDirection;
import org.assay.data.retrieval.TiePolicy;

/** Seeded retrieval and generation data for the common metric checks (invented, test-only). */
final class TaskTestData {
    private TaskTestData() {}

    /**
     * {@code queries} queries over 30 candidates, each with 1 to 4 relevant candidates at random
     * distinct ranks (some repeated ranks across queries, so medians and ties in per-query values occur).
     */
    static RetrievalDirection retrieval(long seed, int queries) {
        SplittableRandom rng = new SplittableRandom(seed);
        int candidates = 30;
        List<String> ids = new ArrayList<>();
        double[][] ranks = new double[queries][];
        int[] depth = new int[queries];
        for (int q = 0; q < queries; q++) {
            ids.add("q" + q);
            int r = 1 + rng.nextInt(4);
            ranks[q] = rng.ints(0, candidates).distinct().limit(r).mapToDouble(x -> x + 1.0).sorted().toArray();
            depth[q] = candidates;
        }
        RetrievalData data = new RetrievalData("rows", ids, candidates, candidates, TiePolicy.PESSIMISTIC, ranks, depth, null);
        return new RetrievalDirection(Path.of("scores.npy"), data, List.of());
    }

    /** The queries in another order or with repeats: query index[j] is placed at j (ids renamed). */
    static RetrievalDirection select(RetrievalDirection d, int[] index) {
        RetrievalData r = d.ranks();
        List<String> ids = new ArrayList<>();
        double[][] ranks = new double[index.length][];
        int[] depth = new int[index.length];
        for (int j = 0; j < index.length; j++) {
            ids.add("q" + j);
            ranks[j] = r.relevantRanks()[index[j]];
            depth[j] = r.scoredDepth()[index[j]];
        }
        int min = Arrays.stream(depth).min().orElse(r.depth());
        return new RetrievalDirection(d.source(), new RetrievalData(r.direction(), ids, r.candidates(), min, r.ties(),
                ranks, depth, r.sentinel()), d.warnings());
    }

    private static final String[] WORDS = {"the", "a", "harbour", "boat", "crane", "moored", "at", "dusk", "two",
        "red", "ferry", "leaves", "quay", "gulls", "over", "water", "is", "on", "of", "small"};

    /**
     * {@code items} items, each a hypothesis of 3 to 12 words and one to three references that share
     * some of its words (so n-gram matches of every order occur, and some items have none).
     */
    static GenerationData generation(long seed, int items) {
        SplittableRandom rng = new SplittableRandom(seed);
        List<String> ids = new ArrayList<>(), hyps = new ArrayList<>();
        List<List<String>> refs = new ArrayList<>();
        for (int i = 0; i < items; i++) {
            ids.add("s" + i);
            List<String> h = sentence(rng, 3 + rng.nextInt(10), null, 0);
            hyps.add(String.join(" ", h));
            List<String> rs = new ArrayList<>();
            int nr = 1 + rng.nextInt(3);
            for (int k = 0; k < nr; k++) rs.add(String.join(" ", sentence(rng, 3 + rng.nextInt(10), h, rng.nextInt(4))));
            refs.add(rs);
        }
        return new GenerationData(Path.of("outputs.jsonl"), ids, hyps, refs, List.of());
    }

    /** Words at random; when {@code from} is given, copies runs of it with probability share/4. */
    private static List<String> sentence(SplittableRandom rng, int length, List<String> from, int share) {
        List<String> out = new ArrayList<>();
        while (out.size() < length) {
            if (from != null && rng.nextInt(4) < share) {
                int start = rng.nextInt(from.size());
                int run = 1 + rng.nextInt(4);
                for (int j = start; j < Math.min(from.size(), start + run) && out.size() < length; j++) out.add(from.get(j));
            } else {
                String w = WORDS[rng.nextInt(WORDS.length)];
                out.add(rng.nextInt(5) == 0 ? capitalise(w) : w);
            }
        }
        if (rng.nextInt(3) == 0) out.set(out.size() - 1, out.get(out.size() - 1) + ".");
        return out;
    }

    private static String capitalise(String w) { return Character.toUpperCase(w.charAt(0)) + w.substring(1); }
}
