package org.assay.data.regression;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The regression reader: the three formats give the same data, and every kind of bad input is
 * one UserInputException naming the file, the line and what to do. Line numbers are physical
 * file lines, the header being line 1 (common practice for text files).
 */
class RegressionReaderTest {
    @TempDir Path dir;

    private Path write(String name, String content) throws Exception {
        Path file = dir.resolve(name);
        Files.writeString(file, content, StandardCharsets.UTF_8);
        return file;
    }

    private static RegressionData read(Path file) {
        return RegressionReader.read(file, RegressionColumns.defaults());
    }

    private static void assertFailsWith(Path file, RegressionColumns columns, String position, String... fragments) {
        assertThatThrownBy(() -> RegressionReader.read(file, columns))
                .isInstanceOfSatisfying(UserInputException.class, e -> {
                    assertThat(e.where()).isEqualTo(file);
                    assertThat(e.position()).isEqualTo(position);
                    assertThat(e.fix()).isNotBlank();
                    assertThat(e.oneLine()).doesNotContain("\n").contains(fragments);
                });
    }

    private static void assertFails(Path file, String position, String... fragments) {
        assertFailsWith(file, RegressionColumns.defaults(), position, fragments);
    }

    @Test
    void csvTsvAndJsonLinesGiveTheSameData() throws Exception {
        RegressionData csv = read(write("p.csv", "id,target,prediction\na,1.5,1.25\nb,-2,3e2\n\"c,1\",0,0.0\n"));
        RegressionData tsv = read(write("p.tsv", "prediction\ttarget\tid\n1.25\t1.5\ta\n3e2\t-2\tb\n0.0\t0\tc,1\n"));
        RegressionData jsonl = read(write("p.jsonl", "{\"id\":\"a\",\"target\":1.5,\"prediction\":1.25}\n\n"
                + "{\"id\":\"b\",\"target\":-2,\"prediction\":3e2}\n{\"id\":\"c,1\",\"target\":0,\"prediction\":0.0}\n"));
        for (RegressionData d : List.of(csv, tsv, jsonl)) {
            assertThat(d.ids()).containsExactly("a", "b", "c,1");
            assertThat(d.target()).containsExactly(1.5, -2.0, 0.0);
            assertThat(d.prediction()).containsExactly(1.25, 300.0, 0.0);
        }
        assertThat(csv.source()).isEqualTo(dir.resolve("p.csv"));
    }

    @Test
    void columnNamesCanBeChosen() throws Exception {
        Path file = write("house.csv", "house,price,estimate,notes\nh1,250000,241000,corner\nh2,199000,205500,\n");
        RegressionData d = RegressionReader.read(file, new RegressionColumns("house", "price", "estimate"));
        assertThat(d.ids()).containsExactly("h1", "h2");
        assertThat(d.target()).containsExactly(250000.0, 199000.0);
        assertThat(d.prediction()).containsExactly(241000.0, 205500.0);
    }

    @ParameterizedTest(name = "value [{0}]")
    @CsvSource(delimiter = '|', value = {
            "abc | is not a number",
            "NaN | is NaN or infinite",
            "inf | is NaN or infinite",
            "-Infinity | is NaN or infinite",
            "1e400 | too large for a double",
            "0x1p3 | is not a number",
            "'' | is empty"})
    void nonNumericAndNonFiniteValuesAreRejectedWithTheirLine(String value, String problem) throws Exception {
        Path file = write("bad.csv", "id,target,prediction\na,1,2\nb,3," + value + "\n");
        assertFails(file, "line 3", "'prediction'", problem);
    }

    @Test
    void quotedNonNumberInJsonLinesIsRejected() throws Exception {
        Path file = write("bad.jsonl", "{\"id\":\"a\",\"target\":1,\"prediction\":2}\n{\"id\":\"b\",\"target\":\"high\",\"prediction\":2}\n");
        assertFails(file, "line 2", "'target'", "is not a number");
    }

    @Test
    void duplicateIdNamesBothLines() throws Exception {
        Path file = write("dup.csv", "id,target,prediction\na,1,2\nb,1,2\na,3,4\n");
        assertFails(file, "line 4", "duplicate id 'a'", "also on line 2");
    }

    @Test
    void idsDifferingOnlyByCaseAreKeptWithAWarning() throws Exception {
        Path file = write("case.csv", "id,target,prediction\nItem7,1,2\nitem7,3,4\n");
        RegressionData d = read(file);
        assertThat(d.ids()).containsExactly("Item7", "item7");
        assertThat(d.warnings()).singleElement().asString().contains("case.csv")
                .contains("id 'item7' on line 3 differs from id 'Item7' on line 2 only by case");
    }

    @Test
    void idsDifferingBySurroundingSpaceAreRejected() throws Exception {
        Path file = write("space.csv", "id,target,prediction\nItem7,1,2\n\" Item7\",3,4\n");
        assertFails(file, "line 3", "only by surrounding whitespace");
    }

    @Test
    void missingColumnListsTheColumnsFound() throws Exception {
        Path file = write("cols.csv", "id,y,prediction\na,1,2\n");
        assertFails(file, "line 1", "no column 'target'", "columns found: id, y, prediction");
        assertFailsWith(file, new RegressionColumns("id", "y", "yhat"), "line 1", "no column 'yhat'");
    }

    @Test
    void emptyFilesAndHeaderOnlyFiles() throws Exception {
        assertFails(write("empty.csv", ""), null, "the file is empty");
        assertFails(write("empty.jsonl", "\n \n"), null, "the file is empty");
        assertFails(write("header.tsv", "id\ttarget\tprediction\n"), "line 1", "has a header but no rows");
    }

    @Test
    void raggedRowAndEmptyId() throws Exception {
        assertFails(write("ragged.csv", "id,target,prediction\na,1\n"), "line 2", "has 2 fields but the header has 3");
        assertFails(write("noid.csv", "id,target,prediction\n,1,2\n"), "line 2", "the id is empty");
    }
}
