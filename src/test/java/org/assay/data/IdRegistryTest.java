package org.assay.data;

import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The compact id registry: hash tags only propose candidates, the text decides. */
class IdRegistryTest {
    private static final Path FILE = Path.of("ids.csv");

    /** Two different ids whose normalized forms share the 32-bit tag (found by a birthday search). */
    private static String[] collidingPair() {
        Map<Integer, String> seen = new HashMap<>();
        for (int i = 0; ; i++) {
            String id = "item-" + i;
            String other = seen.putIfAbsent(IdRegistry.tag(IdRegistry.normalize(id)), id);
            if (other != null) return new String[] {other, id};
        }
    }

    @Test
    void idsWithTheSameHashTagAreStillDifferentIds() {
        String[] pair = collidingPair();
        assertThat(IdRegistry.tag(pair[0])).isEqualTo(IdRegistry.tag(pair[1]));
        assertThat(pair[0]).isNotEqualToIgnoringCase(pair[1]);

        IdRegistry ids = new IdRegistry(FILE);
        assertThat(ids.add(pair[0], 2)).isEqualTo(0);
        assertThat(ids.add(pair[1], 3)).isEqualTo(1);   // same tag, same first slot: no false error
        assertThat(ids.indexOf(pair[0])).isEqualTo(0);
        assertThat(ids.indexOf(pair[1])).isEqualTo(1);
        assertThat(ids.indexOfSimilar(pair[1].toUpperCase())).isEqualTo(1);
        assertThat(ids.similarHint(pair[0] + "x")).isEmpty();
        // and a real repeat of either is still caught, naming the right earlier line
        assertThatThrownBy(() -> ids.add(pair[1], 9)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("duplicate id '" + pair[1] + "' (also on line 3)");
        assertThatThrownBy(() -> ids.add(" " + pair[0].toUpperCase(), 9)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("differs from id '" + pair[0] + "' on line 2 only by case and surrounding whitespace");
        assertThatThrownBy(() -> ids.add(pair[1] + "\t", 9)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("differs from id '" + pair[1] + "' on line 3 only by surrounding whitespace");
        assertThat(ids.caseWarning()).isEmpty();
    }

    @Test
    void idsThatDifferOnlyByCaseAreKeptApartAndCounted() {
        IdRegistry ids = new IdRegistry(FILE);
        ids.add("img_a1", 2);
        ids.add("IMG_A1", 3);
        ids.add("Img_A1", 4);
        ids.add("b", 5);
        assertThat(ids.indexOf("IMG_A1")).isEqualTo(1);
        assertThat(ids.indexOf("Img_A1")).isEqualTo(2);
        assertThat(ids.indexOf("img_A1")).isEqualTo(-1);
        assertThat(ids.indexOfSimilar("img_A1")).isEqualTo(0);   // the first of the variants
        assertThat(ids.caseWarning()).hasValueSatisfying(w -> assertThat(w)
                .contains("id 'IMG_A1' on line 3 differs from id 'img_a1' on line 2 only by case")
                .contains("2 ids differ from an earlier one only by case"));
        // an exact repeat of a later variant is still a duplicate, and whitespace still an error,
        // even with a case variant earlier on the same probe run
        assertThatThrownBy(() -> ids.add("Img_A1", 9)).hasMessageContaining("duplicate id 'Img_A1' (also on line 4)");
        assertThatThrownBy(() -> ids.add("IMG_A1 ", 9)).hasMessageContaining("differs from id 'IMG_A1' on line 3 only by surrounding whitespace");
        assertThatThrownBy(() -> ids.add(" iMG_a1", 9)).hasMessageContaining("differs from id 'img_a1' on line 2 only by case and surrounding");
    }

    @Test
    void findsEveryIdAfterTheTableHasGrownManyTimes() {
        IdRegistry ids = new IdRegistry(FILE);
        int n = 200_000;
        for (int i = 0; i < n; i++) ids.add("Q" + i, i + 2);
        for (int i = 0; i < n; i += 7) {
            assertThat(ids.indexOf("Q" + i)).isEqualTo(i);
            assertThat(ids.indexOf("q" + i)).isEqualTo(-1);          // not the same id
            assertThat(ids.indexOfSimilar("q" + i)).isEqualTo(i);    // but the same up to case
        }
        assertThat(ids.indexOf("Q" + n)).isEqualTo(-1);
        assertThat(ids.line(n - 1)).isEqualTo(n + 1);
    }

    @Test
    void releasingTheLookupKeepsIdsAndLinesButRefusesLookups() {
        IdRegistry ids = new IdRegistry(FILE);
        ids.add("a", 2);
        ids.add("b", 4);
        ids.releaseLookup();
        assertThat(ids.ids()).containsExactly("a", "b");
        assertThat(ids.line(1)).isEqualTo(4);
        assertThatThrownBy(() -> ids.indexOf("a")).isInstanceOf(IllegalStateException.class);
        assertThatThrownBy(() -> ids.add("c", 5)).isInstanceOf(IllegalStateException.class);
    }
}
