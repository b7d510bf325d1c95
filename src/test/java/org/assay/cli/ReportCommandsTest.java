package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Report formats, editable templates, the user's notes, provenance and --rerun, end to end. */
class ReportCommandsTest {
    @TempDir Path tmp;

    @Test
    void theDemoWritesEveryFormatAndTheProvenanceBlock() throws Exception {
        Path out = tmp.resolve("demo");
        CliRun run = CliRun.of("demo", "--out", out.toString(), "--resamples", "500", "--format", "md,html,json,tex");
        assertThat(run.exitCode()).as(run.err()).isZero();
        for (String f : List.of("report.md", "replication-notes.md", "reviewer-comments.md", "claims-table.md", "report.html",
                "claims-table.tex", "report.json")) {
            assertThat(out.resolve(f)).as(f).exists();
        }
        JsonNode prov = new ObjectMapper().readTree(out.resolve("report.json").toFile()).get("provenance");
        assertThat(prov.get("arguments").toString()).contains("demo", "--resamples", "500");
        assertThat(prov.get("java").asText()).contains(System.getProperty("java.version"));
        assertThat(prov.get("working_directory").asText()).isEqualTo(System.getProperty("user.dir"));
        String md = Files.readString(out.resolve("report.md"));
        // the provenance block names the command, the settings and every input's SHA-256
        assertThat(md).contains("## Provenance").contains("assay demo --out").contains("seed 20240917")
                .contains(new ObjectMapper().readTree(out.resolve("report.json").toFile()).get("inputs").get(1).get("sha256").asText());
        // the cautions are always there, with how the subsample was drawn (the manifest's header)
        assertThat(md).contains("## Cautions").contains("not a validation").contains("simple random sample without replacement of 400 from 4000 ids, seed 4497");
        assertThat(Files.readString(out.resolve("replication-notes.md"))).contains("Deviations found").contains("Macro F1");
    }

    @Test
    void onlyTheChosenFormatsAreWrittenAndAnUnknownOneIsAOneLineError() throws Exception {
        Path out = tmp.resolve("json-only");
        assertThat(CliRun.of("demo", "--out", out.toString(), "--resamples", "200", "--format", "json").exitCode()).isZero();
        try (var files = Files.list(out)) {
            assertThat(files.map(p -> p.getFileName().toString()).sorted().toList()).containsExactly("inputs", "report.json");
        }
        CliRun bad = CliRun.of("demo", "--out", tmp.resolve("x").toString(), "--format", "md,pdf");
        assertThat(bad.exitCode()).isEqualTo(2);
        assertThat(bad.errLines()).hasSize(1);
        assertThat(bad.err()).contains("unknown format 'pdf'");
        assertThat(tmp.resolve("x")).doesNotExist();
    }

    @Test
    void initWritesAStarterAndTemplatesAndRefusesToOverwrite() throws Exception {
        Path out = tmp.resolve("start");
        for (String task : List.of("classification", "retrieval", "generation", "regression")) {
            CliRun run = CliRun.of("init", "--task", task, "--out", out.resolve(task).toString());
            assertThat(run.exitCode()).as(run.err()).isZero();
            assertThat(Files.readString(out.resolve(task).resolve("audit.yaml"))).contains("templates: audit-templates");
            assertThat(out.resolve(task).resolve("audit-templates/report.md.mustache")).exists();
        }
        assertThat(Files.readString(out.resolve("retrieval/audit.yaml"))).contains("task: retrieval");
        Path edited = out.resolve("classification/audit-templates/report.md.mustache");
        Files.writeString(edited, "mine");
        CliRun again = CliRun.of("init", "--out", out.resolve("classification").toString());
        assertThat(again.exitCode()).isEqualTo(2);
        assertThat(again.err()).contains("refusing to overwrite").contains("--force");
        assertThat(Files.readString(edited)).isEqualTo("mine");
    }

