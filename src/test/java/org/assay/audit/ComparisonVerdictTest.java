package org.assay.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.List;
import org.assay.common.UserInputException;
import org.assay.data.ClassificationData;
import org.junit.jupiter.api.Test;

/** The verdict words of a compared pair of rows (defined in README "Compared rows") and the matching of items. */
class ComparisonVerdictTest {
    private static final double ALPHA = 0.05;

    @Test
    void theSignOfTheReproducedGapDecidesOnlyWhenTheAdjustedTestRejects() {
        assertThat(ComparisonVerdict.of(0.02, 0.03, 0.01, ALPHA)).isEqualTo(ComparisonVerdict.ORDERING_REPLICATED);
        assertThat(ComparisonVerdict.of(-0.02, -0.001, 0.049, ALPHA)).isEqualTo(ComparisonVerdict.ORDERING_REPLICATED);
        assertThat(ComparisonVerdict.of(0.02, -0.03, 0.01, ALPHA)).isEqualTo(ComparisonVerdict.ORDERING_REVERSED);
        assertThat(ComparisonVerdict.of(-0.02, 0.03, 0.001, ALPHA)).isEqualTo(ComparisonVerdict.ORDERING_REVERSED);
        assertThat(ComparisonVerdict.of(0.02, 0.03, 0.05, ALPHA)).isEqualTo(ComparisonVerdict.ORDERING_NOT_SHOWN);
        assertThat(ComparisonVerdict.of(0.02, -0.03, 0.2, ALPHA)).isEqualTo(ComparisonVerdict.ORDERING_NOT_SHOWN);
        assertThat(ComparisonVerdict.of(0.0, 0.03, 0.001, ALPHA)).isEqualTo(ComparisonVerdict.NO_ORDERING_CLAIMED);
        assertThat(ComparisonVerdict.of(0.02, 0.03, Double.NaN, ALPHA)).isEqualTo(ComparisonVerdict.ORDERING_NOT_SHOWN);
    }

    private static ClassificationData data(String file, String[] ids, int[] truth, int[] predicted) {
        return new ClassificationData(Path.of(file), List.of(ids), List.of("0", "1"), truth, predicted, null, null, 1, List.of());
    }

    @Test
    void itemsAreMatchedByIdWhateverTheirOrder() {
        ClassificationData a = data("a.csv", new String[] {"x", "y", "z"}, new int[] {0, 1, 1}, new int[] {0, 1, 0});
        ClassificationData b = data("b.csv", new String[] {"z", "x", "y"}, new int[] {1, 0, 1}, new int[] {1, 1, 1});
        assertThat(ReproductionPairing.match(a, "A", b, "B").bIndexOfA()).containsExactly(1, 2, 0);
    }

    @Test
    void aMissingIdOrADifferentTruthIsAnErrorNamingTheItem() {
        ClassificationData a = data("a.csv", new String[] {"x", "y", "z"}, new int[] {0, 1, 1}, new int[] {0, 1, 0});
        ClassificationData fewer = data("b.csv", new String[] {"x", "z"}, new int[] {0, 1}, new int[] {0, 1});
        assertThatThrownBy(() -> ReproductionPairing.match(a, "A", fewer, "B")).isInstanceOf(UserInputException.class)
                .hasMessageContaining("'y'").hasMessageContaining("b.csv");
        ClassificationData more = data("b.csv", new String[] {"x", "y", "z", "w"}, new int[] {0, 1, 1, 0}, new int[] {0, 1, 1, 0});
        assertThatThrownBy(() -> ReproductionPairing.match(a, "A", more, "B")).isInstanceOf(UserInputException.class)
                .hasMessageContaining("'w'").hasMessageContaining("a.csv");
        ClassificationData relabelled = data("b.csv", new String[] {"x", "y", "z"}, new int[] {0, 0, 1}, new int[] {0, 1, 1});
        assertThatThrownBy(() -> ReproductionPairing.match(a, "A", relabelled, "B")).isInstanceOf(UserInputException.class)
                .hasMessageContaining("'y'").hasMessageContaining("true value");
    }
}
