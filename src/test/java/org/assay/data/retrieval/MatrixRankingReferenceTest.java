package org.assay.data.retrieval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.common.UserInputException;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Ranks, scored depths and sentinel detection against retrieval_reference.py, which builds the
 * optimistic and pessimistic orders with numpy.lexsort and the average ranks with
 * scipy.stats.rankdata(method='average'), independently of the counting done here.
 */
class MatrixRankingReferenceTest {
    @TempDir Path dir;

    @TestFactory
    List<DynamicTest> ranksEqualTheReference() {
        List<DynamicTest> tests = new ArrayList<>();
        for (JsonNode c : RetrievalFixtures.cases()) {
            for (String side : List.of("rows", "columns")) {
                JsonNode dirNode = c.get("directions").get(side);
                for (TiePolicy ties : TiePolicy.values()) {
                    JsonNode ref = dirNode.get("policies").get(ties.name());
                    tests.add(DynamicTest.dynamicTest(c.get("name").asText() + " " + side + " " + ties, () -> {
                        RetrievalData d = RetrievalFixtures.rank(c, side, ties);
                        assertThat(d.depth()).isEqualTo(ref.get("depth").asInt());
                        assertThat(d.scoredDepth()).containsExactly(ReferenceData.ints(ref.get("scored_depth")));
                        JsonNode sentinel = dirNode.get("sentinel");
                        assertThat(d.sentinel()).isEqualTo(sentinel.isNull() ? null : sentinel.asDouble());
                        for (int q = 0; q < d.queries(); q++) {
                            // ranks are whole numbers or halves: exact
                            assertThat(d.relevantRanks()[q]).as("query %d", q)
                                    .containsExactly(RetrievalFixtures.ranks(ref.get("ranks").get(q)));
                        }
                    }));
                }
            }
        }
        assertThat(tests).hasSize(18);
        return tests;
    }

    @Test
    void theSentinelTailIsFoundAndSomeRelevantCandidatesFallInIt() {
        // the reference's groups case fills each image's unscored captions with -100
        JsonNode c = RetrievalFixtures.cases().get(0);
        RetrievalData d = RetrievalFixtures.rank(c, "rows", TiePolicy.DEFAULT);
        assertThat(d.sentinel()).isEqualTo(-100.0);
        assertThat(d.depth()).isLessThan(d.candidates());
        assertThat(d.relevantRanks()[3]).contains(Double.POSITIVE_INFINITY);   // set so by the script
    }

