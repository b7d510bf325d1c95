package org.assay.data;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

import static org.assay.data.Fixtures.assertUserError;
import static org.assay.data.Fixtures.write;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * One test per kind of bad input: each must be a UserInputException naming the file, the line,
 * the problem and what to do. Line numbers are physical file lines, the header being line 1.
 */
class ClassificationReaderBadInputTest {
    @TempDir Path dir;

    private void assertFails(Path file, String position, String... fragments) {
        assertUserError(() -> ClassificationReader.read(file, ReadOptions.defaults()), file, position, fragments);
    }

    @Test
    void missingFile() {
        Path file = dir.resolve("absent.csv");
        assertFails(file, null, "predictions file not found", "check the path");
    }

    @Test
    void directoryInsteadOfFile() throws Exception {
        Path file = java.nio.file.Files.createDirectory(dir.resolve("folder.csv"));
        assertFails(file, null, "is a directory", "give the path of the file itself");
    }

    @Test
    void unknownExtension() throws Exception {
        Path file = write(dir, "predictions.xlsx", "id,label,prediction\n");
        assertFails(file, null, "cannot tell the file format from the extension 'xlsx'", ".csv", ".jsonl");
    }

    @Test
    void emptyCsvFile() throws Exception {
        assertFails(write(dir, "empty.csv", ""), null, "the file is empty");
    }

    @Test
    void emptyJsonLinesFile() throws Exception {
        assertFails(write(dir, "blank.jsonl", "\n  \n"), null, "the file is empty");
    }

    @Test
    void headerOnly() throws Exception {
        assertFails(write(dir, "header.tsv", "id\tlabel\tprediction\n"), "line 1", "has a header but no rows");
    }

    @Test
    void missingIdColumnListsTheColumnsAndNamesTheOption() throws Exception {
        assertFails(write(dir, "noid.csv", "example,label,prediction\nx,1,1\n"), "line 1",
                "no column 'id'", "columns found: example, label, prediction", "--id-column");
    }

    @Test
    void missingIdColumnCanBeFixedWithTheOption() throws Exception {
        Path file = write(dir, "noid.csv", "example,label,prediction\nx,1,1\n");
        ReadOptions options = new ReadOptions("example", "label", "prediction", "score", "p_", null, null, null);
        assertThat(ClassificationReader.read(file, options).ids()).containsExactly("x");
    }

    @Test
    void missingLabelColumnWithoutTruthFile() throws Exception {
        assertFails(write(dir, "nolabel.csv", "id,prediction\nx,1\n"), "line 1",
                "no column 'label'", "columns found: id, prediction", "--label-column", "--truth");
    }

    @Test
    void noPredictionScoreOrProbabilityColumn() throws Exception {
        assertFails(write(dir, "nopred.csv", "id,label,guess\nx,1,1\n"), "line 1",
                "no predictions", "columns found: id, label, guess", "--prediction-column", "--score-column",
                "--probability-prefix");
    }

    @Test
    void duplicateColumnName() throws Exception {
        assertFails(write(dir, "twice.csv", "id,label,prediction,label\nx,1,1,1\n"), "line 1",
                "names column 'label' twice (fields 2 and 4)");
    }

    @Test
    void rowWithTooFewFields() throws Exception {
        assertFails(write(dir, "short.csv", "id,label,prediction\nx,1,1\ny,1\n"), "line 3",
                "this row has 2 fields but the header has 3", "RFC 4180");
    }

    @Test
    void rowWithTooManyFieldsFromAnUnquotedComma() throws Exception {
        assertFails(write(dir, "long.csv", "id,label,prediction\nx,1,1\ny,1,0,5\n"), "line 3",
                "this row has 4 fields but the header has 3", "quote fields that contain a comma");
    }

    @Test
    void aHeaderOfOneFieldHoldingAnotherSeparatorNamesTheSeparator() throws Exception {
        assertFails(write(dir, "semi.csv", "id;label;prediction\nx;1;1\n"), "line 1",
                "the header is one column 'id;label;prediction'", "separated by semicolons, not by commas",
                "save it comma-separated");
        assertFails(write(dir, "tabs.csv", "id\tlabel\tprediction\nx\t1\t1\n"), "line 1",
                "separated by tabs, not by commas", "name a tab-separated file .tsv");
        assertFails(write(dir, "commas.tsv", "id,label,prediction\nx,1,1\n"), "line 1",
                "separated by commas, not by tabs", "name a comma-separated file .csv");
    }

