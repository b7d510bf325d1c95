package org.assay.cli;

import static org.assay.cli.SmallAudit.CLAIMS;
import static org.assay.cli.SmallAudit.PREDICTIONS;
import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.assay.common.Limit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every limit against hostile input, through the command line: a file beyond it gives exit 2 and
 * one line that names the file, where, and the {@code --limit NAME=N} that raises it; with the limit
 * raised the same file is read. The limits and their defaults are listed in the README.
 */
class LimitsCommandTest {
    @TempDir Path tmp;

    private static final Path CORPUS = Path.of("src/test/resources/pdf");

    private CliRun audit(Path claims, Path predictions, String... more) {
        List<String> args = new ArrayList<>(List.of("audit", "--claims", claims.toString(), "--predictions",
                predictions.toString(), "--positive", "1", "--resamples", "200"));
        args.addAll(Arrays.asList(more));
        return CliRun.of(args.toArray(String[]::new));
    }

    /** Exit 2, one line naming the file, the limit and the option; nothing written. */
    private static void assertLimitError(CliRun run, Path file, Limit limit, Path out) {
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.errLines()).as(run.err()).hasSize(1);
        assertThat(run.errLines().get(0)).startsWith("assay: ").contains(file.getFileName().toString())
                .contains("limit " + limit.key()).contains("--limit " + limit.key() + "=N")
                .doesNotContain("Exception");
        if (out != null) assertThat(out).doesNotExist();
    }

    @Test
    void rowsColumnsAndFileBytesOfPredictions() throws IOException {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path p = Files.writeString(tmp.resolve("preds.csv"), PREDICTIONS);
        Path out = tmp.resolve("r");
        assertLimitError(audit(c, p, "--out", out.toString(), "--limit", "rows=5"), p, Limit.ROWS, out);
        assertThat(audit(c, p, "--out", out.toString(), "--limit", "rows=6").exitCode()).isZero();
        Path out2 = tmp.resolve("r2");
        assertLimitError(audit(c, p, "--out", out2.toString(), "--limit", "columns=3"), p, Limit.COLUMNS, out2);
        assertLimitError(audit(c, p, "--out", out2.toString(), "--limit", "file-bytes=50"), p, Limit.FILE_BYTES, out2);
        // the option may also stand before the command name
        CliRun before = CliRun.of("--limit", "rows=2", "audit", "--claims", c.toString(), "--predictions", p.toString(),
                "--positive", "1", "--out", out2.toString());
        assertLimitError(before, p, Limit.ROWS, out2);
    }

    @Test
    void rowsOfJsonLinesPredictions() throws IOException {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path p = Files.writeString(tmp.resolve("preds.jsonl"), "{\"id\":\"a\",\"label\":1,\"prediction\":1}\n"
                + "{\"id\":\"b\",\"label\":0,\"prediction\":0}\n{\"id\":\"c\",\"label\":1,\"prediction\":0}\n");
        Path out = tmp.resolve("r");
        assertLimitError(audit(c, p, "--out", out.toString(), "--limit", "rows=2"), p, Limit.ROWS, out);
        assertLimitError(audit(c, p, "--out", out.toString(), "--limit", "columns=2"), p, Limit.COLUMNS, out);
    }

    @Test
    void aLineOf100MegabytesStopsAtTheLineLimit() throws IOException {
        // issue fixture "one line of 100 MB", generated here (not committed): a label field of 100 MiB
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path p = tmp.resolve("long-line.csv");
        try (OutputStream o = Files.newOutputStream(p)) {
            o.write("id,label,prediction,score\na,1,1,0.9\nb,".getBytes(StandardCharsets.US_ASCII));
            byte[] chunk = new byte[1 << 20];
            Arrays.fill(chunk, (byte) '1');
            for (int i = 0; i < 100; i++) o.write(chunk);
            o.write(",0,0.2\n".getBytes(StandardCharsets.US_ASCII));
        }
        Path out = tmp.resolve("r");
        CliRun run = audit(c, p, "--out", out.toString());
        assertLimitError(run, p, Limit.LINE_CHARS, out);
        assertThat(run.err()).contains("line 3");
    }

    @Test
    void lineCharsAlsoGuardsJsonLines() throws IOException {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path p = Files.writeString(tmp.resolve("preds.jsonl"), "{\"id\":\"a\",\"label\":1,\"prediction\":1}\n"
                + "{\"id\":\"" + "b".repeat(500) + "\",\"label\":0,\"prediction\":0}\n");
        Path out = tmp.resolve("r");
        CliRun run = audit(c, p, "--out", out.toString(), "--limit", "line-chars=200");
        assertLimitError(run, p, Limit.LINE_CHARS, out);
        assertThat(run.err()).contains("line 2");
    }

    @Test
    void depthOfJsonLinesAndJsonClaims() throws IOException {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        String deep = "[".repeat(100) + "]".repeat(100);
        Path p = Files.writeString(tmp.resolve("preds.jsonl"), "{\"id\":\"a\",\"label\":1,\"prediction\":1,\"x\":" + deep + "}\n");
        Path out = tmp.resolve("r");
        assertLimitError(audit(c, p, "--out", out.toString()), p, Limit.DEPTH, out);

        Path json = Files.writeString(tmp.resolve("c.json"), "{\"tables\": " + "[".repeat(100) + "]".repeat(100) + "}");
        assertLimitError(CliRun.of("check", json.toString(), "--out", tmp.resolve("x").toString()), json, Limit.DEPTH, null);
        // a JSON claims file nested 70 levels is read once the limit is raised (then fails on its content)
        CliRun raised = CliRun.of("check", json.toString(), "--out", tmp.resolve("x").toString(), "--limit", "depth=200");
        assertThat(raised.exitCode()).isEqualTo(2);
        assertThat(raised.err()).doesNotContain("limit depth");
    }

    @Test
    void yamlAliasesExpandedValuesAndClaimsBytes() throws IOException {
        // Exponential expansion within few aliases (common practice: the "billion laughs" shape).
        StringBuilder y = new StringBuilder("a0: &a0 [x, x, x, x, x, x, x, x, x, x]\n");
        for (int i = 1; i <= 8; i++) {
            y.append("a").append(i).append(": &a").append(i).append(" [");
            for (int k = 0; k < 10; k++) y.append(k == 0 ? "" : ", ").append("*a").append(i - 1);
            y.append("]\n");
        }
        Path bomb = Files.writeString(tmp.resolve("bomb.yaml"), y.toString());
        assertLimitError(CliRun.of("check", bomb.toString(), "--out", tmp.resolve("x").toString()), bomb, Limit.YAML_ALIASES, null);
        CliRun raised = CliRun.of("check", bomb.toString(), "--out", tmp.resolve("x").toString(), "--limit", "yaml-aliases=1000");
        assertLimitError(raised, bomb, Limit.YAML_VALUES, null);

        Path claims = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path out = tmp.resolve("check");
        assertLimitError(CliRun.of("check", claims.toString(), "--out", out.toString(), "--limit", "claims-bytes=100"),
                claims, Limit.CLAIMS_BYTES, out);
        assertThat(CliRun.of("check", claims.toString(), "--out", out.toString()).exitCode()).isZero();
    }

    @Test
    void pdfBytesPagesAndOperators() {
        Path pdf = CORPUS.resolve("long-20pages.pdf");
        Path out = tmp.resolve("claims.yaml");
        assertLimitError(CliRun.of("extract", pdf.toString(), "--out", out.toString(), "--limit", "pdf-pages=19"),
                pdf, Limit.PDF_PAGES, out);
        assertLimitError(CliRun.of("extract", pdf.toString(), "--out", out.toString(), "--limit", "pdf-bytes=1000"),
                pdf, Limit.PDF_BYTES, out);
        CliRun ops = CliRun.of("extract", pdf.toString(), "--out", out.toString(), "--limit", "pdf-operators=10");
        assertLimitError(ops, pdf, Limit.PDF_OPERATORS, out);
        assertThat(ops.err()).contains("page 1");
        assertThat(CliRun.of("extract", pdf.toString(), "--out", out.toString(), "--limit", "pdf-pages=20").exitCode())
                .isZero();
    }

    @Test
    void templateBytes() throws IOException {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        Path p = Files.writeString(tmp.resolve("preds.csv"), PREDICTIONS);
        Path templates = Files.createDirectories(tmp.resolve("templates"));
        Path report = Files.writeString(templates.resolve("report.md.mustache"), "# {{title}}\n" + "x".repeat(200) + "\n");
        Path out = tmp.resolve("r");
        assertLimitError(audit(c, p, "--out", out.toString(), "--template", templates.toString(), "--limit",
                "template-bytes=100"), report, Limit.TEMPLATE_BYTES, out);
    }

    @Test
    void badLimitSettingsAreUsageErrors() throws IOException {
        Path c = Files.writeString(tmp.resolve("c.yaml"), CLAIMS);
        CliRun unknown = CliRun.of("check", c.toString(), "--out", tmp.resolve("x").toString(), "--limit", "lines=5");
        assertThat(unknown.exitCode()).isEqualTo(2);
        assertThat(unknown.errLines()).hasSize(1);
        assertThat(unknown.err()).contains("no such limit").contains("line-chars");
        CliRun zero = CliRun.of("check", c.toString(), "--out", tmp.resolve("x").toString(), "--limit", "rows=0");
        assertThat(zero.exitCode()).isEqualTo(2);
        assertThat(zero.err()).contains("positive whole number");
    }

    @Test
    void theReadmeListsEveryLimitWithItsDefault() throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        for (Limit l : Limit.values()) {
            assertThat(readme).as(l.key()).contains("| `" + l.key() + "` |");
        }
    }
}
