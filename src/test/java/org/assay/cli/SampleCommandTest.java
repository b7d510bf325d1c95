package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `assay sample` and the audit's checks of the manifest it is given. */
class SampleCommandTest {
    @TempDir Path tmp;

    @Test
    void aSeededDrawReproducesTheCommittedManifest() throws Exception {
        // src/test/resources/sampling/expected-manifest.txt was drawn with seed 20240917 (20 of 1000);
        // SplittableRandom's algorithm is fixed by the JDK, so any machine redraws it byte for byte
        Path ids = Files.copy(Path.of("src/test/resources/sampling/ids.txt"), tmp.resolve("ids.txt"));
        CliRun run = CliRun.of("sample", ids.toString(), "--n", "20", "--out", tmp.resolve("m.txt").toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(Files.readString(tmp.resolve("m.txt")))
                .isEqualTo(Files.readString(Path.of("src/test/resources/sampling/expected-manifest.txt")));
        CliRun again = CliRun.of("sample", ids.toString(), "--n", "20", "--out", tmp.resolve("m.txt").toString());
        assertThat(again.exitCode()).isEqualTo(2);
        assertThat(again.err()).contains("refusing to overwrite");
    }

    @Test
    void aStratifiedDrawAllocatesProportionallyAndSaysSo() throws Exception {
        StringBuilder csv = new StringBuilder("id,label\n");
        for (int i = 0; i < 100; i++) csv.append("c").append(i).append(',').append(i < 60 ? "wren" : i < 90 ? "robin" : "finch").append('\n');
        Path f = Files.writeString(tmp.resolve("labels.csv"), csv);
        CliRun run = CliRun.of("sample", f.toString(), "--id-column", "id", "--stratify-by", "label", "--n", "15",
                "--out", tmp.resolve("s.txt").toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        // 15 x (60, 30, 10) / 100 = 9, 4.5, 1.5 -> 9, 4, 1 and one left to the earlier tie (robin)
        assertThat(run.out()).contains("wren: 9 of 60").contains("robin: 5 of 30").contains("finch: 1 of 10");
        String manifest = Files.readString(tmp.resolve("s.txt"));
        assertThat(manifest).contains("# stratify by: label").contains("# allocation: wren 9 of 60; robin 5 of 30; finch 1 of 10");
    }

    @Test
    void theAuditVerifiesAnAssayManifestAndWarnsAboutAFirstNBlock() throws Exception {
        // 200 test items; the replicator's predictions cover whatever the manifest lists
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < 200; i++) ids.add(String.format("x%03d", i));
        Files.write(tmp.resolve("ids.txt"), ids);
        Files.writeString(tmp.resolve("claims.yaml"), """
                tables:
                  - id: T1
                    test_size: 200
                    claims:
                      - {row: Ours, column: [Accuracy], metric: accuracy, value: "80.0", scale: percent}
                """);
        // a drawn manifest: verified by redrawing, no warning
        assertThat(CliRun.of("sample", tmp.resolve("ids.txt").toString(), "--n", "40", "--seed", "5",
                "--out", tmp.resolve("drawn.txt").toString()).exitCode()).isZero();
        CliRun drawn = audit(Files.readAllLines(tmp.resolve("drawn.txt")).stream().filter(l -> !l.startsWith("#")).toList(),
                "drawn.txt");
        assertThat(drawn.exitCode()).as(drawn.err()).isZero();
        assertThat(drawn.err()).doesNotContain("contiguous").doesNotContain("redraw");
        assertThat(Files.readString(tmp.resolve("r/report.md"))).contains("Redrawn from its header");

        // the first 40 ids in file order: warned
        Files.write(tmp.resolve("first.txt"), ids.subList(0, 40));
        CliRun first = audit(ids.subList(0, 40), "first.txt");
        assertThat(first.exitCode()).as(first.err()).isZero();
        assertThat(first.err()).contains("first.txt").contains("x000 to x039").contains("not a random draw");

        // a drawn manifest edited by hand (one id swapped): the redraw disagrees
        List<String> edited = new ArrayList<>(Files.readAllLines(tmp.resolve("drawn.txt")));
        int last = edited.size() - 1;
        String replacement = ids.stream().filter(id -> !edited.contains(id)).findFirst().orElseThrow();
        edited.set(last, replacement);
        Files.write(tmp.resolve("edited.txt"), edited);
        CliRun tampered = audit(edited.stream().filter(l -> !l.startsWith("#")).toList(), "edited.txt");
        assertThat(tampered.exitCode()).as(tampered.err()).isZero();
        assertThat(tampered.err()).contains("edited.txt").contains("a redraw with its recorded seed and method gives different ids");
    }

    /** Audits predictions (80% correct) for exactly {@code evaluated}, with the given manifest. */
    private CliRun audit(List<String> evaluated, String manifest) throws Exception {
        StringBuilder csv = new StringBuilder("id,label,prediction\n");
        for (int i = 0; i < evaluated.size(); i++) {
            // labels alternate a/b; every fifth prediction is wrong
            String label = i % 2 == 0 ? "a" : "b";
            String wrong = label.equals("a") ? "b" : "a";
            csv.append(evaluated.get(i)).append(',').append(label).append(',').append(i % 5 == 0 ? wrong : label).append('\n');
        }
        Files.writeString(tmp.resolve("preds.csv"), csv);
        return CliRun.of("audit", "--claims", tmp.resolve("claims.yaml").toString(), "--predictions",
                tmp.resolve("preds.csv").toString(), "--manifest", tmp.resolve(manifest).toString(),
                "--out", tmp.resolve("r").toString(), "--force", "--resamples", "200");
    }

    @Test
    void sampleThenAuditRunsEndToEndOnTheDemo() throws Exception {
        Path demo = tmp.resolve("demo");
        assertThat(CliRun.of("demo", "--out", demo.toString(), "--resamples", "200", "--format", "json").exitCode()).isZero();
        Path inputs = demo.resolve("inputs");
        CliRun sample = CliRun.of("sample", inputs.resolve("test-ids.txt").toString(), "--n", "400", "--seed", "4497",
                "--out", inputs.resolve("drawn.txt").toString());
        assertThat(sample.exitCode()).as(sample.err()).isZero();
        // examples/birdcalls/generate.py drew subsample.txt with its own SplitMix64 (Steele, Lea & Flood
        // 2014, written out from the published algorithm in Python): assay's draw is the same, byte for byte
        assertThat(Files.readString(inputs.resolve("drawn.txt"))).isEqualTo(Files.readString(inputs.resolve("subsample.txt")));
        Files.writeString(inputs.resolve("audit.yaml"), Files.readString(inputs.resolve("audit.yaml"))
                .replace("manifest: subsample.txt", "manifest: drawn.txt"));
        CliRun audit = CliRun.of("audit", inputs.resolve("audit.yaml").toString(), "--out", tmp.resolve("r").toString(),
                "--resamples", "200");
        assertThat(audit.exitCode()).as(audit.err()).isZero();
        assertThat(audit.err()).doesNotContain("redraw").doesNotContain("random draw");
        assertThat(Files.readString(tmp.resolve("r/report.md"))).contains("drawn.txt: simple random sample without replacement of 400 from 4000 ids, seed 4497")
                .contains("Redrawn from its header");
    }

    @Test
    void aStratifiedManifestMakesTheAuditResampleWithinItsStrata() throws Exception {
        StringBuilder csv = new StringBuilder("id,label\n");
        for (int i = 0; i < 600; i++) csv.append("s").append(i).append(',').append(i % 3 == 0 ? "wren" : i % 3 == 1 ? "robin" : "finch").append('\n');
        Files.writeString(tmp.resolve("labels.csv"), csv);
        assertThat(CliRun.of("sample", tmp.resolve("labels.csv").toString(), "--id-column", "id", "--stratify-by", "label",
                "--n", "90", "--out", tmp.resolve("strat.txt").toString()).exitCode()).isZero();
        List<String> drawn = Files.readAllLines(tmp.resolve("strat.txt")).stream().filter(l -> !l.startsWith("#")).toList();
        StringBuilder preds = new StringBuilder("id,label,prediction\n");
        for (int j = 0; j < drawn.size(); j++) {
            int i = Integer.parseInt(drawn.get(j).substring(1));
            String label = i % 3 == 0 ? "wren" : i % 3 == 1 ? "robin" : "finch";
            preds.append(drawn.get(j)).append(',').append(label).append(',').append(j % 4 == 0 ? "wren" : label).append('\n');
        }
        Files.writeString(tmp.resolve("preds.csv"), preds);
        Files.writeString(tmp.resolve("claims.yaml"), """
                tables:
                  - id: T1
                    test_size: 600
                    claims:
                      - {row: Ours, column: [Macro F1], metric: macro_f1, value: "80.0", scale: percent}
                      - {row: Ours, column: [Accuracy], metric: accuracy, value: "80.0", scale: percent}
                """);
        CliRun run = CliRun.of("audit", "--claims", tmp.resolve("claims.yaml").toString(), "--predictions",
                tmp.resolve("preds.csv").toString(), "--manifest", tmp.resolve("strat.txt").toString(),
                "--out", tmp.resolve("r").toString(), "--resamples", "300");
        assertThat(run.exitCode()).as(run.err()).isZero();
        var findings = new com.fasterxml.jackson.databind.ObjectMapper().readTree(tmp.resolve("r/report.json").toFile()).get("findings");
        assertThat(findings.get(0).get("notes").toString()).contains("within the strata of the stratified subsample");
        // the count metric keeps its exact interval, which the report says treats the draw as simple random
        assertThat(findings.get(1).get("interval").get("method").asText()).contains("hypergeometric");
        assertThat(Files.readString(tmp.resolve("r/report.md"))).contains("Bootstrap intervals resample within these strata");
    }
}
