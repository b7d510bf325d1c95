package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `assay measure --task generation` and `assay audit` with `task: generation` end to end, on corpora
 * the reference scripts scored with NLTK 3.8 (generation_reference.py: nltk.translate.bleu_score,
 * chrF from NLTK's per-order counts; meteor_rouge_reference.py: nltk.translate.meteor_score with
 * WordNet 3.0, ROUGE from Lin 2004's definition over nltk.util.ngrams).
 */
class GenerationCommandTest {
    @TempDir Path tmp;

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final JsonNode GENERATION = ReferenceData.load("generation.json");
    private static final JsonNode METEOR_ROUGE = ReferenceData.load("meteor_rouge.json");

    @Test
    void bleuAndChrfFromAJsonLinesFileEqualTheNltkReference() throws Exception {
        Path file = jsonl("long.jsonl", GENERATION.get("corpora").get("long"));
        int checked = 0;
        for (JsonNode b : GENERATION.get("bleu")) {
            if (!b.get("corpus").asText().equals("long")) continue;
            String metric = "bleu:" + params(b.get("params"));
            JsonNode m = measure(file, metric).get("metrics").get(0);
            assertThat(m.get("value").asDouble()).as(metric).isCloseTo(b.get("expected").asDouble(), within(1e-9));
            assertThat(m.get("notes").toString()).contains("tokenize=" + b.get("params").get("tokenize").asText());
            checked++;
        }
        assertThat(checked).isGreaterThanOrEqualTo(16);
    }

    @Test
    void chrfFromParallelTextFilesEqualsTheReference() throws Exception {
        // chrf_single: one reference per item, written as a hypotheses file and one reference file
        JsonNode items = GENERATION.get("corpora").get("chrf_single");
        StringBuilder hyp = new StringBuilder(), ref = new StringBuilder();
        for (JsonNode it : items) {
            hyp.append(it.get("hypothesis").asText()).append('\n');
            ref.append(it.get("references").get(0).asText()).append('\n');
        }
        Path h = Files.writeString(tmp.resolve("hyp.txt"), hyp);
        Path r = Files.writeString(tmp.resolve("ref.txt"), ref);
        for (JsonNode c : GENERATION.get("chrf").get("cases")) {
            if (!c.get("corpus").asText().equals("chrf_single")) continue;
            String metric = "chrf:" + params(c.get("params"));
            CliRun run = CliRun.of("measure", h.toString(), "--references", r.toString(), "--task", "generation",
                    "--metric", metric, "--resamples", "200", "--format", "json");
            assertThat(run.exitCode()).as(run.err()).isZero();
            JsonNode m = JSON.readTree(run.out()).get("metrics").get(0);
            assertThat(m.get("value").asDouble()).as(metric).isCloseTo(c.get("expected").asDouble(), within(1e-9));
            assertThat(m.get("n").asInt()).isEqualTo(items.size());
        }
    }

    @Test
    void rougeAndMeteorEqualTheReference() throws Exception {
        JsonNode rouge = METEOR_ROUGE.get("rouge").get(1);   // F, with Porter stemming
        Path file = jsonl("rouge.jsonl", items(rouge));
        for (String id : List.of("rouge_1", "rouge_2", "rouge_l")) {
            JsonNode m = measure(file, id + ":" + params(rouge.get("params"))).get("metrics").get(0);
            assertThat(m.get("value").asDouble()).as(id).isCloseTo(rouge.get("corpus").get(id).asDouble(), within(1e-12));
        }
        JsonNode meteor = METEOR_ROUGE.get("meteor").get(0);   // alpha 0.9, beta 3, gamma 0.5
        Path mfile = jsonl("meteor.jsonl", items(meteor));
        JsonNode m = measure(mfile, "meteor").get("metrics").get(0);
        assertThat(m.get("value").asDouble()).isCloseTo(meteor.get("corpus").asDouble(), within(1e-9));
        assertThat(m.get("notes").toString()).contains("wordnet=3.0");
    }

    @Test
    void aGenerationAuditUsesTheClaimsSettingsAndSaysWhenTheyAreMissing() throws Exception {
        JsonNode long4 = null;
        for (JsonNode b : GENERATION.get("bleu")) {
            if (b.get("corpus").asText().equals("long") && b.get("params").get("smoothing").asText().equals("exp")
                    && b.get("params").get("tokenize").asText().equals("13a") && b.get("params").get("lowercase").asText().equals("true")
                    && b.get("params").get("order").asText().equals("4")) {
                long4 = b;
            }
        }
        assertThat(long4).isNotNull();
        jsonl("outputs.jsonl", GENERATION.get("corpora").get("long"));
        double bleu = long4.get("expected").asDouble();
        Files.writeString(tmp.resolve("claims.yaml"), String.format(Locale.ROOT, """
                tables:
                  - id: T3
                    claims:
                      - {row: Ours, column: [BLEU], metric: bleu, value: "%.1f", scale: percent,
                         params: {tokenize: 13a, lowercase: true, smoothing: exp}}
                      - {row: Ours, column: [BLEU (unstated)], metric: bleu, value: "%.1f", scale: percent}
                """, 100 * bleu, 100 * bleu));
        Files.writeString(tmp.resolve("audit.yaml"), """
                claims: claims.yaml
                reproductions:
                  - task: generation
                    predictions: outputs.jsonl
                """);
        CliRun run = CliRun.of("audit", tmp.resolve("audit.yaml").toString(), "--out", tmp.resolve("r").toString(),
                "--resamples", "500");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode report = JSON.readTree(tmp.resolve("r/report.json").toFile());
        JsonNode stated = report.get("findings").get(0);
        JsonNode unstated = report.get("findings").get(1);
        assertThat(stated.get("estimate").asDouble()).isCloseTo(bleu, within(1e-9));
        assertThat(stated.get("notes").toString()).contains("tokenize=13a lowercase=true smoothing=exp")
                .doesNotContain("does not state");
        // the unstated claim is computed with the defaults (case kept, no smoothing), and says so
        assertThat(unstated.get("estimate").asDouble()).isNotCloseTo(bleu, within(1e-6));
        assertThat(unstated.get("notes").toString()).contains("does not state its tokenize, lowercase settings");
        // the claim-only check flags it too, with a stable id
        assertThat(report.get("checks").toString()).contains("configuration-");
    }

    @Test
    void mismatchedParallelFilesAreAOneLineError() throws Exception {
        Path h = Files.writeString(tmp.resolve("hyp.txt"), "a b c\nd e f\n");
        Path r = Files.writeString(tmp.resolve("ref.txt"), "a b c\n");
        CliRun run = CliRun.of("measure", h.toString(), "--references", r.toString(), "--task", "generation", "--metric", "bleu");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("hyp.txt").contains("ref.txt");
        CliRun noRefs = CliRun.of("measure", h.toString(), "--task", "generation", "--metric", "bleu");
        assertThat(noRefs.exitCode()).isEqualTo(2);
        assertThat(noRefs.err()).contains("needs reference files");
        CliRun badParam = CliRun.of("measure", h.toString(), "--references", h.toString(), "--task", "generation",
                "--metric", "bleu:smoothing=magic");
        assertThat(badParam.exitCode()).isEqualTo(2);
        assertThat(badParam.err()).contains("smoothing").contains("add_one");
    }

    private JsonNode measure(Path file, String metric) throws Exception {
        CliRun run = CliRun.of("measure", file.toString(), "--task", "generation", "--metric", metric,
                "--resamples", "200", "--format", "json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        return JSON.readTree(run.out());
    }

    /** The reference's parallel hypotheses/references lists as JSON Lines items. */
    private static JsonNode items(JsonNode c) {
        ArrayNode out = JSON.createArrayNode();
        for (int i = 0; i < c.get("hypotheses").size(); i++) {
            ObjectNode o = out.addObject();
            o.put("id", "i" + i);
            o.put("hypothesis", c.get("hypotheses").get(i).asText());
            o.set("references", c.get("references").get(i));
        }
        return out;
    }

    private Path jsonl(String name, JsonNode items) throws Exception {
        List<String> lines = new ArrayList<>();
        for (JsonNode it : items) {
            ObjectNode o = JSON.createObjectNode();
            o.put("id", it.get("id").asText());
            o.put("hypothesis", it.get("hypothesis").asText());
            o.set("references", it.get("references"));
            lines.add(JSON.writeValueAsString(o));
        }
        return Files.write(tmp.resolve(name), lines);
    }

    /** {"tokenize": "13a", ...} as the command line writes it: tokenize=13a;... */
    private static String params(JsonNode p) {
        List<String> kv = new ArrayList<>();
        for (var it = p.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            kv.add(e.getKey() + "=" + e.getValue().asText());
        }
        return String.join(";", kv);
    }
}
