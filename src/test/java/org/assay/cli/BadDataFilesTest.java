package org.assay.cli;

import static org.assay.cli.SmallAudit.CLAIMS;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The catalogue of bad data files (issue 9, deliverable 1; fixtures under
 * {@code src/test/resources/bad/{predictions,truth,manifests,npy}/}), each run through the command line:
 * classification predictions, truth files and manifests through {@code assay audit} with a small good
 * claims file, score matrices through {@code assay measure --task retrieval}.
 *
 * <p>A rejected file exits 2 with one or two lines on stderr, the first starting "assay: " and naming
 * the file and a position, no stack trace, and no output (no report folder; nothing on stdout for
 * {@code measure}). An accepted file (a byte-order mark, CRLF line ends, a quoted line break in a label,
 * a score written as a JSON string, a big-endian matrix...) gives exactly the result of its clean
 * equivalent, written here by the test.
 */
class BadDataFilesTest {
    @TempDir Path tmp;

    private static final ObjectMapper JSON = new ObjectMapper();

    /** The accuracy claim and a ROC AUC claim, so that the scores matter to the result. */
    private static final String CLAIMS_WITH_AUC = CLAIMS + String.join("\n",
            "      - row: Ours",
            "        column: [AUC]",
            "        metric: roc_auc",
            "        value: \"80.0\"",
            "        scale: percent",
            "");

    /** The clean predictions most fixtures are a damaged copy of (binary, positive class 1). */
    private static final String CLEAN = SmallAudit.PREDICTIONS;

    /** Predictions without a label column, for runs with a truth file. */
    private static final String PREDICTIONS_FOR_TRUTH = "id,prediction\na,1\nb,0\nc,0\nd,0\ne,1\nf,1\n";

    private static final String CLEAN_TRUTH = "id,label\na,1\nb,0\nc,1\nd,0\ne,1\nf,0\n";

    /** The rows of the JSON Lines fixtures, written cleanly. */
    private static final String CLEAN_JSONL = String.join("\n",
            "{\"id\": \"a\", \"label\": \"1\", \"prediction\": \"1\", \"score\": 0.9}",
            "{\"id\": \"b\", \"label\": \"0\", \"prediction\": \"0\", \"score\": 0.2}",
            "{\"id\": \"c\", \"label\": \"1\", \"prediction\": \"0\", \"score\": 0.4}",
            "{\"id\": \"d\", \"label\": \"0\", \"prediction\": \"0\", \"score\": 0.1}",
            "");

    /** The matrix of the .npy fixtures (src/test/reference/bad_npy_fixtures.py), candidate j relevant to query j. */
    private static final float[][] SCORES = {
            {0.9f, 0.1f, 0.3f, 0.2f},
            {0.6f, 0.5f, 0.1f, 0.4f},
            {0.2f, 0.7f, 0.8f, 0.1f},
            {0.3f, 0.9f, 0.4f, 0.2f}};

    private int runs;

    // ---------------------------------------------------------------- rejected files

    /** How a fixture is run. */
    enum Role { PREDICTIONS, MULTICLASS_PREDICTIONS, PREDICTIONS_WITH_TRUTH, TRUTH, TRUTH_WITH_LABELLED_PREDICTIONS, MANIFEST, NPY }

