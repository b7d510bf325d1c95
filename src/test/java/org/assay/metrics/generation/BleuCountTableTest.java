package org.assay.metrics.generation;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.assay.data.generation.GenerationData;
import org.assay.metrics.UnitTable;
import org.junit.jupiter.api.Test;

/**
 * The corpus-level count table is the per-item {@link BleuCounts} rows, whatever order the items
 * are counted in (they are counted in parallel), and its one-pass weighted sums equal the unit-by-unit
 * sums of {@link UnitTable}'s default. Invented corpus: 3,000 items of invented words with one or two
 * references, some hypotheses shorter than the 4-gram order, some empty.
 */
class BleuCountTableTest {
    @Test
    void countTableRowsAreEachItemsOwnCounts() {
        GenerationData data = corpus(3000, 23);
        for (BleuSettings s : List.of(new BleuSettings(Tokenizer.NONE, false, BleuSmoothing.NONE, 4),
                new BleuSettings(Tokenizer.V13A, true, BleuSmoothing.NONE, 6))) {
            CountTable table = s.counts(data);
            assertThat(table.units()).isEqualTo(3000);
            for (int i = 0; i < data.size(); i++) {
                List<String> hyp = s.tokenizer().tokens(data.hypotheses().get(i), s.lowercase());
                List<List<String>> refs = new ArrayList<>();
                for (String r : data.references().get(i)) refs.add(s.tokenizer().tokens(r, s.lowercase()));
                assertThat(table.row(i)).as("item %d", i).containsExactly(BleuCounts.of(hyp, refs, s.order()));
            }
        }
    }

    @Test
    void onePassWeightedSumsEqualTheUnitByUnitSums() {
        CountTable table = new BleuSettings(Tokenizer.NONE, false, BleuSmoothing.NONE, 4).counts(corpus(3000, 29));
        UnitTable unitByUnit = new UnitTable() {   // the interface's default weightedSums over the same rows
            @Override public int units() { return table.units(); }
            @Override public int width() { return table.width(); }
            @Override public void addUnit(int i, double weight, double[] sums) { table.addUnit(i, weight, sums); }
        };
        SplittableRandom rng = new SplittableRandom(3);
        for (int trial = 0; trial < 20; trial++) {
            int[] weights = new int[table.units()];
            for (int d = 0; d < weights.length; d++) weights[rng.nextInt(weights.length)]++;   // a multinomial resample
            assertThat(table.weightedSums(weights)).containsExactly(unitByUnit.weightedSums(weights));
        }
        assertThat(table.weightedSums(null)).containsExactly(unitByUnit.weightedSums(null));
    }

    private static GenerationData corpus(int n, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        String[] words = {"kelo", "mab", "tiru", "sena", "po", "vadi", "gum", "rela", "nofi", "zat", "Kelo", "mab,", "tiru."};
        List<String> ids = new ArrayList<>();
        List<String> hyps = new ArrayList<>();
        List<List<String>> refs = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
            hyps.add(sentence(rng, words, rng.nextInt(12)));   // 0 to 11 words
            List<String> r = new ArrayList<>();
            int references = 1 + rng.nextInt(2);
            for (int k = 0; k < references; k++) r.add(sentence(rng, words, 1 + rng.nextInt(12)));
            refs.add(r);
        }
        return new GenerationData(Path.of("invented.jsonl"), ids, hyps, refs, List.of());
    }

    private static String sentence(SplittableRandom rng, String[] words, int length) {
        StringBuilder sb = new StringBuilder();
        for (int j = 0; j < length; j++) sb.append(j == 0 ? "" : " ").append(words[rng.nextInt(words.length)]);
        return sb.toString();
    }
}
