package org.assay.data;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.nio.file.Path;

import static org.assay.data.Fixtures.assertUserError;
import static org.assay.data.Fixtures.write;
import static org.assertj.core.api.Assertions.assertThat;

/** Class order, the default positive class, and arg-max ties. */
class ClassCodingAndPositiveTest {

    /** Reads id,label,prediction rows given as "label:prediction" pairs. */
    private static ClassificationData read(Path dir, ReadOptions options, String... pairs) throws Exception {
        StringBuilder csv = new StringBuilder("id,label,prediction\n");
        for (int i = 0; i < pairs.length; i++) {
            String[] p = pairs[i].split(":");
            csv.append("r").append(i).append(',').append(p[0]).append(',').append(p[1]).append('\n');
        }
        return ClassificationReader.read(write(dir, "pairs.csv", csv.toString()), options);
    }

    // The conventional positive of a conventional pair is common practice, not a published rule.
    @ParameterizedTest
    @CsvSource({
            "0, 1, 1",
            "1, 0, 1",
            "false, true, true",
            "TRUE, False, TRUE",
            "neg, pos, pos",
            "Pos, NEG, Pos",
    })
    void conventionalPairsNameTheirPositiveClass(String a, String b, String positive, @TempDir Path dir) throws Exception {
        ClassificationData data = read(dir, ReadOptions.defaults(), a + ":" + a, b + ":" + a);
        assertThat(data.classes().get(data.positive())).isEqualTo(positive);
    }

    @Test
    void otherPairsAndMulticlassHaveNoDefaultPositive(@TempDir Path dir) throws Exception {
        assertThat(read(dir, ReadOptions.defaults(), "yes:no", "no:no").positive()).isEqualTo(-1);
        assertThat(read(dir, ReadOptions.defaults(), "0:1", "1:2", "2:0").positive()).isEqualTo(-1);
    }

    @Test
    void positiveOptionChoosesAClass(@TempDir Path dir) throws Exception {
        ClassificationData data = read(dir, ReadOptions.defaults().withPositive("yes"), "yes:no", "no:no");
        assertThat(data.classes()).containsExactly("no", "yes");
        assertThat(data.positive()).isEqualTo(1);
        ClassificationData overridden = read(dir, ReadOptions.defaults().withPositive("0"), "0:1", "1:1");
        assertThat(overridden.positive()).isEqualTo(0);
    }

    @Test
    void positiveOptionThatIsNotAClassIsAnError(@TempDir Path dir) throws Exception {
        Path file = write(dir, "pairs.csv", "id,label,prediction\nr1,yes,no\nr2,no,no\n");
        assertUserError(() -> ClassificationReader.read(file, ReadOptions.defaults().withPositive("Yes")),
                file, null, "the positive class 'Yes' is not one of the classes [no, yes]", "--positive");
    }

    @Test
    void numericClassesSortByValueOtherwiseLexicographically(@TempDir Path dir) throws Exception {
        assertThat(read(dir, ReadOptions.defaults(), "10:2", "2:-1", "-1:10", "1.5:2").classes())
                .containsExactly("-1", "1.5", "2", "10");
        // One non-number makes the order lexicographic (String.compareTo: digits before letters).
        assertThat(read(dir, ReadOptions.defaults(), "10:2", "2:x", "x:10").classes())
                .containsExactly("10", "2", "x");
        assertThat(read(dir, ReadOptions.defaults(), "b:B", "B:a", "a:b").classes())
                .containsExactly("B", "a", "b");
    }

    @Test
    void sameNumberWrittenTwoWaysIsAFormattingMismatch(@TempDir Path dir) throws Exception {
        Path file = write(dir, "mixed.csv", "id,label,prediction\nr1,1,1\nr2,1.0,1\n");
        assertUserError(() -> ClassificationReader.read(file, ReadOptions.defaults()), file, "line 3",
                "class '1.0' and class '1'", "formatting mismatch", "write each class label the same way");
    }

    @Test
    void labelsDifferingOnlyBySurroundingSpaceAreAFormattingMismatch(@TempDir Path dir) throws Exception {
        Path file = write(dir, "spaces.csv", "id,label,prediction\nr1,cat,cat\nr2,cat ,cat\n");
        assertUserError(() -> ClassificationReader.read(file, ReadOptions.defaults()), file, "line 3",
                "class 'cat ' and class 'cat'", "surrounding whitespace");
    }

    @Test
    void argMaxTieGoesToTheLowestClassCode(@TempDir Path dir) throws Exception {
        // Columns in the file run c, b, a; codes are a=0, b=1, c=2. Ties must pick by code, not column.
        Path file = write(dir, "ties.csv", "id,label,p_c,p_b,p_a\n"
                + "r1,a,0.5,0.5,0\n"
                + "r2,b,0.25,0.25,0.5\n"
                + "r3,c,0.4,0.3,0.3\n"
                + "r4,a,0.34,0.33,0.33\n");
        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());
        assertThat(data.classes()).containsExactly("a", "b", "c");
        assertThat(data.predicted()).containsExactly(1, 0, 2, 2);
    }

    @Test
    void predictionColumnWinsOverArgMax(@TempDir Path dir) throws Exception {
        Path file = write(dir, "both.csv", "id,label,prediction,p_0,p_1\nr1,0,1,0.9,0.1\nr2,1,1,0.2,0.8\n");
        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());
        assertThat(data.predicted()).containsExactly(1, 1);
        assertThat(data.positiveScores()).containsExactly(0.1, 0.8);
    }

    @Test
    void probabilityColumnClassesCountAsClasses(@TempDir Path dir) throws Exception {
        // "bird" is never a true label, but its probability column makes it a class, and a valid prediction.
        Path file = write(dir, "extra.csv", "id,label,prediction,p_cat,p_dog,p_bird\nr1,cat,bird,0.3,0.2,0.5\n");
        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());
        assertThat(data.classes()).containsExactly("bird", "cat", "dog");
        assertThat(data.predicted()).containsExactly(0);
        assertThat(data.probabilities().toArray()).containsExactly(0.5, 0.3, 0.2);
    }
}
