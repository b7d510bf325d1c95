package org.assay.testing;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Compiles LaTeX with the system's pdflatex (Debian texlive) and reads the PDF back with poppler's
 * pdftotext, for tests that check assay's LaTeX output. Tests call {@link #assumeInstalled()} first:
 * without the tools they are skipped with the reason, never failed.
 */
public final class Pdflatex {
    /** The packages the LaTeX templates load, found by kpsewhich. */
    private static final List<String> PACKAGES = List.of("booktabs.sty", "tabularx.sty", "longtable.sty", "array.sty",
            "geometry.sty", "lmodern.sty", "fontenc.sty", "inputenc.sty");

    private Pdflatex() {}

    /**
     * A compiled document: the PDF, pdflatex's log, and the files pdflatex opened (its {@code -recorder}
     * .fls file: "INPUT path" and "OUTPUT path" lines, absolute or relative to the folder).
     */
    public record Result(Path pdf, String log, List<String> recorded) {}

    /**
     * Skips the calling test unless pdflatex, pdftotext and the packages are installed, and prints why
     * (once per run) so that a skipped compile test is visible in the build log.
     */
    public static void assumeInstalled() {
        String missing = missingTools();
        if (missing != null && REPORTED.compareAndSet(false, true)) {
            System.err.println("LaTeX compile tests skipped: " + missing);
        }
        assumeTrue(missing == null, missing);
    }

    private static final java.util.concurrent.atomic.AtomicBoolean REPORTED = new java.util.concurrent.atomic.AtomicBoolean();
    private static String missingToolsCache;
    private static boolean probed;

    /** Why the tools are unusable, or null when they are all there (probed once per run). */
    private static synchronized String missingTools() {
        if (probed) return missingToolsCache;
        probed = true;
        if (!onPath("pdflatex")) {
            missingToolsCache = "pdflatex not found (apt-get install texlive-latex-base texlive-latex-recommended "
                    + "texlive-latex-extra texlive-fonts-recommended lmodern)";
        } else if (!onPath("pdftotext")) {
            missingToolsCache = "pdftotext not found (apt-get install poppler-utils)";
        } else {
            List<String> missing = new ArrayList<>();
            for (String p : PACKAGES) {
                if (run(Path.of("."), 60, "kpsewhich", p).isBlank()) missing.add(p);
            }
            if (!missing.isEmpty()) {
                missingToolsCache = "LaTeX packages not found by kpsewhich: " + missing
                        + " (apt-get install texlive-latex-recommended lmodern)";
            } else {
                missingToolsCache = smokeTest();
            }
        }
        return missingToolsCache;
    }

    /** A document that uses nothing of assay's: if it does not compile, the installation is broken. */
    private static String smokeTest() {
        try {
            Path dir = Files.createTempDirectory("assay-pdflatex-");
            Files.writeString(dir.resolve("smoke.tex"), "\\documentclass{article}\\usepackage[T1]{fontenc}"
                    + "\\usepackage{lmodern}\\usepackage{booktabs}\\begin{document}smoke\\end{document}\n");
            Finished f = execute(dir, 300, "pdflatex", "-interaction=nonstopmode", "-halt-on-error", "smoke.tex");
            try (var files = Files.list(dir)) {
                files.forEach(p -> p.toFile().delete());
            }
            Files.delete(dir);
            return f.exitCode() == 0 ? null : "pdflatex cannot compile a minimal document (broken installation?): "
                    + tail(f.output(), 3).replace('\n', ' ');
        } catch (IOException e) {
            return "cannot try pdflatex: " + e.getMessage();
        }
    }

    /**
     * Compiles {@code tex} in its own folder twice (the second pass reads back the .aux file the first
     * wrote), with shell escape off and stopping at the first error; fails with the end of the log.
     */
    public static Result compile(Path tex) {
        Path dir = tex.toAbsolutePath().getParent();
        String name = tex.getFileName().toString();
        String stem = name.substring(0, name.length() - ".tex".length());
        for (int pass = 1; pass <= 2; pass++) {
            Finished f = execute(dir, 300, "pdflatex", "-interaction=nonstopmode", "-halt-on-error", "-no-shell-escape",
                    "-recorder", name);
            if (f.exitCode() != 0) {
                throw new AssertionError("pdflatex failed on " + name + " (pass " + pass + "):\n" + tail(f.output(), 40));
            }
        }
        try {
            return new Result(dir.resolve(stem + ".pdf"), Files.readString(dir.resolve(stem + ".log"), StandardCharsets.ISO_8859_1),
                    Files.readAllLines(dir.resolve(stem + ".fls"), StandardCharsets.ISO_8859_1));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The text of a PDF in reading order (pdftotext, UTF-8), or with {@code layout} its physical layout. */
    public static String text(Path pdf, boolean layout) {
        List<String> cmd = new ArrayList<>(List.of("pdftotext", "-enc", "UTF-8"));
        if (layout) cmd.add("-layout");
        cmd.add(pdf.toAbsolutePath().toString());
        cmd.add("-");
        return run(pdf.toAbsolutePath().getParent(), 120, cmd.toArray(String[]::new));
    }

    /**
     * Extracted text with every run of white space made one space, and pdfTeX's ≠ made one character
     * again: pdfTeX draws \neq as a slash (\not) over "=", which pdftotext reports as U+0338 then "=".
     */
    public static String normalized(String text) {
        return text.replaceAll("\u0338\\s*=", "≠").replaceAll("\\s+", " ").strip();
    }

    private static boolean onPath(String tool) {
        String path = System.getenv("PATH");
        if (path == null) return false;
        for (String dir : path.split(File.pathSeparator)) {
            if (Files.isExecutable(Path.of(dir, tool))) return true;
        }
        return false;
    }

    private static String run(Path dir, int seconds, String... cmd) {
        Finished f = execute(dir, seconds, cmd);
        if (f.exitCode() != 0 && !cmd[0].equals("kpsewhich")) {
            throw new AssertionError(String.join(" ", cmd) + " failed:\n" + tail(f.output(), 20));
        }
        return f.output();
    }

    private record Finished(int exitCode, String output) {}

    /** Runs a tool with no input; the time limit only stops a hung tool from hanging the build. */
    private static Finished execute(Path dir, int seconds, String... cmd) {
        Path output = null;
        try {
            output = Files.createTempFile("assay-tool-", ".out");
            Process p = new ProcessBuilder(cmd).directory(dir.toFile()).redirectErrorStream(true)
                    .redirectOutput(output.toFile())
                    .redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null"))).start();
            if (!p.waitFor(seconds, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                throw new AssertionError(String.join(" ", cmd) + " did not finish within " + seconds + " s");
            }
            return new Finished(p.exitValue(), new String(Files.readAllBytes(output), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError(e);
        } finally {
            if (output != null) output.toFile().delete();
        }
    }

    private static String tail(String s, int lines) {
        List<String> all = s.lines().toList();
        return String.join("\n", all.subList(Math.max(0, all.size() - lines), all.size()));
    }
}