    @Test
    void leadingSpacesOfTheFirstFieldAreKeptAndBlankLinesStillSkipped() throws Exception {
        // Jackson's SKIP_EMPTY_LINES would turn " d" into "d" (then a plain duplicate, or a silent match)
        assertFails(write(dir, "lead.csv", "id,label,prediction\nd,1,1\n\n   \n d,0,0\n"), "line 5",
                "id ' d' differs from id 'd' on line 2 only by surrounding whitespace");
        ClassificationData data = ClassificationReader.read(
                write(dir, "blank.csv", "id,label,prediction\n\n d,1,1\n \t \ne,0,0\n\n"), ReadOptions.defaults());
        assertThat(data.ids()).containsExactly(" d", "e");
    }

    @Test
    void unterminatedQuote() throws Exception {
        assertFails(write(dir, "quote.csv", "id,label,prediction\nx,1,1\n\"y,1,1\n"), "line 3",
                "cannot parse the row", "Missing closing quote", "closing double quote");
    }

    @Test
    void duplicateIdNamesBothLines() throws Exception {
        assertFails(write(dir, "dup.csv", "id,label,prediction\nx,1,1\ny,0,0\nx,0,1\n"), "line 4",
                "duplicate id 'x' (also on line 2)");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"' abc'|abc|surrounding whitespace", "'ABC '|abc|case and surrounding whitespace"})
    void idsDifferingBySurroundingSpace(String second, String first, String how) throws Exception {
        Path file = write(dir, "near.csv", "id,label,prediction\n" + first + ",1,1\n\"" + second + "\",1,1\n");
        assertFails(file, "line 3", "id '" + second + "' differs from id 'abc' on line 2",
                "only by " + how + ",", "formatting mismatch");
    }

    @Test
    void idsDifferingOnlyByCaseAreDifferentExamplesWithAWarning() throws Exception {
        Path file = write(dir, "cased.csv", "id,label,prediction\nabc,1,1\nAbc,0,1\naBC,1,0\nx,0,0\n");
        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());
        assertThat(data.ids()).containsExactly("abc", "Abc", "aBC", "x");
        assertThat(data.warnings()).singleElement().asString().startsWith("WARNING " + file)
                .contains("id 'Abc' on line 3 differs from id 'abc' on line 2 only by case")
                .contains("2 ids differ from an earlier one only by case");
    }

    @Test
    void emptyId() throws Exception {
        assertFails(write(dir, "noid.csv", "id,label,prediction\nx,1,1\n,1,1\n"), "line 3", "the id is empty");
    }

    @Test
    void emptyLabel() throws Exception {
        assertFails(write(dir, "nolabel.csv", "id,label,prediction\nx,1,1\ny,,1\n"), "line 3",
                "the label 'label' is empty");
    }

    @Test
    void emptyPrediction() throws Exception {
        assertFails(write(dir, "nopred.csv", "id,label,prediction\nx,1,1\ny,1,\n"), "line 3",
                "the predicted label 'prediction' is empty");
    }

    // Double.parseDouble accepts all but the first of these (and turns 1e309 into infinity).
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
            "high|is not a number",
            "NaN|is NaN or infinite",
            "Infinity|is NaN or infinite",
            "-Infinity|is NaN or infinite",
            "0x1p-2|is not a number",
            "0.5f|is not a number",
            "1e309|is too large",
            "''|is empty",
    })
    void scoreThatIsNotAFiniteNumber(String value, String problem) throws Exception {
        Path file = write(dir, "scores.csv", "id,label,score\nx,1,0.5\ny,0," + value + "\n");
        assertFails(file, "line 3", "'score'", problem);
    }

    @Test
    void probabilityThatIsNotANumber() throws Exception {
        assertFails(write(dir, "p.csv", "id,label,p_0,p_1\nx,1,0.5,0.5\ny,0,NaN,0.5\n"), "line 3",
                "'p_0' value 'NaN' is NaN or infinite");
    }

    @ParameterizedTest
    @CsvSource({"-0.1, 1.1", "1.5, -0.5"})
    void probabilityOutsideZeroOne(String p0, String p1) throws Exception {
        Path file = write(dir, "range.csv", "id,label,p_0,p_1\nx,1,0.5,0.5\ny,0," + p0 + "," + p1 + "\n");
        assertFails(file, "line 3", "probability 'p_0' is " + Double.parseDouble(p0) + ", outside [0, 1]",
                "not logits or percentages");
    }

    @Test
    void probabilitiesNotSummingToOneGiveOneWarningNamingTheWorstRow() throws Exception {
        Path file = write(dir, "sums.csv", "id,label,p_0,p_1\n"
                + "a,0,0.5,0.5\n"
                + "b,0,0.6,0.5\n"       // sums to 1.1
                + "c,1,0.1,0.2\n"       // sums to 0.3, the furthest from 1
                + "d,1,0.4,0.6000001\n" // off by 1e-7: within the tolerance
                + "e,1,0.4,0.5\n");     // sums to 0.9
        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());
        assertThat(data.size()).isEqualTo(5);   // nothing dropped
        assertThat(data.warnings()).hasSize(1);
        assertThat(data.warnings().get(0))
                .startsWith("WARNING ")
                .contains("sums.csv", "line 4", "3 of 5 rows", "sums to 0.300000");
    }

    @Test
    void invalidUtf8NamesTheLine() throws Exception {
        byte[] head = "id,label,prediction\nx,1,1\ny,1,1\nz,".getBytes(StandardCharsets.UTF_8);
        byte[] bad = {(byte) 0xC3, (byte) 0x28};   // 0xC3 must be followed by a continuation byte
        byte[] tail = ",1\n".getBytes(StandardCharsets.UTF_8);
        byte[] all = new byte[head.length + bad.length + tail.length];
        System.arraycopy(head, 0, all, 0, head.length);
        System.arraycopy(bad, 0, all, head.length, bad.length);
        System.arraycopy(tail, 0, all, head.length + bad.length, tail.length);
        assertFails(write(dir, "latin.csv", all), "line 4", "not valid UTF-8", "save the file as UTF-8");
    }

    @Test
    void invalidUtf8FarIntoALargeFileNamesTheLine() throws Exception {
        // Past the decoder's buffer, so the line count must carry across buffer refills.
        StringBuilder csv = new StringBuilder("id,label,prediction\n");
        for (int i = 0; i < 5000; i++) csv.append("row").append(i).append(",1,1\n");
        byte[] good = csv.toString().getBytes(StandardCharsets.UTF_8);
        byte[] all = java.util.Arrays.copyOf(good, good.length + 6);
        byte[] bad = {'q', ',', (byte) 0xFF, ',', '1', '\n'};
        System.arraycopy(bad, 0, all, good.length, bad.length);
        assertFails(write(dir, "big.csv", all), "line 5002", "not valid UTF-8");
    }

    @Test
    void predictedLabelThatIsNotAClass() throws Exception {
        assertFails(write(dir, "typo.csv", "id,label,prediction\nx,cat,cat\ny,dog,dgo\nz,dog,cat\n"), "line 3",
                "predicted label 'dgo' is not a class", "[cat, dog]", "check the spelling", "--truth");
    }

    @Test
    void classWithoutProbabilityColumn() throws Exception {
        assertFails(write(dir, "gap.csv", "id,label,p_cat,p_dog\nx,cat,0.9,0.1\ny,bird,0.5,0.5\n"), "line 3",
                "class 'bird' has no probability column 'p_bird'");
    }

    @Test
    void probabilityColumnWithoutClassName() throws Exception {
        assertFails(write(dir, "p.csv", "id,label,p_\nx,1,0.5\n"), "line 1", "probability column 'p_' names no class");
    }

    @Test
    void scoreWithoutAPositiveClass() throws Exception {
        Path file = write(dir, "ab.csv", "id,label,score\nx,a,0.2\ny,b,0.7\n");
        assertFails(file, null, "the score column 'score' needs a positive class", "--positive");
        assertThat(ClassificationReader.read(file, ReadOptions.defaults().withPositive("b")).positiveScores())
                .containsExactly(0.2, 0.7);
    }

    @Test
    void jsonLineThatIsNotJson() throws Exception {
        assertFails(write(dir, "bad.jsonl", "{\"id\": \"x\", \"label\": 1, \"score\": 0.5}\n{\"id\": \"y\", \"label\": 1,\n"),
                "line 2", "not valid JSON", "one complete JSON object per line");
    }

    @Test
    void jsonLineThatIsNotAnObject() throws Exception {
        assertFails(write(dir, "array.jsonl", "[\"x\", 1, 0.5]\n"), "line 1", "expected a JSON object, found array");
    }

    @Test
    void jsonLineMissingAField() throws Exception {
        assertFails(write(dir, "gap.jsonl", "{\"id\": \"x\", \"label\": 1, \"score\": 0.5}\n\n{\"id\": \"y\", \"label\": 0}\n"),
                "line 3", "field 'score' is missing; line 1 has it", "same fields");
    }

    @Test
    void jsonLineWithAnExtraField() throws Exception {
        assertFails(write(dir, "extra.jsonl",
                        "{\"id\": \"x\", \"label\": 1, \"score\": 0.5}\n{\"id\": \"y\", \"label\": 0, \"score\": 0.1, \"p_1\": 0.1}\n"),
                "line 2", "field 'p_1' is not on line 1", "same fields");
    }

    @Test
    void jsonScoreWrittenAsAStringIsReadAsTheNumberButStillStrictly() throws Exception {
        Path quoted = write(dir, "text.jsonl", "{\"id\": \"x\", \"label\": 1, \"score\": \"0.5\"}\n"
                + "{\"id\": \"y\", \"label\": 0, \"score\": 0.25}\n");
        ClassificationData data = ClassificationReader.read(quoted, ReadOptions.defaults());
        assertThat(data.scores()).containsExactly(0.5, 0.25);
        assertFails(write(dir, "nan.jsonl", "{\"id\": \"x\", \"label\": 1, \"score\": 0.5}\n"
                        + "{\"id\": \"y\", \"label\": 0, \"score\": \"NaN\"}\n"),
                "line 2", "'score' value 'NaN' is NaN or infinite");
        assertFails(write(dir, "comma.jsonl", "{\"id\": \"x\", \"label\": 1, \"p_1\": \"0,5\", \"p_0\": 0.5}\n"),
                "line 1", "'p_1' value '0,5' is not a number");
    }

    @Test
    void jsonScoreThatOverflows() throws Exception {
        assertFails(write(dir, "huge.jsonl", "{\"id\": \"x\", \"label\": 1, \"score\": 0.5}\n{\"id\": \"y\", \"label\": 0, \"score\": 1e309}\n"),
                "line 2", "'score' value '1E+309' is too large");
    }

    @Test
    void jsonNumberWhoseExponentIsBeyondBigDecimal() throws Exception {
        // Found by JsonLinesPredictionsFuzzTest: Jackson's BigDecimal parsing threw NumberFormatException.
        assertFails(write(dir, "exponent.jsonl", "{\"id\": \"x\", \"label\": 1, \"score\": 0.5}\n"
                        + "{\"id\": \"y\", \"label\": 0, \"score\": 1e1000000666666666668}\n"),
                "line 2", "a number cannot be read", "plain decimals");
    }

    @Test
    void jsonDuplicateKey() throws Exception {
        assertFails(write(dir, "dupkey.jsonl", "{\"id\": \"x\", \"label\": 1, \"label\": 0, \"score\": 0.5}\n"),
                "line 1", "not valid JSON", "Duplicate field 'label'");
    }

    @Test
    void jsonProbabilityGivenTwice() throws Exception {
        assertFails(write(dir, "twice.jsonl", "{\"id\": \"x\", \"label\": \"a\", \"p_a\": 0.5, \"probabilities\": {\"a\": 0.5, \"b\": 0.5}}\n"),
                "line 1", "class 'a' has a probability both in 'p_a' and in 'probabilities.a'");
    }

    @Test
    void jsonNumbersAndBooleansAsLabelsKeepTheirText() throws Exception {
        Path file = write(dir, "typed.jsonl", "{\"id\": 7, \"label\": true, \"prediction\": false}\n"
                + "{\"id\": 8.50, \"label\": false, \"prediction\": false}\n");
        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());
        assertThat(data.ids()).containsExactly("7", "8.50");
        assertThat(data.classes()).containsExactly("false", "true");
        assertThat(data.positive()).isEqualTo(1);
    }

}
