package org.assay.cli;

import static org.assay.cli.SmallAudit.CLAIMS;
import static org.assay.cli.SmallAudit.PREDICTIONS;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.assay.claims.Claim;
import org.assay.claims.ClaimsReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The bad-input catalogue for documents (issue 9, deliverable 1): claims files, audit files, report
 * templates and PDFs from src/test/resources/bad/, each run through the command line as a user
 * would (check for claims, audit for audit files and templates, extract for PDFs). A rejected file
 * ends with exit code 2 and one line on stderr that names the file and a position, with no stack
 * trace and no output left behind; an accepted one gives the same result as its clean equivalent.
 * Files that hit a size or count limit must say "limit" (the message names the limit).
 */
class BadDocumentFilesTest {
    static final Path BAD = Path.of("src/test/resources/bad");
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir Path tmp;

    private static Path bad(String relative) { return BAD.resolve(relative); }

    /** Exit 2, one or two lines, the first naming the file and then the position, no trace, no output folder. */
    private static void assertRejected(CliRun run, String named, String position, Path out) {
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.errLines()).as(run.err()).hasSizeBetween(1, 2);
        // "assay: <path ending in the file name>, <position>: problem (fix)"
        assertThat(run.errLines().get(0)).startsWith("assay: ").contains(named)
                .contains(position.isEmpty() ? named : named + ", " + position + ": ");
        assertThat(run.err()).doesNotContain("Exception").doesNotContain("\tat ");
        if (out != null) assertThat(out).doesNotExist();
    }

    /** As {@link #assertRejected}, for a limit: the message names the limit and the option that raises it. */
    private static void assertOverLimit(CliRun run, String named, Path out) {
        assertRejected(run, named, "", out);
        assertThat(run.errLines().get(0)).containsPattern("limit [a-z-]+ is \\d+").containsPattern("--limit [a-z-]+=N");
    }

    // ---------------------------------------------------------------- claims files, through `check`

    /** fixture, position, what the message must say. */
    static Stream<Arguments> rejectedClaims() {
        List<Arguments> a = new ArrayList<>();
        a.add(Arguments.of("claims/decimal-comma.yaml", "line 10", "\"94,1\" uses a decimal comma"));
        a.add(Arguments.of("claims/space-in-number.yaml", "line 10", "\"9 4.1\" contains a space inside the number"));
        a.add(Arguments.of("claims/duplicate-claim.yaml", "line 12", "repeats the row, column and metric of the claim at line 7"));
        // "Pr" + Latin-1 é: the 91 bytes before it are the three lines above and 14 bytes of line 4
        a.add(Arguments.of("claims/not-utf8.yaml", "line 4 (byte offset 91)", "not UTF-8 text (byte 0xE9 here)"));
        a.add(Arguments.of("claims/tag-java-url.yaml", "line 3", "the YAML tag !!java.net.URL is not allowed"));
        a.add(Arguments.of("claims/tag-include.yaml", "line 2", "the YAML tag !include is not allowed"));
        a.add(Arguments.of("claims/tag-python-object.yaml", "line 4", "the YAML tag !!python/object/apply:os.system is not allowed"));
        a.add(Arguments.of("claims/duplicate-key.json", "/tables/0/claims/0/value (line 2)", "\"value\" appears twice"));
        a.add(Arguments.of("claims/semicolon-delimiter.csv", "line 1", "separated by ';', not commas"));
        // spelling 1e999999999 out once ran the JVM out of memory
        a.add(Arguments.of("claims/exponent-overflow.yaml", "line 10", "\"1e999999999\" is written with an exponent"));
        // 34 digits once reached the exact granularity arithmetic and ended in an internal error
        a.add(Arguments.of("claims/too-many-digits.yaml", "line 10", "has 34 digits, more than the limit of 15"));
        // a misspelt row in compare once made the comparison vanish without a word
        a.add(Arguments.of("claims/compare-unknown-row.yaml", "line 6", "compare names the row \"Baseilne\""));
        return a.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rejectedClaims")
    void badClaimsFileIsRejectedWithItsPosition(String fixture, String position, String problem) {
        Path out = tmp.resolve("check");
        CliRun run = CliRun.of("check", bad(fixture).toString(), "--out", out.toString());
        assertRejected(run, Path.of(fixture).getFileName().toString(), position, out);
        assertThat(run.errLines().get(0)).contains(problem);
        assertThat(run.out()).isEmpty();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("overLimitClaimsFiles")
    void claimsFileBeyondALimitIsRejected(String fixture, String what) {
        Path out = tmp.resolve("check");
        CliRun run = CliRun.of("check", bad(fixture).toString(), "--out", out.toString());
        assertOverLimit(run, Path.of(fixture).getFileName().toString(), out);
        assertThat(run.errLines().get(0)).contains(what);
    }

    static Stream<Arguments> overLimitClaimsFiles() {
        return Stream.of(
                // nine levels of nine aliases would expand to 9^10 strings; SnakeYAML stops at the 51st alias
                Arguments.of("claims/alias-bomb.yaml", "too many YAML aliases"),
                Arguments.of("claims/nested-10000.json", "--limit depth=N"),
                Arguments.of("claims/nested-10000.yaml", "--limit depth=N"));
    }

    @Test
    void aTagThatNamesAUrlIsNeverFetched() throws Exception {
        // tag-java-url.yaml names http://127.0.0.1:47914/...; listen there and see that nothing called
        try (ServerSocket listener = listenOn(47914)) {
            CliRun run = CliRun.of("check", bad("claims/tag-java-url.yaml").toString(), "--out", tmp.resolve("c").toString());
            assertThat(run.exitCode()).isEqualTo(2);
            if (listener != null) assertThat(acceptedConnection(listener)).as("a connection to the tag's URL").isFalse();
        }
    }

    @Test
    void anIncludeTagReadsNothing() {
        CliRun run = CliRun.of("check", bad("claims/tag-include.yaml").toString(), "--out", tmp.resolve("c").toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.out() + run.err()).doesNotContain("root:").doesNotContain("/bin/");
    }

    @Test
    void aPythonObjectTagRunsNothing() {
        // the tag's command would create assay-tag-ran in the working directory
        Path marker = Path.of("assay-tag-ran");
        assertThat(marker).doesNotExist();
        CliRun run = CliRun.of("check", bad("claims/tag-python-object.yaml").toString(), "--out", tmp.resolve("c").toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(marker).doesNotExist();
    }

    @Test
    void aPercentAboveOneHundredIsReportedInfeasibleNotRefused() throws Exception {
        // accuracy lies in [0, 100] percent by definition: the file is well formed, the claim is impossible,
        // and saying so is what check is for (exit 1 under --fail-on infeasible)
        Path out = tmp.resolve("check");
        CliRun run = CliRun.of("check", bad("claims/percent-above-100.yaml").toString(), "--out", out.toString(),
                "--fail-on", "infeasible");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(1);
        JsonNode findings = JSON.readTree(out.resolve("check.json").toFile()).get("findings");
        List<JsonNode> range = findings(findings, "range", "infeasible");
        assertThat(range).singleElement().satisfies(f -> {
            JsonNode claim = f.get("claims").get(0);
            assertThat(claim.get("printed").asText()).isEqualTo("104.2");
            assertThat(claim.get("line").asInt()).isEqualTo(7);
        });
        // the baseline row beside it is still checked, and no rule stumbled over the impossible value
        assertThat(JSON.readTree(out.resolve("check.json").toFile()).get("checks_run").get("granularity").asInt()).isEqualTo(2);
    }

    @Test
    void anUnknownMetricIsListedByCheckAndRefusedByAudit() throws Exception {
        Path fixture = bad("claims/unknown-metric.yaml");
        Path out = tmp.resolve("check");
        CliRun check = CliRun.of("check", fixture.toString(), "--out", out.toString());
        assertThat(check.exitCode()).as(check.err()).isZero();
        List<JsonNode> metric = findings(JSON.readTree(out.resolve("check.json").toFile()).get("findings"), "metric", "not checked");
        assertThat(metric).singleElement().satisfies(f -> {
            assertThat(f.get("message").asText()).contains("'acuracy'").contains("perhaps accuracy").contains("line 7");
            assertThat(f.get("claims").get(0).get("line").asInt()).isEqualTo(7);
        });
        // an audit cannot compute a metric it does not know: refused, naming the claim
        Path report = tmp.resolve("audit");
        CliRun audit = CliRun.of("audit", "--claims", fixture.toString(), "--predictions", write("p.csv", PREDICTIONS).toString(),
                "--positive", "1", "--row", "Ours", "--out", report.toString(), "--resamples", "200");
        assertRejected(audit, "unknown-metric.yaml", "line 7", report);
        assertThat(audit.errLines().get(0)).contains("unknown metric 'acuracy'");
    }

    @Test
    void aTestSizeBelowTheReproducedSubsampleIsRefused() throws Exception {
        // six predictions cannot be a subsample of a four-item test set
        Path report = tmp.resolve("audit");
        CliRun run = CliRun.of("audit", "--claims", bad("claims/test-size-below-subsample.yaml").toString(),
                "--predictions", write("p.csv", PREDICTIONS).toString(), "--positive", "1", "--out", report.toString(),
                "--resamples", "200");
        assertRejected(run, "test-size-below-subsample.yaml", "line 6", report);
        assertThat(run.errLines().get(0)).contains("test_size 4").contains("hold 6 examples");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("bomAndCrlf")
    void aByteOrderMarkAndCrlfLineEndsReadAsTheCleanFile(String fixture, String cleanName) throws Exception {
        Path dirty = bad(fixture);
        byte[] bytes = Files.readAllBytes(dirty);
        assertThat(bytes).startsWith(0xEF, 0xBB, 0xBF);
        assertThat(new String(bytes, StandardCharsets.UTF_8)).contains("\r\n");
        String cleanText = new String(bytes, 3, bytes.length - 3, StandardCharsets.UTF_8).replace("\r\n", "\n");
        Path clean = write(cleanName, cleanText);

        JsonNode a = checkJson(dirty, "dirty"), b = checkJson(clean, "clean");
        assertThat(a.get("findings")).isEqualTo(b.get("findings"));
        assertThat(a.get("counts")).isEqualTo(b.get("counts"));
        assertThat(a.get("checks_run")).isEqualTo(b.get("checks_run"));
        List<Claim> read = ClaimsReader.read(dirty).allClaims();
        assertThat(read).extracting(Claim::row).containsExactly("Ours", "Baseline");   // no BOM or \r in any text
        assertThat(read).extracting(c -> c.value().text()).containsExactly("94.1", "91.3");
    }

    static Stream<Arguments> bomAndCrlf() {
        return Stream.of(Arguments.of("claims/bom-crlf.yaml", "clean.yaml"), Arguments.of("claims/bom-crlf.csv", "clean.csv"));
    }

    private JsonNode checkJson(Path claims, String name) throws IOException {
        Path out = tmp.resolve(name);
        CliRun run = CliRun.of("check", claims.toString(), "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        return JSON.readTree(out.resolve("check.json").toFile());
    }

    // ---------------------------------------------------------------- audit files, through `audit FILE`

    static Stream<Arguments> rejectedAuditFiles() {
        return Stream.of(
                Arguments.of("audit-files/missing-predictions.yaml", "/reproductions/0/predictions", "file not found"),
                Arguments.of("audit-files/unknown-key.yaml", "/margn", "unknown field 'margn'"),
                Arguments.of("audit-files/duplicate-key.yaml", "line 7", "the key 'predictions' is given twice"),
                Arguments.of("audit-files/custom-tag.yaml", "line 2", "the YAML tag !include is not allowed"),
                Arguments.of("audit-files/alias.yaml", "line 6", "YAML aliases (*p) are not allowed"),
                Arguments.of("audit-files/syntax-error.yaml", "line 4", "expected ',' or ']'"),
                Arguments.of("audit-files/list-where-value-belongs.yaml", "/reproductions/0/predictions",
                        "predictions is a list where one value belongs"),
                Arguments.of("audit-files/columns-as-list.yaml", "/reproductions/0/columns", "columns must be a mapping"),
                Arguments.of("audit-files/margin-out-of-range.yaml", "/margin", "margin 150 points is outside (0, 100)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rejectedAuditFiles")
    void badAuditFileIsRejectedWithItsPosition(String fixture, String position, String problem) throws Exception {
        // the audit file beside a valid claims file and the predictions files it may name
        Path dir = Files.createDirectories(tmp.resolve("audit-files"));
        Path audit = Files.copy(bad(fixture), dir.resolve(Path.of(fixture).getFileName()));
        Files.writeString(dir.resolve("claims.yaml"), CLAIMS);
        Files.writeString(dir.resolve("predictions.csv"), PREDICTIONS);
        Files.writeString(dir.resolve("predictions-old.csv"), PREDICTIONS);
        Path out = tmp.resolve("report");
        CliRun run = CliRun.of("audit", audit.toString(), "--out", out.toString(), "--resamples", "200");
        assertRejected(run, audit.getFileName().toString(), position, out);
        assertThat(run.errLines().get(0)).contains(problem);
        assertThat(run.out()).isEmpty();
    }

    // ---------------------------------------------------------------- templates, through `audit --template DIR`

    static Stream<Arguments> rejectedTemplates() {
        return Stream.of(
                Arguments.of("templates/unbalanced-section/report.md.mustache", "line 7", "Mismatched start/end tags"),
                Arguments.of("templates/partial-outside-folder/report.md.mustache", "line 3",
                        "the partial '../../etc/passwd' is not a plain file name"),
                Arguments.of("templates/partial-includes-itself/report.md.mustache", "line 4", "recursion limit"),
                Arguments.of("templates/not-utf8/report.md.mustache", "line 3 (byte offset 14)", "not UTF-8 text (byte 0xE9 here)"),
                Arguments.of("templates/dynamic-partial/report.md.mustache", "line 3", "dynamic partials ({{>*title}}) are not allowed"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rejectedTemplates")
    void badTemplateIsRejectedWithItsPosition(String fixture, String position, String problem) throws Exception {
        Path folder = bad(fixture).getParent();
        Path out = tmp.resolve("report");
        CliRun run = auditWithTemplates(folder, out);
        // the message names the template file inside its folder
        assertRejected(run, folder.getFileName() + "/report.md.mustache", position, out);
        assertThat(run.errLines().get(0)).contains(problem).doesNotContain("root:");
        assertThat(run.out()).isEmpty();
    }

    @Test
    void aTemplateOverTheSizeLimitIsRejected() throws Exception {
        // generated, not committed: one byte over the 1 MiB limit
        Path folder = Files.createDirectories(tmp.resolve("oversize"));
        Files.write(folder.resolve("report.md.mustache"), "x".repeat((1 << 20) + 1).getBytes(StandardCharsets.US_ASCII));
        Path out = tmp.resolve("report");
        CliRun run = auditWithTemplates(folder, out);
        assertOverLimit(run, "oversize/report.md.mustache", out);
        assertThat(run.errLines().get(0)).contains("--limit template-bytes=N");
    }

    private CliRun auditWithTemplates(Path folder, Path out) throws IOException {
        return CliRun.of("audit", "--claims", write("claims.yaml", CLAIMS).toString(),
                "--predictions", write("predictions.csv", PREDICTIONS).toString(), "--positive", "1",
                "--template", folder.toString(), "--out", out.toString(), "--resamples", "200");
    }

    // ---------------------------------------------------------------- PDFs, through `extract`

    @Test
    @Timeout(120)   // guards against a hang only; the extraction itself takes well under a second
    void aFormThatDrawsItselfEndsWithAnEmptyResult() {
        Path draft = tmp.resolve("draft.yaml");
        CliRun run = CliRun.of("extract", bad("pdf/form-draws-itself.pdf").toString(), "--out", draft.toString());
        // PDFBox draws the form once and refuses the recursion: the caption has no table body below it
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).contains("No tables found").contains("1 pages read");
        assertThat(run.err()).isEmpty();
        assertThat(draft).doesNotExist();
    }

    @Test
    @Timeout(120)
    void aPageTreeThatLoopsNamesThePageItCannotReach() {
        Path draft = tmp.resolve("draft.yaml");
        CliRun run = CliRun.of("extract", bad("pdf/page-tree-cycle.pdf").toString(), "--out", draft.toString());
        assertRejected(run, "page-tree-cycle.pdf", "page 2", draft);
        assertThat(run.errLines().get(0)).contains("--pages");
        assertThat(run.out()).isEmpty();
    }

    @Test
    @Timeout(120)
    void javascriptInThePdfIsNeverRunAndTheTablesReadAsWithoutIt() throws Exception {
        Path dir = Files.createDirectories(tmp.resolve("js"));
        Path withScript = dir.resolve("with-script.yaml");
        Path clean = tmp.resolve("clean.yaml");
        CliRun run;
        try (ServerSocket listener = listenOn(BadPdfs.JAVASCRIPT_PORT)) {
            run = CliRun.of("extract", bad("pdf/javascript-open-action.pdf").toString(), "--out", withScript.toString());
            if (listener != null) assertThat(acceptedConnection(listener)).as("a connection from the PDF's script").isFalse();
        }
        assertThat(run.exitCode()).as(run.err()).isZero();
        CliRun reference = CliRun.of("extract", BadPdfs.CLEAN_PAPER.toString(), "--out", clean.toString());
        assertThat(reference.exitCode()).isZero();
        // the same preview, and a draft with the same claims as the clean paper's (the key's 5x5 + 4x3 cells)
        assertThat(run.out().replace(withScript.toString(), "OUT")).isEqualTo(reference.out().replace(clean.toString(), "OUT"));
        List<Claim> a = ClaimsReader.read(withScript).allClaims(), b = ClaimsReader.read(clean).allClaims();
        assertThat(a).hasSize(5 * 5 + 4 * 3);
        assertThat(a).extracting(Claim::row, Claim::column, c -> c.value().text(), Claim::metric, Claim::page)
                .containsExactlyElementsOf(b.stream().map(c -> org.assertj.core.groups.Tuple.tuple(
                        c.row(), c.column(), c.value().text(), c.metric(), c.page())).toList());
        // nothing else happened: the draft is the only file written, and no script text reached it
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files).containsExactly(withScript);
        }
        assertThat(Files.readString(withScript)).doesNotContain("launchURL").doesNotContain("127.0.0.1");
    }

    @Test
    @Timeout(120)
    void fiveThousandNestedFormsEndWithAnEmptyResult() throws Exception {
        // generated here, never committed: each form draws the next, 5,000 deep (a stack-depth hazard)
        Path pdf = Files.write(tmp.resolve("nested-forms.pdf"), BadPdfs.nestedForms(5_000));
        Path draft = tmp.resolve("draft.yaml");
        CliRun run = CliRun.of("extract", pdf.toString(), "--out", draft.toString());
        if (run.exitCode() == 2) {
            assertRejected(run, "nested-forms.pdf", "page 1", draft);
        } else {
            assertThat(run.exitCode()).as(run.err()).isZero();
            assertThat(run.out()).contains("No tables found").contains("1 pages read");
            assertThat(run.err()).isEmpty();
        }
    }

    @Test
    @Timeout(300)
    void tenThousandPagesAreOverThePageLimit() throws Exception {
        // generated here, never committed
        Path pdf = Files.write(tmp.resolve("ten-thousand-pages.pdf"), BadPdfs.pages(10_000));
        Path draft = tmp.resolve("draft.yaml");
        CliRun run = CliRun.of("extract", pdf.toString(), "--out", draft.toString());
        assertOverLimit(run, "ten-thousand-pages.pdf", draft);
        assertThat(run.errLines().get(0)).contains("10000 pages");
        assertThat(run.out()).isEmpty();
    }

    @Test
    void theCommittedPdfsAreWhatBadPdfsMakes() throws Exception {
        // make.sh is how they are regenerated: it must run this utility on this folder
        assertThat(Files.readString(bad("pdf/make.sh"))).contains("org.assay.cli.BadPdfs src/test/resources/bad/pdf");
        for (Map.Entry<String, byte[]> e : BadPdfs.committed().entrySet()) {
            assertThat(Files.readAllBytes(bad("pdf/" + e.getKey())))
                    .as("%s differs from BadPdfs' output: run bash src/test/resources/bad/pdf/make.sh", e.getKey())
                    .isEqualTo(e.getValue());
        }
    }

    // ---------------------------------------------------------------- helpers

    private Path write(String name, String text) throws IOException {
        return Files.writeString(tmp.resolve(name), text);
    }

    private static List<JsonNode> findings(JsonNode findings, String rule, String kind) {
        List<JsonNode> out = new ArrayList<>();
        for (JsonNode f : findings) {
            if (f.get("rule").asText().equals(rule) && f.get("kind").asText().equals(kind)) out.add(f);
        }
        return out;
    }

    /** A listener on 127.0.0.1:port, or null when the port is taken (the no-connection check is then skipped). */
    private static ServerSocket listenOn(int port) {
        try {
            return new ServerSocket(port, 50, InetAddress.getLoopbackAddress());
        } catch (IOException e) {
            return null;
        }
    }

    /** Whether anything connected: a connection made during the run waits in the backlog. */
    private static boolean acceptedConnection(ServerSocket listener) throws IOException {
        listener.setSoTimeout(200);
        try (Socket s = listener.accept()) {
            return true;
        } catch (SocketTimeoutException e) {
            return false;
        }
    }
}