    /** fixture (relative to bad/), how it is run, the position the message names, fragments it must hold. */
    static Stream<Arguments> rejected() {
        List<Arguments> a = new ArrayList<>();
        // predictions: layout
        a.add(reject("predictions/semicolon.csv", Role.PREDICTIONS, "line 1", "separated by semicolons, not by commas"));
        a.add(reject("predictions/tabs.csv", Role.PREDICTIONS, "line 1", "separated by tabs", "name a tab-separated file .tsv"));
        a.add(reject("predictions/header-only.csv", Role.PREDICTIONS, "line 1", "a header but no rows"));
        a.add(reject("predictions/ragged.csv", Role.PREDICTIONS, "line 4", "3 fields but the header has 4"));
        a.add(reject("predictions/unterminated-quote.csv", Role.PREDICTIONS, "line 4", "Missing closing quote"));
        a.add(reject("predictions/latin1.csv", Role.PREDICTIONS, "line 4", "not valid UTF-8"));
        // predictions: numbers
        a.add(reject("predictions/nan-score.csv", Role.PREDICTIONS, "line 4", "'NaN' is NaN or infinite"));
        a.add(reject("predictions/inf-score.csv", Role.PREDICTIONS, "line 4", "'inf' is NaN or infinite"));
        a.add(reject("predictions/overflow-score.csv", Role.PREDICTIONS, "line 4", "'1e309' is too large"));
        a.add(reject("predictions/negative-probability.csv", Role.MULTICLASS_PREDICTIONS, "line 4",
                "'p_fox' is -0.1, outside [0, 1]"));
        a.add(reject("predictions/score-nan-string.jsonl", Role.PREDICTIONS, "line 2", "'score' value 'NaN' is NaN"));
        // predictions: ids and labels
        a.add(reject("predictions/duplicate-id.csv", Role.PREDICTIONS, "line 8", "duplicate id 'c' (also on line 4)"));
        a.add(reject("predictions/whitespace-id.csv", Role.PREDICTIONS, "line 6",
                "id 'c ' differs from id 'c' on line 4 only by surrounding whitespace"));
        a.add(reject("predictions/label-not-in-truth.csv", Role.PREDICTIONS_WITH_TRUTH, "line 4",
                "predicted label '2' is not a class of the ground truth"));
        // predictions: JSON Lines
        a.add(reject("predictions/not-an-object.jsonl", Role.PREDICTIONS, "line 3", "expected a JSON object, found array"));
        a.add(reject("predictions/not-json.jsonl", Role.PREDICTIONS, "line 3", "not valid JSON"));
        a.add(reject("predictions/truncated-last-line.jsonl", Role.PREDICTIONS, "line 4", "not valid JSON",
                "Unexpected end-of-input"));
        // truth files
        a.add(reject("truth/header-only.csv", Role.TRUTH, "line 1", "a header but no rows"));
        a.add(reject("truth/duplicate-id.csv", Role.TRUTH, "line 8", "duplicate id 'c' (also on line 4)"));
        a.add(reject("truth/missing-id.csv", Role.TRUTH, "line 5", "id 'd' is not in the truth file"));
        a.add(reject("truth/whitespace-id.csv", Role.TRUTH, "line 5", "id 'd' is not in the truth file",
                "' d' on line 5 differs only by case or whitespace"));
        a.add(reject("truth/no-label-column.csv", Role.TRUTH, "line 1", "no column 'label'", "--label-column"));
        a.add(reject("truth/empty-label.csv", Role.TRUTH, "line 5", "the label 'label' is empty"));
        a.add(reject("truth/semicolon.tsv", Role.TRUTH, "line 1", "separated by semicolons, not by tabs"));
        a.add(reject("truth/label-disagrees.csv", Role.TRUTH_WITH_LABELLED_PREDICTIONS, "line 4",
                "id 'c' has label '1' here but '0' in the truth file"));
        // manifests
        a.add(reject("manifests/ids-missing-from-predictions.txt", Role.MANIFEST, "line 8",
                "manifest id 'g' has no row in the predictions file", "(and 1 more)"));
        a.add(reject("manifests/duplicate-id.txt", Role.MANIFEST, "line 8", "duplicate id 'b' (also on line 3)"));
        a.add(reject("manifests/whitespace-id.txt", Role.MANIFEST, "line 4", "id 'c' is not in the manifest",
                "'c ' on line 4 differs only by case or whitespace"));
        a.add(reject("manifests/case-id.txt", Role.MANIFEST, "line 4", "id 'c' is not in the manifest",
                "'C' on line 4 differs only by case or whitespace"));
        a.add(reject("manifests/comments-only.txt", Role.MANIFEST, "lines 1-2", "lists no ids"));
        a.add(reject("manifests/latin1.txt", Role.MANIFEST, "line 4", "not valid UTF-8"));
        // score matrices
        a.add(reject("npy/complex.npy", Role.NPY, "header", "dtype '<c8'", "float32 or float64"));
        a.add(reject("npy/object.npy", Role.NPY, "header", "dtype '|O'", "float32 or float64"));
        a.add(reject("npy/vector.npy", Role.NPY, "header", "shape (4,)", "two dimensions"));
        a.add(reject("npy/cube.npy", Role.NPY, "header", "shape (2, 2, 4)", "two dimensions"));
        a.add(reject("npy/fortran-order.npy", Role.NPY, "header", "Fortran (column-major) order", "ascontiguousarray"));
        a.add(reject("npy/truncated-body.npy", Role.NPY, "byte 182", "is truncated", "the file has 54"));
        a.add(reject("npy/bad-magic.npy", Role.NPY, "byte 0", "no \\x93NUMPY magic string"));
        a.add(reject("npy/empty.npy", Role.NPY, "byte 0", "no \\x93NUMPY magic string"));
        a.add(reject("npy/header-length-too-long.npy", Role.NPY, "header", "ends inside its header (182 of 60000 bytes)"));
        a.add(reject("npy/header-length-too-short.npy", Role.NPY, "header", "header that is not a Python dict"));
        a.add(reject("npy/nan.npy", Role.NPY, "row 2, column 1", "the score is NaN"));
        return a.stream();
    }

