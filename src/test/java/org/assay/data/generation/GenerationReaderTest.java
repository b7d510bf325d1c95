package org.assay.data.generation;

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
 * The generation readers: JSON Lines and parallel plain-text files give the items as written, and
 * every kind of bad input is one UserInputException naming the file, the line and what to do.
 * Lines are physical file lines counted from 1 (common practice for text files).
 */
class GenerationReaderTest {
    @TempDir Path dir;

    private Path write(String name, String content) throws Exception {
        Path file = dir.resolve(name);
        Files.writeString(file, content, StandardCharsets.UTF_8);
        return file;
    }

    private static void assertFails(Runnable read, Path file, String position, String... fragments) {
        assertThatThrownBy(read::run).isInstanceOfSatisfying(UserInputException.class, e -> {
            assertThat(e.where()).isEqualTo(file);
            assertThat(e.position()).isEqualTo(position);
            assertThat(e.fix()).isNotBlank();
            assertThat(e.oneLine()).doesNotContain("\n").contains(fragments);
        });
    }

    private void assertJsonlFails(String content, String position, String... fragments) throws Exception {
        Path file = write("bad.jsonl", content);
        assertFails(() -> GenerationReader.jsonl(file), file, position, fragments);
    }

    @Test
    void jsonLinesKeepTextsAsWrittenAndSkipBlankLines() throws Exception {
        Path file = write("out.jsonl", "{\"id\": \"a\", \"hypothesis\": \"  The cat .\", \"references\": [\"A cat.\", \"the cat\"], \"src\": 1}\n"
                + "\n"
                + "{\"id\": 7, \"hypothesis\": \"x\\ny\", \"references\": [\"z\"]}\n");
        GenerationData d = GenerationReader.jsonl(file);
        assertThat(d.ids()).containsExactly("a", "7");
        assertThat(d.hypotheses()).containsExactly("  The cat .", "x\ny");
        assertThat(d.references()).containsExactly(List.of("A cat.", "the cat"), List.of("z"));
        assertThat(d.warnings()).isEmpty();
        assertThat(d.source()).isEqualTo(file);
    }

    @Test
    void emptyHypothesesAreKeptAndCountedInAWarning() throws Exception {
        Path file = write("out.jsonl", "{\"id\": \"a\", \"hypothesis\": \"\", \"references\": [\"r\"]}\n"
                + "{\"id\": \"b\", \"hypothesis\": \"h\", \"references\": [\"r\"]}\n"
                + "{\"id\": \"c\", \"hypothesis\": \" \\u00a0\", \"references\": [\"r\"]}\n");
        GenerationData d = GenerationReader.jsonl(file);
        assertThat(d.hypotheses()).containsExactly("", "h", " \u00a0");
        assertThat(d.warnings()).singleElement().asString().contains("2 of 3 hypotheses are empty", "lines 1, 3");
    }

