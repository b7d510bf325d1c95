package org.assay.data;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

import static org.assay.data.Fixtures.resource;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * The same invented predictions written as CSV, TSV and JSON Lines read to the same coded data.
 * Expected values are read off the fixture files by hand.
 */
class ClassificationReaderFormatsTest {

    @ParameterizedTest
    @ValueSource(strings = {"binary.csv", "binary.tsv", "binary.jsonl"})
    void binaryFixtureCodesLabelsAndScores(String name) {
        ClassificationData data = ClassificationReader.read(resource(name), ReadOptions.defaults());

        assertThat(data.source()).isEqualTo(resource(name));
        assertThat(data.ids()).containsExactly("a1", "a2", "a3", "a4", "a5");
        assertThat(data.classes()).containsExactly("0", "1");
        assertThat(data.truth()).containsExactly(0, 1, 1, 0, 1);
        assertThat(data.predicted()).containsExactly(0, 1, 0, 1, 1);
        assertThat(data.scores()).containsExactly(0.10, 0.85, 0.40, 0.70, 0.95);
        assertThat(data.probabilities()).isNull();
        assertThat(data.positive()).isEqualTo(1);   // {0, 1}: "1" is positive (common practice)
        assertThat(data.positiveScores()).containsExactly(0.10, 0.85, 0.40, 0.70, 0.95);
        assertThat(data.warnings()).isEmpty();
    }

    @ParameterizedTest
    @ValueSource(strings = {"multiclass.csv", "multiclass.tsv", "multiclass.jsonl"})
    void multiclassFixtureReordersProbabilitiesAndTakesArgMax(String name) {
        ClassificationData data = ClassificationReader.read(resource(name), ReadOptions.defaults());

        assertThat(data.ids()).containsExactly("m1", "m2", "m3", "m4", "m5");
        // Not numbers, so lexicographic order; the file's column order (cat, dog, bird) does not matter.
        assertThat(data.classes()).containsExactly("bird", "cat", "dog");
        assertThat(data.truth()).containsExactly(1, 2, 0, 1, 2);
        assertThat(data.probabilities().toArray()).containsExactly(
                0.1, 0.7, 0.2,
                0.3, 0.1, 0.6,
                0.6, 0.2, 0.2,
                0.2, 0.3, 0.5,
                0.4, 0.2, 0.4);
        // No prediction column: arg-max; m5 ties dog and bird at 0.4 and gets bird, the lower code.
        assertThat(data.predicted()).containsExactly(1, 2, 0, 2, 0);
        assertThat(data.scores()).isNull();
        assertThat(data.positive()).isEqualTo(-1);
        assertThat(data.warnings()).isEmpty();
    }

    @Test
    void lineNumbersCountTheLinesOfQuotedNewlines(@TempDir Path dir) throws Exception {
        // RFC 4180 (common practice): a quoted field may hold a line break. The note of x1 spans
        // file lines 2-4, so x2 starts on line 5, and its error must say so.
        Path file = Fixtures.write(dir, "notes.csv",
                "id,label,score,note\nx1,0,0.5,\"one\ntwo\nthree\"\nx2,1,oops,fine\n");
        Fixtures.assertUserError(() -> ClassificationReader.read(file, ReadOptions.defaults()),
                file, "line 5", "'score' value 'oops' is not a number");
    }

    @Test
    void utf8ByteOrderMarkIsStripped(@TempDir Path dir) throws Exception {
        byte[] bom = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};
        byte[] body = "id,label,prediction\nx1,pos,neg\nx2,neg,neg\n".getBytes(StandardCharsets.UTF_8);
        byte[] all = new byte[bom.length + body.length];
        System.arraycopy(bom, 0, all, 0, bom.length);
        System.arraycopy(body, 0, all, bom.length, body.length);
        Path file = Fixtures.write(dir, "bom.csv", all);

        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());

        // Without stripping, the first column would be "\uFEFFid" and the id column would be missing.
        assertThat(data.ids()).containsExactly("x1", "x2");
        assertThat(data.classes()).containsExactly("neg", "pos");
        assertThat(data.positive()).isEqualTo(1);
    }

    @Test
    void windowsLineEndingsAndNonAsciiIdsAreRead(@TempDir Path dir) throws Exception {
        Path file = Fixtures.write(dir, "crlf.csv", "id,label,prediction\r\nčaj,b,a\r\nçé,a,a\r\n");
        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());
        assertThat(data.ids()).containsExactly("čaj", "çé");
        assertThat(data.truth()).containsExactly(1, 0);
        assertThat(data.predicted()).containsExactly(0, 0);
    }

    @Test
    void extensionsAreCaseInsensitiveAndTabMeansTsv(@TempDir Path dir) throws Exception {
        Path file = Fixtures.write(dir, "upper.TAB", "id\tlabel\tprediction\nq,1,2\t1\t1\n");
        ClassificationData data = ClassificationReader.read(file, ReadOptions.defaults());
        assertThat(data.ids()).containsExactly("q,1,2");   // a comma is data in a tab-separated file
    }
}