    private static Arguments reject(String fixture, Role role, String position, String... fragments) {
        return Arguments.of(fixture, role, position, fragments);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rejected")
    void badDataFileExitsTwoWithOneLineNamingFileAndPosition(String fixture, Role role, String position,
                                                             String[] fragments) throws Exception {
        Path file = fixture(fixture);
        Path out = tmp.resolve("report");
        CliRun run = run(role, file, out);

        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.errLines()).as(run.err()).hasSizeBetween(1, 2);
        String line = run.errLines().get(0);
        assertThat(line).startsWith("assay: ").contains(file.getFileName().toString())
                .contains(position + ":").contains(fragments);
        assertThat(run.err()).doesNotContain("Exception").doesNotContain("\tat ");
        assertThat(run.out()).as("no partial output").isEmpty();
        assertThat(out).as("no report folder").doesNotExist();
    }

    private CliRun run(Role role, Path file, Path out) throws IOException {
        return switch (role) {
            case PREDICTIONS -> audit(CLAIMS, file, out, "--positive", "1");
            case MULTICLASS_PREDICTIONS -> audit(CLAIMS, file, out);
            case PREDICTIONS_WITH_TRUTH -> audit(CLAIMS, file, out, "--positive", "1",
                    "--truth", write("truth.csv", CLEAN_TRUTH).toString());
            case TRUTH -> audit(CLAIMS, write("preds.csv", PREDICTIONS_FOR_TRUTH), out, "--positive", "1",
                    "--truth", file.toString());
            case TRUTH_WITH_LABELLED_PREDICTIONS -> audit(CLAIMS, write("preds.csv", CLEAN), out, "--positive", "1",
                    "--truth", file.toString());
            case MANIFEST -> audit(CLAIMS, write("preds.csv", CLEAN), out, "--positive", "1",
                    "--manifest", file.toString());
            case NPY -> measureRetrieval(file);
        };
    }

    // ---------------------------------------------------------------- accepted files

    @Test
    void predictionsWithAByteOrderMarkGiveTheCleanResult() throws Exception {
        // bom.csv: UTF-8 byte-order mark (as spreadsheet programs write) before the header; dropped
        assertSameFindings(CLAIMS_WITH_AUC, fixture("predictions/bom.csv"), write("clean.csv", CLEAN), "--positive", "1");
    }

    @Test
    void predictionsWithCrlfLineEndsGiveTheCleanResult() throws Exception {
        assertSameFindings(CLAIMS_WITH_AUC, fixture("predictions/crlf.csv"), write("clean.csv", CLEAN), "--positive", "1");
    }

    @Test
    void jsonLinesWithAByteOrderMarkAndCrlfGiveTheCleanResult() throws Exception {
        assertSameFindings(CLAIMS_WITH_AUC, fixture("predictions/bom-crlf.jsonl"), write("clean.jsonl", CLEAN_JSONL),
                "--positive", "1");
    }

