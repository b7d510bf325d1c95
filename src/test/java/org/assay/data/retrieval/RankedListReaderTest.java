package org.assay.data.retrieval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Ranked lists (JSON Lines) against the top-8 lists retrieval_reference.py cut from its untied case. */
class RankedListReaderTest {
    @TempDir Path dir;

    @Test
    void ranksAndDepthEqualTheReference() {
        JsonNode ref = RetrievalFixtures.REFERENCE.get("ranked_lists");
        RetrievalData d = RankedListReader.read(RetrievalFixtures.fixture(ref.get("lists").asText()),
                RetrievalFixtures.fixture(ref.get("relevance").asText()), TiePolicy.DEFAULT, "lists");
        assertThat(d.depth()).isEqualTo(8);
        assertThat(d.queries()).isEqualTo(ref.get("ranks").size());
        for (int q = 0; q < d.queries(); q++) {
            assertThat(d.relevantRanks()[q]).as("query %d", q).containsExactly(RetrievalFixtures.ranks(ref.get("ranks").get(q)));
        }
        // relevant candidates never listed still count as candidates
        assertThat(d.candidates()).isGreaterThanOrEqualTo(8);
    }

    @Test
    void malformedListsNameTheLine() throws Exception {
        Path rel = dir.resolve("rel.json");
        Files.writeString(rel, "{\"q1\": [\"a\"], \"q2\": [\"b\"]}");
        Path lists = dir.resolve("lists.jsonl");
        Files.writeString(lists, "{\"query\": \"q1\", \"ranked\": [\"a\", \"b\"]}\n{\"query\": \"q2\", \"ranked\": [\"b\", \"b\"]}\n");
        assertThatThrownBy(() -> RankedListReader.read(lists, rel, TiePolicy.DEFAULT, "l"))
                .isInstanceOf(UserInputException.class).hasMessageContaining("line 2").hasMessageContaining("'b' twice");
        Files.writeString(lists, "{\"query\": \"q1\", \"ranked\": [\"a\"]}\n{\"query\": \"q1\", \"ranked\": []}\n");
        assertThatThrownBy(() -> RankedListReader.read(lists, rel, TiePolicy.DEFAULT, "l"))
                .hasMessageContaining("line 2").hasMessageContaining("repeats query 'q1'");
        Files.writeString(lists, "{\"query\": \"q1\", \"ranked\": [\"a\"]}\n");
        assertThatThrownBy(() -> RankedListReader.read(lists, rel, TiePolicy.DEFAULT, "l"))
                .hasMessageContaining("query 'q2'");   // relevance for a query without a list
        Files.writeString(lists, "{\"query\": \"q1\", \"ranked\": [\"a\"]\n");
        assertThatThrownBy(() -> RankedListReader.read(lists, rel, TiePolicy.DEFAULT, "l"))
                .hasMessageContaining("line 1").hasMessageContaining("not valid JSON");
    }

    @Test
    void aListedQueryWithoutRelevanceIsAnError() throws Exception {
        Path rel = dir.resolve("rel.csv");
        Files.writeString(rel, "q1,a\n");
        Path lists = dir.resolve("lists.jsonl");
        Files.writeString(lists, "{\"query\": \"q1\", \"ranked\": [\"a\"]}\n{\"query\": \"q2\", \"ranked\": [\"a\"]}\n");
        assertThatThrownBy(() -> RankedListReader.read(lists, rel, TiePolicy.DEFAULT, "l"))
                .hasMessageContaining("query 'q2'").hasMessageContaining("no relevant candidate");
    }
}
