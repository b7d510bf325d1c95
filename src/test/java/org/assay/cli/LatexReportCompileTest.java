package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.assay.testing.Pdflatex;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The LaTeX reports as a user gets them: {@code --format tex} output compiled by pdflatex (Debian TeX Live,
 * shell escape off, stopping at the first error) and read back by poppler's pdftotext. The values the PDF
 * must show are re-derived from report.json and check.json, not taken from the LaTeX. Skipped, with the
 * reason, where pdflatex or pdftotext is missing.
 */
class LatexReportCompileTest {
    @TempDir Path tmp;

    @BeforeEach
    void tools() { Pdflatex.assumeInstalled(); }

    @ParameterizedTest
    @ValueSource(strings = {"birdcalls", "harbour"})
    void demoClaimsTableCompilesAndShowsEveryReproducedValueWithItsVerdict(String scenario) throws Exception {
        Path out = tmp.resolve(scenario);
        CliRun run = CliRun.of("demo", "--scenario", scenario, "--out", out.toString(), "--format", "tex,json",
                "--resamples", "1000");
        assertThat(run.exitCode()).as(run.err()).isZero();
        Path pdf = Pdflatex.compile(out.resolve("claims-table.tex")).pdf();
        List<String> lines = Pdflatex.text(pdf, true).lines().map(Pdflatex::normalized).toList();
        String text = Pdflatex.normalized(Pdflatex.text(pdf, false));

        JsonNode findings = new ObjectMapper().readTree(out.resolve("report.json").toFile()).get("findings");
        assertThat(findings).isNotEmpty();
        for (JsonNode f : findings) {
            String printed = f.get("printed").asText() + (f.get("scale").asText().equals("percent") ? "%" : "");
            String verdict = f.get("verdict").asText();
            List<String> cells;
            if (verdict.equals("not computable")) {
                cells = List.of(printed, "n/a n/a n/a");
            } else {
                JsonNode interval = f.get("interval");
                String size = f.get("test_size").isNull() ? "?" : f.get("test_size").asText();
                cells = List.of(printed, shown(f, f.get("estimate")),
                        "[" + shown(f, interval.get("lower")) + ", " + shown(f, interval.get("upper")) + "]",
                        f.get("n").asText() + " of " + size);
            }
            // the table's row: one line of the page layout holds every number of the claim and ends with
            // the verdict's symbol (a wrapped label continues on the next line)
            String symbol = switch (verdict) {
                case "consistent" -> "=";
                case "inconclusive" -> "?";
                case "discrepant" -> "≠";
                case "not computable" -> "–";
                default -> throw new AssertionError("unknown verdict " + verdict);
            };
            assertThat(lines).as("the row of %s / %s", f.get("row").asText(), f.get("column"))
                    .anyMatch(l -> cells.stream().allMatch(l::contains) && l.endsWith(" " + symbol));
        }
        assertThat(text).contains("= consistent", "? inconclusive", "≠ discrepant", "– not computable");
    }

    /**
     * A value as the report prints it: on the claim's scale (percent ×100), with one decimal more than the
     * printed value, at least two (the rule report.md states for every reproduced number).
     */
    private static String shown(JsonNode finding, JsonNode fraction) {
        String printed = finding.get("printed").asText();
        int dot = printed.indexOf('.');
        int decimals = Math.max(2, (dot < 0 ? 0 : printed.length() - dot - 1) + 1);
        BigDecimal factor = finding.get("scale").asText().equals("percent") ? BigDecimal.valueOf(100) : BigDecimal.ONE;
        return new BigDecimal(fraction.asText()).multiply(factor).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
    }

