package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same audit run in 8 assay processes at once, on the same demo inputs, into 8 report folders:
 * every report file (md, html, json, tex) is the same bytes in all 8 (DESIGN.md principle 5). Half of the
 * runs use one worker thread (two with {@code --threads 1}, two with the JVM property {@code -Dassay.threads=1}),
 * half the default (all cores), so the same comparison shows that results do not depend on the thread count,
 * for the whole report set.
 *
 * <p>All runs start in the same working directory and name the inputs by the same relative path, so the
 * provenance blocks agree except for the command line, which names each run's own folder
 * ({@code --out run-N}) and, for two of them, {@code --threads 1}. That one piece is replaced by a
 * placeholder before comparing; the test checks that it was found in every file that records the command,
 * and that nothing else differs.
 *
 * <p>How the test was checked: with Estimator's bootstrap seeded by {@code seed + threads - 1} (results that
 * depend on the thread count), it fails on run-1's claims-table.md against run-0's.
 */
class ParallelRunsTest {
    private static final int RUNS = 8;
    /** The varying part of the command line, as text (Markdown, HTML) and as report.json's arguments array. */
    private static final Pattern COMMAND_TEXT = Pattern.compile("--out run-\\d( --threads 1)?");
    private static final Pattern COMMAND_JSON = Pattern.compile("\"--out\", \"run-\\d\"(, \"--threads\", \"1\")?");

    @TempDir Path tmp;

    @Test
    void eightProcessesAtOnceWriteTheSameReportBytesWithOneThreadOrAll() throws Exception {
        Path work = tmp.resolve("demo");
        CliRun demo = CliRun.of("demo", "--out", work.toString(), "--resamples", "200", "--format", "json");
        assertThat(demo.exitCode()).as(demo.err()).isZero();

        List<Process> running = new ArrayList<>();
        for (int i = 0; i < RUNS; i++) {
            List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString()));
            // runs 3 and 7 pin one thread through the JVM property, runs 1 and 5 through the option
            if (i % 4 == 3) cmd.add("-Dassay.threads=1");
            cmd.addAll(List.of("-cp", System.getProperty("java.class.path"), Main.class.getName(),
                    "audit", "inputs/audit.yaml", "--out", "run-" + i));
            if (i % 4 == 1) cmd.addAll(List.of("--threads", "1"));
            cmd.addAll(List.of("--format", "md,html,json,tex", "--resamples", "2000"));
            running.add(new ProcessBuilder(cmd).directory(work.toFile()).redirectErrorStream(true)
                    .redirectOutput(tmp.resolve("run-" + i + ".log").toFile()).start());
        }
        for (int i = 0; i < RUNS; i++) {
            Process p = running.get(i);
            // a guard against a hung child, not a measurement
            assertThat(p.waitFor(5, TimeUnit.MINUTES)).as("run " + i + " finished").isTrue();
            assertThat(p.exitValue()).as(Files.readString(tmp.resolve("run-" + i + ".log"))).isZero();
        }

        Map<String, String> first = normalized(work.resolve("run-0"));
        assertThat(first.keySet()).containsExactlyInAnyOrder("report.md", "replication-notes.md", "reviewer-comments.md",
                "claims-table.md", "report.html", "claims-table.tex", "report.json");
        for (int i = 1; i < RUNS; i++) {
            Map<String, String> other = normalized(work.resolve("run-" + i));
            assertThat(other.keySet()).isEqualTo(first.keySet());
            for (String name : first.keySet()) {
                assertThat(other.get(name)).as("run-" + i + "/" + name + " against run-0/" + name).isEqualTo(first.get(name));
            }
        }
    }

    /** The folder's files with the command line's varying piece replaced; checks where it was found. */
    private static Map<String, String> normalized(Path dir) throws Exception {
        Map<String, String> files = new TreeMap<>();
        try (var s = Files.list(dir)) {
            for (Path p : s.toList()) {
                String name = p.getFileName().toString();
                String text = Files.readString(p, StandardCharsets.UTF_8);
                int found = 0;
                for (Pattern pattern : List.of(COMMAND_TEXT, COMMAND_JSON)) {
                    Matcher m = pattern.matcher(text);
                    StringBuilder sb = new StringBuilder();
                    while (m.find()) {
                        found++;
                        m.appendReplacement(sb, "OUT");
                    }
                    m.appendTail(sb);
                    text = sb.toString();
                }
                // the files with a provenance block name the command once (report.json: the command and the arguments)
                int expected = switch (name) {
                    case "report.json" -> 2;
                    case "report.md", "replication-notes.md", "report.html" -> 1;
                    default -> 0;
                };
                assertThat(found).as("command lines found in " + dir.getFileName() + "/" + name).isEqualTo(expected);
                files.put(name, text);
            }
        }
        return files;
    }
}
