package org.assay.data.retrieval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** CSV score matrices; the two fixtures were written by numpy.savetxt (retrieval_reference.py). */
class CsvScoreMatrixTest {
    @TempDir Path dir;

    private static List<double[]> rows(ScoreMatrix m) {
        List<double[]> out = new ArrayList<>();
        m.scan((r, s) -> out.add(s.clone()));
        return out;
    }

    @Test
    void headerOfCandidateIdsAndMinusInfinityAsNumpyWritesThem() {
        CsvScoreMatrix m = CsvScoreMatrix.open(RetrievalFixtures.fixture("small_header.csv"));
        assertThat(m.columnIds()).containsExactly("c0", "c1", "c2");
        assertThat(m.rows()).isEqualTo(2);
        assertThat(rows(m).get(1)).containsExactly(2.0, 0.125, Double.NEGATIVE_INFINITY);
    }

    @Test
    void withoutHeaderTheFirstLineIsScores() {
        CsvScoreMatrix m = CsvScoreMatrix.open(RetrievalFixtures.fixture("small_plain.csv"));
        assertThat(m.columnIds()).isNull();
        assertThat(rows(m).get(0)).containsExactly(0.5, -1.25, 3.0);
    }

    @Test
    void raggedRowNamesItsLine() throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "a,b,c\n1,2,3\n\n4,5\n");
        assertThatThrownBy(() -> CsvScoreMatrix.open(f)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("line 4").hasMessageContaining("has 2 scores, but the header names 3");
    }

    @Test
    void textInAScoreCellNamesLineAndField() throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "1,2,3\n4,x,6\n");
        assertThatThrownBy(() -> CsvScoreMatrix.open(f)).hasMessageContaining("line 2, field 2")
                .hasMessageContaining("'x' is not a number");
    }

    @Test
    void repeatedCandidateIdInHeaderIsAnError() throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "a,b,a\n1,2,3\n");
        assertThatThrownBy(() -> CsvScoreMatrix.open(f)).hasMessageContaining("the id 'a' twice");
    }

    @Test
    void nanIsRejected() throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "1,nan,3\n");
        assertThatThrownBy(() -> CsvScoreMatrix.open(f)).hasMessageContaining("NaN");
    }
}
