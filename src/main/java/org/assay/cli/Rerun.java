package org.assay.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.assay.audit.InputFile;
import org.assay.common.UserInputException;
import org.assay.report.ReportComparison;

/**
 * {@code assay audit --rerun report.json}: checks every input file against the SHA-256 the report
 * recorded, repeats the run from the report's provenance block (same arguments, same working
 * directory, in a fresh process so relative paths mean what they meant), and compares the new
 * report.json with the old one. Only the report folder and formats are replaced; the new report is
 * written to a temporary folder and deleted.
 */
final class Rerun {
    /** Options whose value names where and how the report was written, not what was computed. */
    private static final Set<String> OUTPUT_OPTIONS = Set.of("--out", "--format", "--fail-on", "--template");
    private static final ObjectMapper JSON = new ObjectMapper();

    private Rerun() {}

    /** Returns the exit code: DONE when identical, FAIL_ON_MET when anything differs. */
    static int run(Path reportJson, PrintWriter out) throws IOException {
        JsonNode before = read(reportJson);
        JsonNode prov = before.get("provenance");
        if (prov == null || !prov.has("arguments") || !prov.has("working_directory")) {
            throw new UserInputException(reportJson, "/provenance", "the report has no provenance block to repeat",
                    "rerun works on report.json files written by assay 0.1 or later with provenance");
        }
        List<String> changed = changedInputs(before);
        changed.forEach(c -> out.println("input changed: " + c));
        Path workdir = Path.of(prov.get("working_directory").asText());
        if (!Files.isDirectory(workdir)) {
            throw new UserInputException(reportJson, "/provenance/working_directory",
                    "the recorded working directory " + workdir + " does not exist", "rerun on the machine that made the report");
        }
        Path tmp = Files.createTempDirectory("assay-rerun");
        try {
            List<String> args = new ArrayList<>();
            JsonNode recorded = prov.get("arguments");
            for (int i = 0; i < recorded.size(); i++) {
                String a = recorded.get(i).asText();
                String name = a.contains("=") ? a.substring(0, a.indexOf('=')) : a;
                if (OUTPUT_OPTIONS.contains(name)) {
                    if (!a.contains("=")) i++;   // skip its value too
                    continue;
                }
                if (a.equals("--force")) continue;
                args.add(a);
            }
            args.addAll(List.of("--out", tmp.resolve("report").toString(), "--format", "json"));
            int code = subprocess(args, workdir, tmp.resolve("log.txt"));
            Path again = tmp.resolve("report/report.json");
            if (code != Main.DONE && code != Main.FAIL_ON_MET || !Files.isRegularFile(again)) {
                String log = Files.isRegularFile(tmp.resolve("log.txt")) ? Files.readString(tmp.resolve("log.txt")).strip() : "";
                out.println("rerun failed (exit code " + code + "): " + (log.isEmpty() ? "no output" : log.lines().reduce((x, y) -> y).orElse("")));
                out.println("result: not identical");
                return Main.FAIL_ON_MET;
            }
            List<String> diffs = ReportComparison.differences(before, read(again));
            diffs.forEach(d -> out.println("differs: " + d));
            boolean identical = changed.isEmpty() && diffs.isEmpty();
            out.println("reran: " + String.join(" ", args.subList(0, args.size() - 4)) + " (in " + workdir + ")");
            out.println("result: " + (identical ? "identical" : "not identical"));
            return identical ? Main.DONE : Main.FAIL_ON_MET;
        } finally {
            try (var s = Files.walk(tmp)) {
                s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    /** The inputs whose SHA-256 or size now differs from the recorded one, or which are gone. */
    private static List<String> changedInputs(JsonNode report) {
        List<String> out = new ArrayList<>();
        Path workdir = Path.of(report.get("provenance").get("working_directory").asText());
        for (JsonNode i : report.path("inputs")) {
            Path p = workdir.resolve(i.get("path").asText());
            String role = i.get("role").asText();
            if (!Files.isRegularFile(p)) {
                out.add(role + " " + p + " is missing");
                continue;
            }
            String now = InputFile.of(role, p).sha256();
            if (!now.equals(i.get("sha256").asText())) {
                out.add(role + " " + p + " (sha256 was " + i.get("sha256").asText() + ", now " + now + ")");
            }
        }
        return out;
    }

    /** Runs assay with {@code args} in {@code workdir}, in a new JVM on this one's class path. */
    private static int subprocess(List<String> args, Path workdir, Path log) throws IOException {
        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.add("-cp");
        cmd.add(System.getProperty("java.class.path"));
        cmd.add(Main.class.getName());
        cmd.addAll(args);
        Process p = new ProcessBuilder(cmd).directory(workdir.toFile()).redirectErrorStream(true)
                .redirectOutput(log.toFile()).start();
        try {
            return p.waitFor();
        } catch (InterruptedException e) {
            p.destroyForcibly();
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while rerunning", e);
        }
    }

    private static JsonNode read(Path file) {
        try {
            JsonNode n = JSON.readTree(file.toFile());
            if (n == null || !n.isObject() || !n.has("schema_version") || !n.has("findings")) {
                throw new UserInputException(file, null, "not an assay report.json", "give the report.json an audit wrote");
            }
            return n;
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the report: " + e.getMessage(),
                    "give the report.json an audit wrote");
        }
    }
}
