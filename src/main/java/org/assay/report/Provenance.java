package org.assay.report;

import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.Properties;

/**
 * What was run, where and with what, for the provenance block of every report: assay's version
 * and build commit, the Java runtime and OS, the working directory and the exact arguments. The
 * settings (seed, resamples, confidence, margin) and the input hashes come with the result. No
 * clock time is recorded, so the same inputs and seed give the same bytes (DESIGN.md principle 5).
 *
 * @param arguments        the command-line arguments after "assay", as given
 * @param workingDirectory the directory relative paths were taken from
 */
public record Provenance(String version, String commit, String java, String os, List<String> arguments,
                         String workingDirectory) {

    public Provenance {
        arguments = List.copyOf(arguments);
    }

    /** The running build, with the given command line. */
    public static Provenance of(List<String> arguments) {
        Properties p = new Properties();
        try (InputStream in = Provenance.class.getResourceAsStream("/assay.properties")) {
            if (in != null) p.load(in);
        } catch (IOException e) {
            // an unreadable properties file leaves the version unknown; nothing else depends on it
        }
        String commit = p.getProperty("commit", "");
        if (commit.isBlank() || commit.startsWith("${")) commit = "unknown";
        else if ("true".equals(p.getProperty("dirty"))) commit += " (with uncommitted changes)";
        return new Provenance(p.getProperty("version", "unknown"), commit,
                System.getProperty("java.vendor") + " " + System.getProperty("java.version"),
                System.getProperty("os.name") + " " + System.getProperty("os.version") + " (" + System.getProperty("os.arch") + ")",
                arguments, System.getProperty("user.dir"));
    }

    /** The command line as a shell would take it back: "assay audit 'my file.yaml' --seed 1". */
    public String command() {
        StringBuilder sb = new StringBuilder("assay");
        for (String a : arguments) sb.append(' ').append(quote(a));
        return sb.toString();
    }

    private static String quote(String a) {
        if (!a.isEmpty() && a.chars().allMatch(c -> Character.isLetterOrDigit(c) || "-_=.,/:@+%".indexOf(c) >= 0)) return a;
        return "'" + a.replace("'", "'\\''") + "'";
    }
}