    @Test
    void anEditedTemplateShowsInTheNextReportWithoutRebuilding() throws Exception {
        Path demo = tmp.resolve("demo");
        assertThat(CliRun.of("demo", "--out", demo.toString(), "--resamples", "200", "--format", "json").exitCode()).isZero();
        Path start = tmp.resolve("start");
        assertThat(CliRun.of("init", "--out", start.toString()).exitCode()).isZero();
        Path template = start.resolve("audit-templates/report.md.mustache");
        Files.writeString(template, Files.readString(template).replace("# Audit of reported results:", "# Our lab's audit:"));
        // the demo's audit file, pointed at the edited templates through 'templates:', with notes
        String audit = Files.readString(demo.resolve("inputs/audit.yaml"))
                + "templates: " + start.resolve("audit-templates") + "\n";
        audit = audit.replace("    row: \"ChirpNet (ours)\"\n", "    row: \"ChirpNet (ours)\"\n"
                + "    notes: \"Run with the released checkpoint on one GPU-free laptop.\"\n"
                + "    claim_notes: {\"Macro F1\": \"classes averaged without weights, as the paper says\", \"Nope\": \"typo\"}\n");
        Files.writeString(demo.resolve("inputs/audit.yaml"), audit);
        CliRun run = CliRun.of("audit", demo.resolve("inputs/audit.yaml").toString(), "--out", tmp.resolve("r").toString(),
                "--resamples", "200");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(Files.readString(tmp.resolve("r/report.md"))).startsWith("# Our lab's audit:");
        String notes = Files.readString(tmp.resolve("r/replication-notes.md"));
        assertThat(notes).contains("Run with the released checkpoint").contains("classes averaged without weights");
        // a claim note for a column no claim has is not dropped silently
        assertThat(run.err()).contains("'Nope'").contains("no claim has");
        // --template on the command line wins over the audit file's folder
        Path other = tmp.resolve("other");
        Files.createDirectories(other);
        Files.writeString(other.resolve("report.md.mustache"), "other {{title}}");
        CliRun viaOption = CliRun.of("audit", demo.resolve("inputs/audit.yaml").toString(), "--out", tmp.resolve("r2").toString(),
                "--resamples", "200", "--template", other.toString());
        assertThat(viaOption.exitCode()).as(viaOption.err()).isZero();
        assertThat(Files.readString(tmp.resolve("r2/report.md"))).startsWith("other ChirpNet");
    }

    @Test
    void rerunGivesAnIdenticalResultAndDetectsAChangedInputByItsHash() throws Exception {
        Path demo = tmp.resolve("demo");
        assertThat(CliRun.of("demo", "--out", demo.toString(), "--resamples", "300", "--format", "json").exitCode()).isZero();
        CliRun audit = CliRun.of("audit", demo.resolve("inputs/audit.yaml").toString(), "--out", tmp.resolve("r").toString(),
                "--resamples", "300", "--seed", "7");
        assertThat(audit.exitCode()).isZero();
        CliRun same = CliRun.of("audit", "--rerun", tmp.resolve("r/report.json").toString());
        assertThat(same.exitCode()).as(same.out() + same.err()).isZero();
        assertThat(same.out()).contains("result: identical").contains("--seed 7");
        // one changed prediction: the hash says so, and the result differs
        Path preds = demo.resolve("inputs/predictions.csv");
        List<String> lines = Files.readAllLines(preds);
        String[] first = lines.get(1).split(",", -1);
        lines.set(1, lines.get(1).replaceFirst("," + first[2] + ",", "," + (first[2].equals(first[1]) ? "xx" : first[1]) + ","));
        Files.write(preds, lines);
        CliRun changed = CliRun.of("audit", "--rerun", tmp.resolve("r/report.json").toString());
        assertThat(changed.exitCode()).isEqualTo(1);
        assertThat(changed.out()).contains("input changed: predictions").contains("sha256 was").contains("not identical");
    }
}
