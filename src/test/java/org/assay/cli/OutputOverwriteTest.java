package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.assay.report.AuditReports;
import org.assay.report.ReportFormat;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every command that writes files (audit, check, demo, init, sample, extract) refuses to replace an
 * existing file without --force: exit 2, one stderr line naming the file and --force, every file in the
 * folder byte for byte as before, no temporary file left; with --force it replaces them. Checked by
 * making OutputDirectory.checkWritable return without looking: each refusal case then fails (the
 * command exits 0 and the planted file is replaced).
 */
class OutputOverwriteTest {
    @TempDir static Path shared;
    @TempDir Path tmp;
    private static Path demo;

    @BeforeEach
    void demoInputs() {
        if (demo != null) return;
        demo = shared.resolve("demo");
        CliRun run = CliRun.of("demo", "--out", demo.toString(), "--resamples", "200", "--format", "json");
        assertThat(run.exitCode()).as(run.err()).isZero();
    }

    /** The arguments that make {@code command} write into {@code out} (a folder, or a file for sample/extract). */
    private static List<String> args(String command, Path out) {
        String pdf = ExtractCommandTest.CORPUS.resolve("booktabs-bold.pdf").toString();
        return switch (command) {
            case "audit" -> List.of("audit", demo.resolve("inputs/audit.yaml").toString(), "--out", out.toString(),
                    "--resamples", "200", "--format", "md,json");
            case "check" -> List.of("check", demo.resolve("inputs/claims.yaml").toString(), "--out", out.toString(),
                    "--format", "md,json");
            case "demo" -> List.of("demo", "--out", out.toString(), "--resamples", "200", "--format", "md,json");
            case "init" -> List.of("init", "--out", out.toString());
            case "sample" -> List.of("sample", demo.resolve("inputs/test-ids.txt").toString(), "--n", "10", "--out",
                    out.resolve("subsample.txt").toString());
            case "extract" -> List.of("extract", pdf, "--out", out.resolve("claims.csv").toString());
            default -> throw new AssertionError(command);
        };
    }

    @ParameterizedTest
    @ValueSource(strings = {"audit", "check", "demo", "init", "sample", "extract"})
    void noCommandOverwritesWithoutForce(String command) throws Exception {
        Path out = tmp.resolve("out");
        Files.createDirectories(out);
        List<String> args = args(command, out);
        CliRun first = CliRun.of(args.toArray(String[]::new));
        assertThat(first.exitCode()).as(first.err()).isZero();
        Map<Path, byte[]> written = snapshot(out);
        assertThat(written).isNotEmpty();

        // each file the command writes, in turn, is the one that already exists (the others are removed)
        for (Path existing : written.keySet()) {
            for (Path p : written.keySet()) Files.deleteIfExists(out.resolve(p));
            Files.writeString(out.resolve(existing), "mine");
            CliRun refused = CliRun.of(args.toArray(String[]::new));
            assertThat(refused.exitCode()).as(command + " over " + existing + ": " + refused.err()).isEqualTo(2);
            assertThat(refused.errLines()).hasSize(1);
            assertThat(refused.err()).startsWith("assay: ").contains(existing.getFileName().toString())
                    .contains("--force").doesNotContain("Exception");
            assertThat(snapshot(out).keySet()).as("nothing else was written").containsExactly(existing);
            assertThat(Files.readString(out.resolve(existing))).isEqualTo("mine");
        }

        // with --force every file is written again
        for (Path p : written.keySet()) Files.writeString(out.resolve(p), "mine");
        List<String> forced = new ArrayList<>(args);
        forced.add("--force");
        CliRun again = CliRun.of(forced.toArray(String[]::new));
        assertThat(again.exitCode()).as(again.err()).isZero();
        Map<Path, byte[]> after = snapshot(out);
        assertThat(after.keySet()).isEqualTo(written.keySet());
        for (var e : after.entrySet()) assertThat(new String(e.getValue())).as(e.getKey().toString()).isNotEqualTo("mine");
    }

    @Test
    void theNamesCheckedBeforeTheWorkAreTheNamesWritten() throws Exception {
        // audit and demo refuse before computing, from AuditReports.auditFileNames; it must name every file written
        for (String formats : List.of("md", "html", "json", "tex", "md,html,json,tex")) {
            Path out = tmp.resolve(formats.replace(',', '-'));
            CliRun run = CliRun.of("audit", demo.resolve("inputs/audit.yaml").toString(), "--out", out.toString(),
                    "--resamples", "200", "--format", formats);
            assertThat(run.exitCode()).as(run.err()).isZero();
            assertThat(snapshot(out).keySet()).extracting(Path::toString)
                    .containsExactlyInAnyOrderElementsOf(AuditReports.auditFileNames(ReportFormat.parse(formats)));
            Path check = tmp.resolve("check-" + formats.replace(',', '-'));
            CliRun c = CliRun.of("check", demo.resolve("inputs/claims.yaml").toString(), "--out", check.toString(),
                    "--format", formats);
            assertThat(c.exitCode()).as(c.err()).isZero();
            assertThat(snapshot(check).keySet()).extracting(Path::toString)
                    .containsExactlyInAnyOrderElementsOf(AuditReports.checkFileNames(ReportFormat.parse(formats)));
        }
    }

    /** Every regular file under {@code dir} (relative path to bytes); a temporary file would show here too. */
    static Map<Path, byte[]> snapshot(Path dir) throws Exception {
        Map<Path, byte[]> files = new TreeMap<>();
        try (var s = Files.walk(dir)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) files.put(dir.relativize(p), Files.readAllBytes(p));
        }
        return files;
    }
}