    @Test
    void aQuotedLineBreakInsideALabelIsPartOfTheLabel() throws Exception {
        // RFC 4180 allows a line break inside a quoted field; the label "grey\nheron" is one class, the
        // same result as the label written "grey heron", and the rows after it keep their file lines
        Path fixture = fixture("predictions/quoted-newline-label.csv");
        String clean = Files.readString(fixture).replace("grey\nheron", "grey heron");
        assertThat(clean).doesNotContain("\"grey\n");
        assertSameFindings(CLAIMS, fixture, write("clean.csv", clean));
    }

    @Test
    void aScoreWrittenAsAJsonStringIsReadAsTheNumber() throws Exception {
        // score-as-string.jsonl writes "score": "0.4" on line 3: the text is the number, so it is read like
        // 0.4 (as the regression reader does); a string that is not a plain decimal is still an error
        // (score-nan-string.jsonl, above). The AUC claim makes the score count.
        Path fixture = fixture("predictions/score-as-string.jsonl");
        assertThat(Files.readString(fixture)).contains("\"score\": \"0.4\"");
        assertSameFindings(CLAIMS_WITH_AUC, fixture, write("clean.jsonl", CLEAN_JSONL), "--positive", "1");
    }

    @Test
    void idsThatDifferOnlyByCaseAreDifferentExamplesWithAVisibleWarning() throws Exception {
        // case-id.csv has 'c' (line 4) and 'C' (line 6): case-sensitive ids exist in real datasets, so both
        // are kept as different examples; the report and stderr say so
        Path fixture = fixture("predictions/case-id.csv");
        Path out = tmp.resolve("case-report");
        CliRun run = audit(CLAIMS, fixture, out, "--positive", "1");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String warning = "id 'C' on line 6 differs from id 'c' on line 4 only by case";
        assertThat(run.errLines()).filteredOn(l -> l.contains(warning)).singleElement().asString()
                .startsWith("assay: WARNING").contains("case-id.csv").contains("count as different examples");
        JsonNode report = JSON.readTree(out.resolve("report.json").toFile());
        assertThat(report.get("warnings").toString()).contains(warning);
        assertThat(report.get("findings").get(0).get("n").asInt()).isEqualTo(6);
        // the clean file with 'e' in place of 'C' gives the same numbers: nothing was merged or dropped
        Path clean = write("clean.csv", Files.readString(fixture).replace("C,1,1,0.8", "e,1,1,0.8"));
        assertThat(findings(CLAIMS, clean, "--positive", "1")).isEqualTo(report.get("findings"));
    }

    @Test
    void truthWithAByteOrderMarkAndCrlfGivesTheCleanResult() throws Exception {
        Path predictions = write("preds.csv", PREDICTIONS_FOR_TRUTH);
        JsonNode fromFixture = findings(CLAIMS, predictions, "--positive", "1", "--truth", fixture("truth/bom-crlf.csv").toString());
        JsonNode clean = findings(CLAIMS, predictions, "--positive", "1", "--truth", write("truth.csv", CLEAN_TRUTH).toString());
        assertThat(fromFixture).isEqualTo(clean);
    }

    @Test
    void manifestWithAByteOrderMarkAndCrlfGivesTheCleanResult() throws Exception {
        Path predictions = write("preds.csv", CLEAN);
        Path cleanManifest = write("manifest.txt", "# drawn at random, seed 7\na\nb\nc\nd\ne\nf\n");
        JsonNode fromFixture = findings(CLAIMS, predictions, "--positive", "1", "--manifest",
                fixture("manifests/crlf-bom.txt").toString());
        JsonNode clean = findings(CLAIMS, predictions, "--positive", "1", "--manifest", cleanManifest.toString());
        assertThat(fromFixture).isEqualTo(clean);
    }

    @Test
    void bigEndianMatrixGivesTheLittleEndianResult() throws Exception {
        // '>f4' is read in its own byte order (NpyHeader); same values as the little-endian '<f4' file
        assertSameMetrics(fixture("npy/big-endian.npy"), writeNpy("clean.npy", SCORES));
    }

    @Test
    void npyFormatVersion2GivesTheVersion1Result() throws Exception {
        // version 2.0 has a 4-byte header length (numpy.lib.format); otherwise the same file
        assertSameMetrics(fixture("npy/version-2.npy"), writeNpy("clean.npy", SCORES));
    }

    // ---------------------------------------------------------------- helpers

