package org.assay.cli;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The birdcalls demo's inputs rewritten so that labels carry markup: the title and the reproduced row
 * hold {@code <script>} and {@code <img onerror>}, a table caption holds all five characters HTML must
 * escape, and two more tables are added, one reproduced (T3, whose one claim's label is exactly {@code IMG})
 * and one not (T4).
 */
final class HostileDemo {
    static final String SCRIPT = "<script>alert(1)</script>";
    static final String IMG = "<img src=x onerror=alert(1)>";
    static final String ROW = "ChirpNet " + SCRIPT + " " + IMG;
    static final String CAPTION = "Fish & chips <b>bold</b> \"quoted\" 'single'";

    private HostileDemo() {}

    /** Writes the demo's inputs under {@code dir} and rewrites them; returns the audit file. */
    static Path write(Path dir) throws Exception {
        CliRun demo = CliRun.of("demo", "--out", dir.toString(), "--resamples", "1000", "--format", "json");
        if (demo.exitCode() != 0) throw new IllegalStateException(demo.err());
        Path inputs = dir.resolve("inputs");
        Path claims = inputs.resolve("claims.yaml");
        String c = Files.readString(claims)
                .replace("title: \"ChirpNet:", "title: \"" + SCRIPT + " ChirpNet:")
                .replace("\"ChirpNet (ours)\"", yaml(ROW))
                .replace("caption: \"Species identification on the DawnChorus-4k test set\"", "caption: " + yaml(CAPTION));
        c += String.join("\n",
                "  - id: T3",
                "    caption: \"A second reproduced table\"",
                "    test_size: 4000",
                "    claims:",
                "      - row: " + yaml(IMG),   // no column: the claim's label is exactly IMG
                "        metric: accuracy",
                "        value: \"86.0\"",
                "        scale: percent",
                "  - id: T4",
                "    caption: \"A table nobody reproduced\"",
                "    test_size: 4000",
                "    claims:",
                "      - row: \"Someone else\"",
                "        column: [\"Accuracy\"]",
                "        metric: accuracy",
                "        value: \"80.0\"",
                "        scale: percent", "");
        Files.writeString(claims, c);
        Path audit = inputs.resolve("audit.yaml");
        String a = Files.readString(audit).replace("\"ChirpNet (ours)\"", yaml(ROW));
        a += String.join("\n",
                "  - table: T3",
                "    row: " + yaml(IMG),
                "    predictions: predictions.csv",
                "    manifest: subsample.txt",
                "    columns: {id: clip_id, label: species, prediction: predicted}", "");
        Files.writeString(audit, a);
        return audit;
    }

    private static String yaml(String s) { return "\"" + s.replace("\\", "\\\\").replace("\"", "\\\"") + "\""; }
}