    @Test
    void groupSizeRuleGivesTheReferenceRelevanceInBothDirections() {
        // 14 images x 70 captions, 5 captions per image (retrieval_reference.py case_groups)
        JsonNode c = RetrievalFixtures.cases().get(0);
        Relevance rows = Relevance.groupSize(14, 70, 5);
        Relevance cols = Relevance.groupSizeTransposed(70, 14, 5);
        assertThat(rows).isEqualTo(RetrievalFixtures.relevance(c.get("directions").get("rows").get("relevant"), 70));
        assertThat(cols).isEqualTo(RetrievalFixtures.relevance(c.get("directions").get("columns").get("relevant"), 14));
        assertThat(rows.transposed()).isEqualTo(cols);
        // caption 12 belongs to image 12 / 5 = 2 (common practice for 5-caption benchmarks)
        assertThat(cols.relevant()[12]).containsExactly(2);
        assertThatThrownBy(() -> Relevance.groupSize(14, 69, 5)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("needs 14 x 5 = 70");
    }

    @Test
    void relevanceFilesByIndexAndByIdMatchTheReference() {
        JsonNode c = RetrievalFixtures.cases().get(1);
        Relevance expected = RetrievalFixtures.relevance(c.get("directions").get("rows").get("relevant"), 40);
        List<String> rows = MatrixRanking.ids(null, 31, null, "row");
        List<String> cols = MatrixRanking.ids(null, 40, null, "column");
        assertThat(RelevanceReader.read(RetrievalFixtures.fixture("general_ties_relevance.json"), rows, cols))
                .isEqualTo(expected);
        List<String> q = new ArrayList<>();
        List<String> cand = new ArrayList<>();
        for (int i = 0; i < 31; i++) q.add("q" + i);
        for (int i = 0; i < 40; i++) cand.add("c" + i);
        assertThat(RelevanceReader.read(RetrievalFixtures.fixture("general_ties_relevance.csv"), q, cand))
                .isEqualTo(expected);
    }

    @Test
    void explicitSentinelAndNoSentinel() throws Exception {
        Path f = dir.resolve("m.csv");
        // query 0 scores 2 candidates and fills 3 with -5; query 1 scores everything
        Files.writeString(f, "0.9,-5,0.1,-5,-5\n0.3,0.2,0.8,0.1,0.0\n");
        ScoreMatrix m = CsvScoreMatrix.open(f);
        Relevance rel = new Relevance(2, 5, new int[][] {{1, 2}, {2}});
        RetrievalData given = MatrixRanking.rank(m, MatrixRanking.Side.ROWS, null, null, rel, TiePolicy.PESSIMISTIC,
                SentinelRule.value(-5), "rows");
        assertThat(given.scoredDepth()).containsExactly(2, 5);
        assertThat(given.depth()).isEqualTo(2);
        assertThat(given.relevantRanks()[0]).containsExactly(2.0, Double.POSITIVE_INFINITY);
        // detection finds the same value: -5 is the matrix minimum and repeats in query 0
        assertThat(MatrixRanking.rank(m, MatrixRanking.Side.ROWS, null, null, rel, TiePolicy.PESSIMISTIC,
                SentinelRule.detect(), "rows")).isEqualTo(given);
        // without a sentinel the tail is a tie of three at the bottom: ranks 3..5, pessimistic 5
        RetrievalData none = MatrixRanking.rank(m, MatrixRanking.Side.ROWS, null, null, rel, TiePolicy.PESSIMISTIC,
                SentinelRule.none(), "rows");
        assertThat(none.relevantRanks()[0]).containsExactly(2.0, 5.0);
        assertThat(none.depth()).isEqualTo(5);
        assertThatThrownBy(() -> MatrixRanking.rank(m, MatrixRanking.Side.ROWS, null, null, rel,
                TiePolicy.PESSIMISTIC, SentinelRule.value(0.05), "rows"))
                .isInstanceOf(UserInputException.class).hasMessageContaining("below the sentinel value 0.05");
    }

    @Test
    void aSingleMinimumIsNotASentinel() throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "0.9,-5,0.1\n0.3,0.2,0.8\n");
        RetrievalData d = MatrixRanking.rank(CsvScoreMatrix.open(f), MatrixRanking.Side.ROWS, null, null,
                new Relevance(2, 3, new int[][] {{1}, {0}}), TiePolicy.DEFAULT, SentinelRule.detect(), "rows");
        assertThat(d.sentinel()).isNull();
        assertThat(d.relevantRanks()[0]).containsExactly(3.0);   // last, and that rank is real
    }

    @Test
    void aQueryWithoutRelevantCandidateIsAnError() throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "0.9,0.1\n0.3,0.2\n");
        assertThatThrownBy(() -> MatrixRanking.rank(CsvScoreMatrix.open(f), MatrixRanking.Side.ROWS,
                List.of("img-a", "img-b"), null, new Relevance(2, 2, new int[][] {{1}, {}}), TiePolicy.DEFAULT,
                SentinelRule.detect(), "rows"))
                .isInstanceOf(UserInputException.class).hasMessageContaining("query 'img-b'")
                .hasMessageContaining("no relevant candidate");
    }

    @Test
    void csvHeaderIdsNameTheCandidatesOfTheRowsAndTheQueriesOfTheColumns() throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "x,y\n0.9,0.1\n0.3,0.2\n");
        Path rel = dir.resolve("rel.json");
        Files.writeString(rel, "{\"x\": [\"1\"], \"y\": [0]}");
        ScoreMatrix m = CsvScoreMatrix.open(f);
        Relevance r = RelevanceReader.read(rel, List.of("x", "y"), MatrixRanking.ids(null, 2, m, "row"));
        RetrievalData d = MatrixRanking.rank(m, MatrixRanking.Side.COLUMNS, null, null, r, TiePolicy.DEFAULT,
                SentinelRule.detect(), "columns");
        assertThat(d.queryIds()).containsExactly("x", "y");
        // column x: 0.9 (row 0), 0.3 (row 1): row 1 ranks 2; column y: row 0 has 0.1 < 0.2: rank 2
        assertThat(d.relevantRanks()[0]).containsExactly(2.0);
        assertThat(d.relevantRanks()[1]).containsExactly(2.0);
    }

    @Test
    void relevanceErrorsNameTheFileAndPlace() throws Exception {
        List<String> ids = List.of("0", "1");
        Path json = dir.resolve("rel.json");
        Files.writeString(json, "{\"0\": [\"7\"]}");
        assertThatThrownBy(() -> RelevanceReader.read(json, ids, ids)).hasMessageContaining("rel.json, key \"0\"")
                .hasMessageContaining("candidate '7'");
        Files.writeString(json, "{\"0\": [5]}");
        assertThatThrownBy(() -> RelevanceReader.read(json, ids, ids)).hasMessageContaining("index 5 is outside 0..1");
        Path csv = dir.resolve("rel.csv");
        Files.writeString(csv, "query,candidate\n0,1\n0,1\n");
        assertThatThrownBy(() -> RelevanceReader.read(csv, ids, ids)).hasMessageContaining("line 3")
                .hasMessageContaining("twice");
        Files.writeString(csv, "0,1,2\n");
        assertThatThrownBy(() -> RelevanceReader.read(csv, ids, ids)).hasMessageContaining("line 1")
                .hasMessageContaining("expected query,candidate");
    }
}