    private Path fixture(String relative) throws URISyntaxException {
        var url = getClass().getResource("/bad/" + relative);
        assertThat(url).as("fixture bad/" + relative).isNotNull();
        return Path.of(url.toURI());
    }

    private Path write(String name, String text) throws IOException {
        Path dir = Files.createDirectories(tmp.resolve("in" + runs++));
        return Files.writeString(dir.resolve(name), text);
    }

    private CliRun audit(String claims, Path predictions, Path out, String... extra) throws IOException {
        List<String> args = new ArrayList<>(List.of("audit", "--claims", write("claims.yaml", claims).toString(),
                "--predictions", predictions.toString(), "--out", out.toString(), "--resamples", "200",
                "--format", "json"));
        args.addAll(List.of(extra));
        return CliRun.of(args.toArray(String[]::new));
    }

    private CliRun measureRetrieval(Path scores) {
        return CliRun.of("measure", "--task", "retrieval", "--scores", scores.toString(), "--group-size", "1",
                "--metric", "recall_at_k,mrr", "--k", "1,2", "--format", "json", "--resamples", "200");
    }

    /** The findings of report.json after a successful audit. */
    private JsonNode findings(String claims, Path predictions, String... extra) throws IOException {
        Path out = tmp.resolve("report" + runs++);
        CliRun run = audit(claims, predictions, out, extra);
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.err()).as("no warning for " + predictions.getFileName()).doesNotContain("WARNING");
        JsonNode findings = JSON.readTree(out.resolve("report.json").toFile()).get("findings");
        assertThat(findings.size()).isPositive();
        for (JsonNode f : findings) assertThat(f.get("verdict").asText()).isNotEqualTo("not computable");
        return findings;
    }

    private void assertSameFindings(String claims, Path fixture, Path clean, String... extra) throws IOException {
        assertThat(Files.readAllBytes(fixture)).as("the fixture differs from its clean equivalent")
                .isNotEqualTo(Files.readAllBytes(clean));
        assertThat(findings(claims, fixture, extra)).isEqualTo(findings(claims, clean, extra));
    }

    private void assertSameMetrics(Path fixture, Path clean) throws IOException {
        assertThat(Files.readAllBytes(fixture)).isNotEqualTo(Files.readAllBytes(clean));
        JsonNode a = metrics(fixture);
        JsonNode b = metrics(clean);
        assertThat(a).isEqualTo(b);
        // and the clean run is a real result: R@1 counts queries whose own candidate scores highest
        // (rows 0 and 2 of SCORES, by inspection): 2 of 4
        JsonNode r1 = null;
        for (JsonNode m : b) if (m.get("metric").asText().equals("recall_at_k") && m.get("params").get("k").asInt() == 1) r1 = m;
        assertThat(r1).isNotNull();
        assertThat(r1.get("value").asDouble()).isEqualTo(0.5);
    }

    private JsonNode metrics(Path scores) throws IOException {
        CliRun run = measureRetrieval(scores);
        assertThat(run.exitCode()).as(run.err()).isZero();
        return JSON.readTree(run.out()).get("metrics");
    }

    /** A little-endian float32 .npy, format 1.0, as numpy.save writes it (header padded to 64 bytes). */
    private Path writeNpy(String name, float[][] m) throws IOException {
        String dict = "{'descr': '<f4', 'fortran_order': False, 'shape': (" + m.length + ", " + m[0].length + "), }";
        int unpadded = 10 + dict.length() + 1;
        String header = dict + " ".repeat((64 - unpadded % 64) % 64) + "\n";
        ByteBuffer b = ByteBuffer.allocate(10 + header.length() + 4 * m.length * m[0].length).order(ByteOrder.LITTLE_ENDIAN);
        b.put((byte) 0x93).put("NUMPY".getBytes(StandardCharsets.US_ASCII)).put((byte) 1).put((byte) 0);
        b.putShort((short) header.length()).put(header.getBytes(StandardCharsets.US_ASCII));
        for (float[] row : m) for (float v : row) b.putFloat(v);
        Path dir = Files.createDirectories(tmp.resolve("in" + runs++));
        return Files.write(dir.resolve(name), b.array());
    }
}
