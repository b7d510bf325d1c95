package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.assay.claims.Claim;
import org.assay.claims.ClaimsFile;
import org.assay.claims.ClaimsReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `assay extract` end to end on the pdfTeX corpus (src/test/resources/pdf), and the round trip the
 * issue asks for: extract, fill in test_size, check.
 */
class ExtractCommandTest {
    static final Path CORPUS = Path.of("src/test/resources/pdf");
    @TempDir Path tmp;

    @Test
    void extractThenCheckNeedsOnlyTheTestSize() throws Exception {
        Path claims = tmp.resolve("claims.yaml");
        CliRun extract = CliRun.of("extract", CORPUS.resolve("retrieval-twolevel.pdf").toString(), "--out", claims.toString());
        assertThat(extract.exitCode()).as(extract.err()).isZero();
        // the preview shows the grid with the header path and the bold best value
        assertThat(extract.out()).contains("Image→Text / R@1").contains("**60.8**").contains("Wrote 2 table(s)");
        String draft = Files.readString(claims);
        assertThat(draft).contains("test_size: null").contains("metric: \"recall_at_k\"");

        // Unfilled, the draft already reads and checks; the size-dependent checks wait for test_size.
        CliRun unfilled = CliRun.of("check", claims.toString(), "--out", tmp.resolve("c0").toString());
        assertThat(unfilled.exitCode()).as(unfilled.err()).isZero();

        Files.writeString(claims, draft.replace("test_size: null", "test_size: 5000"));
        CliRun check = CliRun.of("check", claims.toString(), "--out", tmp.resolve("c1").toString());
        assertThat(check.exitCode()).as(check.err()).isZero();
        JsonNode json = new ObjectMapper().readTree(tmp.resolve("c1/check.json").toFile());
        assertThat(json.get("schema_version").asInt()).isEqualTo(1);
        ClaimsFile read = ClaimsReader.read(claims);
        assertThat(read.allClaims()).hasSize(4 * 7 + 4 * 4); // the two tables of the key, every value a claim
        Claim best = read.allClaims().stream().filter(c -> c.value().text().equals("60.8")).findFirst().orElseThrow();
        assertThat(best.bold()).isTrue();
        assertThat(best.metric()).isEqualTo("recall_at_k");
        assertThat(best.params()).containsEntry("k", "1");
        assertThat(best.page()).isEqualTo(1);
    }

    @Test
    void jsonAndCsvDraftsReadBackToTheSameClaims() throws Exception {
        Path pdf = CORPUS.resolve("booktabs-bold.pdf");
        Path yaml = tmp.resolve("c.yaml"), json = tmp.resolve("c.json"), csv = tmp.resolve("c.csv");
        for (Path p : new Path[] {yaml, json, csv}) {
            CliRun run = CliRun.of("extract", pdf.toString(), "--out", p.toString());
            assertThat(run.exitCode()).as(run.err()).isZero();
        }
        ClaimsFile a = ClaimsReader.read(yaml), b = ClaimsReader.read(json), c = ClaimsReader.read(csv);
        assertThat(a.allClaims()).hasSize(5 * 5 + 4 * 3);
        for (ClaimsFile other : new ClaimsFile[] {b, c}) {
            assertThat(other.allClaims()).hasSameSizeAs(a.allClaims());
            for (int i = 0; i < a.allClaims().size(); i++) {
                Claim x = a.allClaims().get(i), y = other.allClaims().get(i);
                assertThat(y.row()).isEqualTo(x.row());
                assertThat(y.column()).isEqualTo(x.column());
                assertThat(y.value().text()).isEqualTo(x.value().text());
                assertThat(y.metric()).isEqualTo(x.metric());
                assertThat(y.scale()).isEqualTo(x.scale());
            }
        }
    }

