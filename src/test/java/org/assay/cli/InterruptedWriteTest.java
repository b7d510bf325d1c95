package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An audit run with --force over a previous report, stopped with SIGTERM ({@code Process.destroy()} on
 * Linux) in a separate JVM at four moments: at once, while computing, while the new files are being
 * staged, and after the first new file was moved into place. The report folder must then hold either
 * the previous files byte for byte (the first three) or the whole new set (the last: the shutdown hook
 * waits for a set whose moves have begun), never a mixture, and no temporary file.
 *
 * <p>To stop at a known step of the write, the child JVM gets {@code -Dassay.test.writePauseMillis}
 * (OutputDirectory.TestPause: a pause after each staged file and each move) and the test watches the
 * folder. How the test was checked: with the shutdown hook's registration removed from
 * OutputDirectory.Interruption, {@code sigtermWhileStagingLeavesThePreviousReportAndNoTemporaryFile} fails
 * (the staged {@code .assay-tmp} files stay) and {@code sigtermAfterTheFirstMoveLeavesTheWholeNewReport}
 * fails (the folder holds some new files and the rest old).
 */
class InterruptedWriteTest {
    private static final long PAUSE_MILLIS = 300;
    @TempDir static Path shared;
    @TempDir Path tmp;
    private static Path audit;
    private static Path first;
    private Path report;
    private Map<Path, byte[]> previous;

    @BeforeAll
    static void demoAndFirstReport() {
        CliRun demo = CliRun.of("demo", "--out", shared.resolve("demo").toString(), "--resamples", "200", "--format", "json");
        assertThat(demo.exitCode()).as(demo.err()).isZero();
        audit = shared.resolve("demo/inputs/audit.yaml");
        first = shared.resolve("first");
        CliRun run = CliRun.of("audit", audit.toString(), "--out", first.toString(), "--resamples", "200", "--seed", "1",
                "--format", "md,html,json,tex");
        assertThat(run.exitCode()).as(run.err()).isZero();
    }

    @BeforeEach
    void previousReport() throws Exception {
        report = tmp.resolve("report");
        Files.createDirectories(report);
        try (var s = Files.list(first)) {
            for (Path f : s.toList()) Files.copy(f, report.resolve(f.getFileName()));
        }
        previous = OutputOverwriteTest.snapshot(report);
        assertThat(previous).hasSize(7);
    }

    @Test
    void sigtermAtOnceLeavesThePreviousReport() throws Exception {
        Process p = start(200, 0);
        p.destroy();
        assertStoppedBySigterm(p);
        assertPreviousReportIntact();
    }

    @Test
    void sigtermWhileComputingLeavesThePreviousReport() throws Exception {
        // 1,000,000 resamples take about 15 s here (killed after 2 s); start-up and reading the demo take under 1 s
        Process p = start(1_000_000, 0);
        assertThat(p.waitFor(2, TimeUnit.SECONDS)).as("still computing after 2 s").isFalse();
        p.destroy();
        assertStoppedBySigterm(p);
        assertPreviousReportIntact();
    }

    @Test
    void sigtermWhileStagingLeavesThePreviousReportAndNoTemporaryFile() throws Exception {
        Process p = start(200, PAUSE_MILLIS);
        awaitFolder(p, names -> names.stream().anyMatch(n -> n.endsWith(".assay-tmp")), "a staged temporary file");
        p.destroy();
        assertStoppedBySigterm(p);
        assertPreviousReportIntact();
    }

    @Test
    void sigtermAfterTheFirstMoveLeavesTheWholeNewReport() throws Exception {
        Process p = start(200, PAUSE_MILLIS);
        awaitFolder(p, names -> changedFiles() > 0, "the first new file in place");
        p.destroy();
        assertStoppedBySigterm(p);
        Map<Path, byte[]> now = OutputOverwriteTest.snapshot(report);
        assertThat(now.keySet()).isEqualTo(previous.keySet());
        assertThat(changedFiles()).as("every file is the new run's").isEqualTo(previous.size());
        assertThat(new ObjectMapper().readTree(report.resolve("report.json").toFile()).at("/settings/seed").asLong())
                .isEqualTo(2);
    }

    /** Starts {@code assay audit --force} over the previous report (seed 2) in a new JVM. */
    private Process start(int resamples, long pauseMillis) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Dassay.test.writePauseMillis=" + pauseMillis, "-cp", System.getProperty("java.class.path"),
                Main.class.getName(), "audit", audit.toString(), "--out", report.toString(), "--force",
                "--resamples", Integer.toString(resamples), "--seed", "2", "--format", "md,html,json,tex"));
        return new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(tmp.resolve("child.log").toFile()).start();
    }

    /** Watches the report folder (every 5 ms) until {@code condition} holds for its file names. */
    private void awaitFolder(Process p, Predicate<List<String>> condition, String what) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);   // a guard against a hung child only
        while (System.nanoTime() < deadline) {
            List<String> names;
            try (var s = Files.list(report)) {
                names = s.map(f -> f.getFileName().toString()).toList();
            }
            if (condition.test(names)) return;
            if (!p.isAlive()) throw new AssertionError("the run ended before " + what + ": " + Files.readString(tmp.resolve("child.log")));
            Thread.sleep(5);
        }
        p.destroyForcibly();
        throw new AssertionError("no " + what + " within 60 s");
    }

    /** How many of the previous report's files now hold other bytes. */
    private int changedFiles() {
        int changed = 0;
        for (var e : previous.entrySet()) {
            try {
                if (!Arrays.equals(Files.readAllBytes(report.resolve(e.getKey())), e.getValue())) changed++;
            } catch (java.io.IOException gone) {
                changed++;
            }
        }
        return changed;
    }

    /** The child ended through the signal (exit status 128 + 15), not by finishing, and printed no error. */
    private void assertStoppedBySigterm(Process p) throws Exception {
        assertThat(p.waitFor(60, TimeUnit.SECONDS)).as("the child stopped").isTrue();
        assertThat(p.exitValue()).as(Files.readString(tmp.resolve("child.log"))).isEqualTo(143);
        assertThat(Files.readString(tmp.resolve("child.log"))).doesNotContain("Exception");
    }

    /** The folder holds the previous report's files, byte for byte, and nothing else (no temporary file). */
    private void assertPreviousReportIntact() throws Exception {
        Map<Path, byte[]> now = OutputOverwriteTest.snapshot(report);
        assertThat(now.keySet()).as("files in the report folder").isEqualTo(previous.keySet());
        for (var e : previous.entrySet()) {
            assertThat(Arrays.equals(now.get(e.getKey()), e.getValue())).as(e.getKey() + " is the previous file, byte for byte").isTrue();
        }
    }
}