    @Test
    void checkFindingsCompileAndShowEveryFinding() throws Exception {
        Path out = tmp.resolve("check");
        CliRun run = CliRun.of("check", "examples/birdcalls/claims.yaml", "--out", out.toString(), "--format", "tex,json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        Path pdf = Pdflatex.compile(out.resolve("check-findings.tex")).pdf();
        String text = Pdflatex.normalized(Pdflatex.text(pdf, false)).replace('\u2019', '\'');
        List<String> lines = Pdflatex.text(pdf, true).lines().map(Pdflatex::normalized).toList();

        JsonNode check = new ObjectMapper().readTree(out.resolve("check.json").toFile());
        assertThat(check.get("findings")).isNotEmpty();
        for (JsonNode f : check.get("findings")) {
            assertThat(text).contains(f.get("id").asText(), f.get("kind").asText());
            assertThat(text).contains(Pdflatex.normalized(f.get("message").asText()));
            if (f.hasNonNull("suggestion")) assertThat(text).contains(Pdflatex.normalized(f.get("suggestion").asText()));
        }
        check.get("counts").properties().forEach(e ->
                assertThat(lines).as("count of %s", e.getKey()).contains(e.getKey() + " " + e.getValue().asInt()));
    }

    // Labels a claims file could carry: LaTeX specials, commands that would read a file or run a program,
    // TeX's ^^ notation, catcode changes, T1 ligatures, brackets and a star where LaTeX looks for optional
    // arguments, symbols, Greek and CJK (invented).
    private static final String ROW = "[x] \\input{/etc/passwd} \\write18{pwned} 模型 (ours) a~b "
            + "\\immediate\\openout5=pwned.tex \\openin5=/etc/hostname";
    private static final String BASELINE = "*Baseline_CNN \\catcode`\\{=12 ^^5c^^5c 100% #1 $x$ & {y}";
    private static final String COLUMN = "Accuracy --- ''q'' ,,x";
    private static final String CAPTION = "Photo→Caption ≠ ± – ’ é α ≤ §3 “q” Σ 中文 \\end{document}";
    private static final String TITLE = "Hostile \\def\\x{} paper \\end{tabular}";

    /** Every space-free piece of the hostile labels, as pdftotext reads it back (T1 prints ' as ’). */
    private static final List<String> SHOWN = List.of("[x]", "\\input{/etc/passwd}", "\\write18{pwned}",
            "[U+6A21][U+578B]", "Accuracy", "---", "’’q’’", ",,x", "Photo→Caption", "≠", "±", "–", "’", "é", "α", "≤",
            "§3", "“q”", "Σ", "[U+4E2D][U+6587]", "\\end{document}", "Hostile", "\\def\\x{}", "\\end{tabular}", "a~b",
            "\\immediate\\openout5=pwned.tex", "\\openin5=/etc/hostname");
    private static final List<String> SHOWN_BASELINE = List.of("*Baseline_CNN", "\\catcode`\\{=12", "^^5c^^5c", "100%",
            "#1", "$x$", "&", "{y}");

    @Test
    void hostileLabelsCompileAndArePrintedAsText() throws Exception {
        Path in = tmp.resolve("in");
        Files.createDirectories(in);
        for (String f : List.of("predictions.csv", "subsample.txt")) {
            Files.copy(Path.of("examples/birdcalls", f), in.resolve(f));
        }
        Files.writeString(in.resolve("claims.yaml"), String.join("\n",
                "source: {title: " + yaml(TITLE) + "}",
                "tables:",
                "  - id: T2",
                "    caption: " + yaml(CAPTION),
                "    test_size: 4000",
                "    claims:",
                "      - {row: " + yaml(ROW) + ", column: [" + yaml(COLUMN) + "], metric: accuracy, value: '88.7', scale: percent}",
                "      - {row: " + yaml(ROW) + ", column: ['Macro F1'], metric: macro_f1, value: '84.1', scale: percent}",
                "      - {row: " + yaml(BASELINE) + ", column: [" + yaml(COLUMN) + "], metric: accuracy, value: '83.05', scale: percent}",
                ""));
        Files.writeString(in.resolve("audit.yaml"), String.join("\n",
                "claims: claims.yaml",
                "reproductions:",
                "  - table: T2",
                "    row: " + yaml(ROW),
                "    predictions: predictions.csv",
                "    manifest: subsample.txt",
                "    columns: {id: clip_id, label: species, prediction: predicted}",
                ""));

        CliRun audit = CliRun.of("audit", in.resolve("audit.yaml").toString(), "--out", tmp.resolve("audit").toString(),
                "--format", "tex", "--resamples", "1000");
        assertThat(audit.exitCode()).as(audit.err()).isZero();
        assertShownAsText(Pdflatex.compile(tmp.resolve("audit/claims-table.tex")), SHOWN);

        CliRun check = CliRun.of("check", in.resolve("claims.yaml").toString(), "--out", tmp.resolve("check").toString(),
                "--format", "tex");
        assertThat(check.exitCode()).as(check.err()).isZero();
        List<String> both = new java.util.ArrayList<>(SHOWN);
        both.addAll(SHOWN_BASELINE);
        // the caption and the title are shown; the rows are quoted in the findings' messages
        assertShownAsText(Pdflatex.compile(tmp.resolve("check/check-findings.tex")), both);
    }

    private static void assertShownAsText(Pdflatex.Result compiled, List<String> pieces) throws java.io.IOException {
        String text = Pdflatex.normalized(Pdflatex.text(compiled.pdf(), false));
        for (String piece : pieces) assertThat(text).as("the PDF's text").contains(piece);
        // nothing was run or read: no file opened by \input, no shell command attempted, no passwd content
        assertThat(compiled.log()).doesNotContain("/etc/passwd").doesNotContain("runsystem");
        assertThat(text).doesNotContain("root:");
        // pdflatex's own record of every file it opened (-recorder): it read only the document, its .aux and the
        // TeX installation's files, and wrote only the document's .aux, .log and .pdf (no pwned.tex, no /etc).
        // How it was checked: with Escape.latex returning its input unchanged, pdflatex stops at these labels
        // (\input{/etc/passwd} is tried first) and this test fails.
        String stem = compiled.pdf().getFileName().toString().replaceFirst("\\.pdf$", "");
        assertThat(compiled.recorded()).as("the -recorder list").anyMatch(l -> l.replace("./", "").equals("INPUT " + stem + ".tex"));
        for (String line : compiled.recorded()) {
            if (line.startsWith("PWD ")) continue;
            String file = line.substring(line.indexOf(' ') + 1).replaceFirst("^\\./", "");
            if (line.startsWith("INPUT ")) {
                assertThat(file).as(line).matches("(" + java.util.regex.Pattern.quote(stem) + "\\.(tex|aux)"
                        + "|/usr/share/(texlive|texmf|texmf-dist|fonts)/.*|/var/lib/texmf/.*|/etc/texmf/.*"
                        + "|/usr/local/share/texmf/.*|.*/texmf[^/]*/.*)");
                assertThat(file).as(line).doesNotContain("passwd").doesNotContain("hostname");
            } else {
                assertThat(line).as("pdflatex wrote only its own outputs").startsWith("OUTPUT ");
                assertThat(file).as(line).isIn(stem + ".log", stem + ".aux", stem + ".pdf");
            }
        }
        try (var files = Files.list(compiled.pdf().getParent())) {
            assertThat(files.map(p -> p.getFileName().toString())).noneMatch(n -> n.startsWith("pwned"));
        }
    }

    /** A YAML single-quoted scalar: only the quote itself is doubled. */
    private static String yaml(String s) {
        return "'" + s.replace("'", "''") + "'";
    }
}