    @Test
    void draftKeepsProvenanceAndListsCellsThatAreNotNumbers() throws Exception {
        Path out = tmp.resolve("m.json");
        CliRun run = CliRun.of("extract", CORPUS.resolve("markers-missing.pdf").toString(), "--table", "1",
                "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode table = new ObjectMapper().readTree(out.toFile()).get("tables").get(0);
        assertThat(table.get("test_size").isNull()).isTrue();
        assertThat(table.get("page").asInt()).isEqualTo(1);
        // the key (keys/markers-missing.yaml) has 20 cells: 16 values and 4 printed missing marks
        assertThat(table.get("claims")).hasSize(16);
        assertThat(table.get("other_cells")).hasSize(4);
        assertThat(table.get("other_cells").findValuesAsText("kind")).containsOnly("missing");
        JsonNode dagger = null, underlined = null;
        for (JsonNode c : table.get("claims")) {
            if (c.has("markers") && c.get("markers").get(0).asText().equals("†")) dagger = c;
            if (c.path("underline").asBoolean(false) && underlined == null) underlined = c;
            assertThat(c.get("box")).hasSize(4);
            assertThat(c.get("confidence").asDouble()).isBetween(0.0, 1.0);
        }
        assertThat(dagger).isNotNull();
        assertThat(dagger.get("value").asText()).isEqualTo("74.9");
        assertThat(dagger.get("cell").asText()).isEqualTo("74.9%†");
        assertThat(dagger.get("scale").asText()).isEqualTo("percent");
        assertThat(underlined).isNotNull();
        assertThat(table.get("columns").get(0).get("metric").asText()).isEqualTo("accuracy");
        // the preview names what it is unsure of
        assertThat(run.out()).contains("check these (low confidence)");
    }

    @Test
    void refusesToOverwriteWithoutForce() throws Exception {
        Path out = tmp.resolve("claims.yaml");
        Files.writeString(out, "mine");
        String pdf = CORPUS.resolve("booktabs-bold.pdf").toString();
        CliRun refused = CliRun.of("extract", pdf, "--out", out.toString());
        assertThat(refused.exitCode()).isEqualTo(2);
        assertThat(refused.errLines()).hasSize(1);
        assertThat(refused.err()).contains("claims.yaml").contains("--force");
        assertThat(Files.readString(out)).isEqualTo("mine");
        assertThat(CliRun.of("extract", pdf, "--out", out.toString(), "--force").exitCode()).isZero();
        assertThat(Files.readString(out)).contains("tables:");
    }

    @Test
    void tableAndPagesSelectWhatIsExtracted() throws Exception {
        String pdf = CORPUS.resolve("booktabs-bold.pdf").toString();
        CliRun two = CliRun.of("extract", pdf, "--table", "2", "--out", "-");
        assertThat(two.exitCode()).as(two.err()).isZero();
        assertThat(two.out()).contains("id: \"T2\"").doesNotContain("id: \"T1\"");
        assertThat(two.err()).contains("Table 2"); // the preview moves to stderr when the draft goes to stdout
        CliRun page1 = CliRun.of("extract", pdf, "--pages", "1");
        assertThat(page1.out()).contains("Table 1").doesNotContain("Table 2 (page");
        CliRun none = CliRun.of("extract", pdf, "--table", "9");
        assertThat(none.exitCode()).isZero();
        assertThat(none.out()).contains("No tables found");
        CliRun badPages = CliRun.of("extract", pdf, "--pages", "7");
        assertThat(badPages.exitCode()).isEqualTo(2);
        assertThat(badPages.err()).contains("outside the document's 2 pages");
    }

    @Test
    void badPdfsGiveOneLineAndExitTwo() {
        String[][] cases = {
            {"bad/scanned.pdf", "no text layer", "run OCR first"},
            {"bad/encrypted.pdf", "encrypted", "--password"},
            {"bad/truncated.pdf", "truncated", "download it again"},
            {"bad/not-a-pdf.pdf", "not a PDF", ""},
            {"bad/empty.pdf", "empty", ""},
        };
        for (String[] c : cases) {
            CliRun run = CliRun.of("extract", CORPUS.resolve(c[0]).toString(), "--out", tmp.resolve("x.yaml").toString());
            assertThat(run.exitCode()).as(c[0]).isEqualTo(2);
            assertThat(run.errLines()).as(c[0]).hasSize(1);
            assertThat(run.err()).as(c[0]).contains(c[0]).contains(c[1]).contains(c[2]).doesNotContain("Exception");
            assertThat(tmp.resolve("x.yaml")).doesNotExist();
        }
    }

    @Test
    void passwordOpensTheEncryptedPaper() {
        String pdf = CORPUS.resolve("bad/encrypted.pdf").toString();
        CliRun wrong = CliRun.of("extract", pdf, "--password", "nope");
        assertThat(wrong.exitCode()).isEqualTo(2);
        assertThat(wrong.err()).contains("password is wrong");
        CliRun right = CliRun.of("extract", pdf, "--password", "reader-pass");
        assertThat(right.exitCode()).as(right.err()).isZero();
        assertThat(right.out()).contains("Table 1");
        // An owner password alone (empty user password) does not stop reading.
        CliRun owner = CliRun.of("extract", CORPUS.resolve("bad/owner-only.pdf").toString());
        assertThat(owner.exitCode()).as(owner.err()).isZero();
    }

    @Test
    void aPaperWithoutTablesIsNotAnError() {
        CliRun run = CliRun.of("extract", CORPUS.resolve("bad/no-tables.pdf").toString());
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("No tables found");
    }
}
