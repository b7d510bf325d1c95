package org.assay.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What the audit file reader refuses that Jackson's YAML reading alone would let through or misread. */
class AuditFileReaderTest {
    @TempDir Path dir;

    @BeforeEach
    void inputs() throws Exception {
        Files.writeString(dir.resolve("claims.yaml"), "tables: []\n");
        Files.writeString(dir.resolve("p.csv"), "id,label,prediction\na,1,1\n");
        Files.writeString(dir.resolve("q.csv"), "id,label,prediction\na,1,1\n");
    }

    private UserInputException refused(String text) throws Exception {
        Path f = Files.writeString(dir.resolve("audit.yaml"), text);
        UserInputException[] caught = new UserInputException[1];
        assertThatThrownBy(() -> AuditFileReader.read(f)).isInstanceOfSatisfying(UserInputException.class, e -> caught[0] = e);
        assertThat(caught[0].where()).isEqualTo(f);
        return caught[0];
    }

    @Test
    void plainFileReads() throws Exception {
        Path f = Files.writeString(dir.resolve("audit.yaml"),
                "claims: !!str claims.yaml\nmargin: !!float 2\nreproductions:\n  - predictions: p.csv\n");
        AuditFileReader.AuditFile a = AuditFileReader.read(f);
        assertThat(a.claims()).isEqualTo(dir.resolve("claims.yaml"));
        assertThat(a.marginPoints()).isEqualTo(2.0);
    }

    @Test
    void customTagsAreRefusedNotDropped() throws Exception {
        // without the guard Jackson drops the tag and reads "claims.yaml" as if it were untagged
        UserInputException e = refused("claims: !include claims.yaml\nreproductions:\n  - predictions: p.csv\n");
        assertThat(e.position()).isEqualTo("line 1");
        assertThat(e.problem()).contains("!include");
        e = refused("claims: claims.yaml\nreproductions:\n  - predictions: !!java.net.URL http://127.0.0.1:9/\n");
        assertThat(e.position()).isEqualTo("line 3");
        assertThat(e.problem()).contains("!!java.net.URL");
    }

    @Test
    void aliasesAreRefusedNotReadAsTheirName() throws Exception {
        // without the guard Jackson reads *p as the text "p"
        UserInputException e = refused("claims: claims.yaml\nnotes: &p p.csv\nreproductions:\n  - predictions: *p\n");
        assertThat(e.position()).isEqualTo("line 4");
        assertThat(e.problem()).contains("*p");
    }

    @Test
    void aKeyGivenTwiceIsRefusedNotOverwritten() throws Exception {
        UserInputException e = refused("claims: claims.yaml\nreproductions:\n  - predictions: p.csv\n    predictions: q.csv\n");
        assertThat(e.position()).isEqualTo("line 4");
        assertThat(e.problem()).isEqualTo("the key 'predictions' is given twice in one mapping");
    }

    @Test
    void syntaxErrorNamesItsLine() throws Exception {
        UserInputException e = refused("claims: claims.yaml\nreproductions: [\n");
        assertThat(e.position()).isEqualTo("line 3");
        assertThat(e.problem()).contains("expected the node content");
    }

    @Test
    void aListOrMappingWhereOneValueBelongsIsRefused() throws Exception {
        // Jackson's asText() gives "" for a list, which resolved to the audit file's own folder
        UserInputException e = refused("claims: [claims.yaml]\nreproductions:\n  - predictions: p.csv\n");
        assertThat(e.position()).isEqualTo("/claims");
        assertThat(e.problem()).isEqualTo("claims is a list where one value belongs");
        e = refused("claims: claims.yaml\nreproductions:\n  - predictions: p.csv\n    positive: {a: 1}\n");
        assertThat(e.position()).isEqualTo("/reproductions/0/positive");
        assertThat(e.problem()).contains("mapping where one value belongs");
        e = refused("claims: claims.yaml\nreproductions:\n  - predictions: p.csv\n    columns: {id: [a, b]}\n");
        assertThat(e.position()).isEqualTo("/reproductions/0/columns/id");
        // and columns written as a list were ignored, reading the default columns instead
        e = refused("claims: claims.yaml\nreproductions:\n  - predictions: p.csv\n    columns: [clip, species]\n");
        assertThat(e.position()).isEqualTo("/reproductions/0/columns");
        assertThat(e.problem()).contains("must be a mapping");
    }

    @Test
    void aMarginOutsideTheRangeNamesTheField() throws Exception {
        for (String m : new String[] {"-5", "0", "100", "1e308"}) {
            UserInputException e = refused("claims: claims.yaml\nmargin: " + m + "\nreproductions:\n  - predictions: p.csv\n");
            assertThat(e.position()).isEqualTo("/margin");
            assertThat(e.problem()).contains("outside (0, 100)");
        }
    }
}