    @Test
    void aByteOrderMarkAndCrlfLineEndingsAreAccepted() throws Exception {
        Path file = write("out.jsonl", "\uFEFF{\"id\": \"a\", \"hypothesis\": \"h\", \"references\": [\"r\"]}\r\n"
                + "{\"id\": \"b\", \"hypothesis\": \"h2\", \"references\": [\"r2\"]}\r\n");
        assertThat(GenerationReader.jsonl(file).ids()).containsExactly("a", "b");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            bad JSON                | {"id": "a", "hypothesis": "h", "references": ["r"]                | not valid JSON
            two objects on a line   | {"id": "a", "hypothesis": "h", "references": ["r"]} {"id": "b"}  | not valid JSON
            an array, not an object | ["a", "h", ["r"]]                                                | expected a JSON object, found an array
            missing id              | {"hypothesis": "h", "references": ["r"]}                         | field 'id' is missing
            empty id                | {"id": " ", "hypothesis": "h", "references": ["r"]}              | the id is empty
            id an object            | {"id": {"k": 1}, "hypothesis": "h", "references": ["r"]}         | field 'id' must be a string or a whole number
            missing hypothesis      | {"id": "a", "references": ["r"]}                                 | field 'hypothesis' is missing
            hypothesis null         | {"id": "a", "hypothesis": null, "references": ["r"]}             | field 'hypothesis' must be a string, found null
            hypothesis a number     | {"id": "a", "hypothesis": 3, "references": ["r"]}                | field 'hypothesis' must be a string, found a number (3)
            missing references      | {"id": "a", "hypothesis": "h"}                                   | field 'references' is missing
            reference, singular     | {"id": "a", "hypothesis": "h", "reference": "r"}                 | rename 'reference' to 'references'
            references a string     | {"id": "a", "hypothesis": "h", "references": "r"}                | must be an array of strings, found a string
            references empty        | {"id": "a", "hypothesis": "h", "references": []}                 | field 'references' is an empty array
            a reference a number    | {"id": "a", "hypothesis": "h", "references": ["r", 2]}           | references[1] must be a string, found a number (2)
            a reference empty       | {"id": "a", "hypothesis": "h", "references": ["r", " "]}         | references[1] is empty
            repeated key            | {"id": "a", "id": "b", "hypothesis": "h", "references": ["r"]}   | not valid JSON
            """)
    void eachBadItemIsAnErrorNamingItsLine(String name, String line, String message) throws Exception {
        String good = "{\"id\": \"first\", \"hypothesis\": \"h\", \"references\": [\"r\"]}\n\n";
        assertJsonlFails(good + line + "\n", "line 3", message);
    }

    @Test
    void duplicateIdsAndIdsDifferingBySpaceAreErrorsAndIdsDifferingOnlyByCaseAWarning() throws Exception {
        String a = "{\"id\": \"Item1\", \"hypothesis\": \"h\", \"references\": [\"r\"]}\n";
        assertJsonlFails(a + a, "line 2", "duplicate id 'Item1' (also on line 1)");
        assertJsonlFails(a + a.replace("Item1", "item1 "), "line 2",
                "differs from id 'Item1' on line 1 only by case and surrounding whitespace");
        assertJsonlFails(a + a.replace("Item1", "Item1 "), "line 2",
                "differs from id 'Item1' on line 1 only by surrounding whitespace");
        GenerationData cased = GenerationReader.jsonl(write("cased.jsonl", a + a.replace("Item1", "ITEM1")));
        assertThat(cased.ids()).containsExactly("Item1", "ITEM1");
        assertThat(cased.warnings()).singleElement().asString()
                .contains("id 'ITEM1' on line 2 differs from id 'Item1' on line 1 only by case");
        // a whole-number id and the same id as a string are the same id
        assertJsonlFails(a.replace("\"Item1\"", "12") + a.replace("Item1", "12"), "line 2", "duplicate id '12'");
    }

    @Test
    void anEmptyFileAndBadBytesAreErrors() throws Exception {
        assertJsonlFails("\n  \n", null, "the outputs file is empty");
        Path file = dir.resolve("latin1.jsonl");
        Files.write(file, ("{\"id\": \"a\", \"hypothesis\": \"h\", \"references\": [\"r\"]}\n"
                + "{\"id\": \"b\", \"hypothesis\": \"caf").getBytes(StandardCharsets.UTF_8));
        Files.write(file, new byte[] {(byte) 0xE9, '"', ',', ' '}, java.nio.file.StandardOpenOption.APPEND);
        Files.write(file, "\"references\": [\"r\"]}\n".getBytes(StandardCharsets.UTF_8), java.nio.file.StandardOpenOption.APPEND);
        assertFails(() -> GenerationReader.jsonl(file), file, "line 2", "not valid UTF-8");
    }

    @Test
    void aLoneCarriageReturnIsAnErrorNotALineBreak() throws Exception {
        Path file = write("hyp.txt", "one\ntwo\rthree\n");
        Path ref = write("ref.txt", "1\n2\n3\n");
        assertFails(() -> GenerationReader.parallel(file, List.of(ref)), file, "line 2", "carriage return");
    }

    @Test
    void parallelFilesAlignLineByLineWithLineNumbersAsIds() throws Exception {
        Path hyp = write("hyp.txt", "a cat\r\n\r\nthe dog\r\n");   // CRLF, an empty hypothesis, final newline
        Path ref1 = write("ref1.txt", "the cat\nnothing\nthe dog .\n");
        Path ref2 = write("ref2.txt", "a cat\nnothing here\n\n");                 // a padded empty reference
        GenerationData d = GenerationReader.parallel(hyp, List.of(ref1, ref2));
        assertThat(d.ids()).containsExactly("1", "2", "3");
        assertThat(d.hypotheses()).containsExactly("a cat", "", "the dog");
        assertThat(d.references()).containsExactly(List.of("the cat", "a cat"), List.of("nothing", "nothing here"),
                List.of("the dog ."));
        assertThat(d.warnings()).hasSize(2);
        assertThat(d.warnings().get(0)).contains("1 of 3 hypotheses are empty (line 2)");
        assertThat(d.warnings().get(1)).contains("ref2.txt", "1 empty line(s), the first on line 3");
    }

    @Test
    void aFinalLineWithoutNewlineCountsAndATrailingNewlineAddsNoLine() throws Exception {
        Path hyp = write("hyp.txt", "x\ny");
        Path ref = write("ref.txt", "x\ny\n");
        assertThat(GenerationReader.parallel(hyp, List.of(ref)).size()).isEqualTo(2);
        // a blank line before the end is a line (an empty hypothesis), not a line ending
        Path hyp3 = write("hyp3.txt", "x\ny\n\n");
        assertFails(() -> GenerationReader.parallel(hyp3, List.of(ref)), ref, null,
                "the reference file has 2 lines but the hypotheses file", "hyp3.txt has 3");
    }

    @Test
    void parallelFileErrors() throws Exception {
        Path hyp = write("hyp.txt", "a\nb\n");
        Path ref = write("ref.txt", "a\nb\n");
        Path shorter = write("short.txt", "a\n");
        assertFails(() -> GenerationReader.parallel(hyp, List.of(ref, shorter)), shorter, null,
                "short.txt", "has 1 lines but the hypotheses file", "hyp.txt has 2");
        Path empty = write("empty.txt", "");
        assertFails(() -> GenerationReader.parallel(empty, List.of(ref)), empty, null, "the hypotheses file is empty");
        Path blank = write("blank.txt", "a\n \n");
        assertFails(() -> GenerationReader.parallel(hyp, List.of(blank)), blank, "line 2",
                "empty reference in every reference file (1)");
        assertFails(() -> GenerationReader.parallel(hyp, List.of()), hyp, null, "no reference files");
        Path missing = dir.resolve("nope.txt");
        assertFails(() -> GenerationReader.parallel(hyp, List.of(missing)), missing, null, "reference file not found");
    }

    @Test
    void readPicksTheLayoutByExtension() throws Exception {
        Path jsonl = write("o.ndjson", "{\"id\": \"a\", \"hypothesis\": \"h\", \"references\": [\"r\"]}\n");
        Path hyp = write("hyp.detok", "h\n");
        Path ref = write("ref.detok", "r\n");
        assertThat(GenerationReader.read(jsonl, List.of()).ids()).containsExactly("a");
        assertThat(GenerationReader.read(hyp, List.of(ref)).ids()).containsExactly("1");
        assertFails(() -> GenerationReader.read(jsonl, List.of(ref)), jsonl, null, "carries its own references");
        assertFails(() -> GenerationReader.read(hyp, List.of()), hyp, null, "needs reference files");
    }
}
