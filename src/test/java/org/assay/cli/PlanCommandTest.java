package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code assay plan} end to end, against plan_reference.py (scipy 1.10.1 hypergeometric brute force
 * scanned n by n; statsmodels 0.13.5 power classes for Hanley&ndash;McNeil and for a pilot's spread).
 */
class PlanCommandTest {
    private static final JsonNode REFERENCE = ReferenceData.load("plan_reference.json");
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Pattern ROW = Pattern.compile("^\\s+(\\d+)\\s+([\\d.]+)\\s+([\\d.]+)\\s+([\\d.]+)\\s+([\\d.]+)(.*)$");

    @TempDir Path tmp;

    /**
     * The acceptance command prints a number, a table and one plain line: the sizes and every row's
     * half-width and powers are those of the brute force, which scans every n from 4000 down.
     */
    @Test
    void theAcceptanceCommandPrintsANumberATableAndOnePlainLine() {
        JsonNode ref = REFERENCE.get("acceptance");
        CliRun run = CliRun.of(strings(ref.get("command")));
        assertThat(run.exitCode()).as(run.err()).isZero();
        String out = run.out();
        assertThat(out).contains("Evaluate n = " + ref.get("n").asLong() + " of the 4000 items.");
        assertThat(out).containsPattern("\\(a\\) 95% interval no wider than ±1 point: +" + ref.get("n_interval").asLong() + "\n");
        assertThat(out).containsPattern("\\(b\\) power 0.8 to find a true 86.4% or 88.4% discrepant: +"
                + ref.get("n_detect").asLong() + "\n");
        assertThat(out).containsPattern("\\(c\\) power 0.8 to find 87.4% consistent if it is right: +"
                + ref.get("n_agree").asLong() + "\n");
        List<String[]> rows = new ArrayList<>();
        for (String line : out.split("\n")) {
            Matcher m = ROW.matcher(line);
            if (m.matches()) rows.add(new String[] {m.group(1), m.group(2), m.group(3), m.group(4), m.group(5), m.group(6)});
        }
        assertThat(rows).hasSize(ref.get("rows").size());
        for (int i = 0; i < rows.size(); i++) {
            JsonNode r = ref.get("rows").get(i);
            String[] printed = rows.get(i);
            assertThat(Long.parseLong(printed[0])).isEqualTo(r.get("n").asLong());
            assertThat(Double.parseDouble(printed[1])).as("half-width at " + printed[0])
                    .isCloseTo(100 * r.get("half_width").asDouble(), within(0.0051));
            assertThat(Double.parseDouble(printed[2])).as("detect 86.4% at " + printed[0])
                    .isCloseTo(r.get("detect_lower").asDouble(), within(0.00051));
            assertThat(Double.parseDouble(printed[3])).as("detect 88.4% at " + printed[0])
                    .isCloseTo(r.get("detect_higher").asDouble(), within(0.00051));
            assertThat(Double.parseDouble(printed[4])).as("agree at " + printed[0])
                    .isCloseTo(r.get("agree").asDouble(), within(0.00051));
        }
        List<String> plain = out.lines().filter(l -> l.startsWith("In plain words:")).toList();
        assertThat(plain).hasSize(1);
        assertThat(plain.get(0)).contains("evaluate " + ref.get("n").asLong() + " items drawn at random from the 4000")
                .contains("at most ±1 point wide").contains("flagged as discrepant at least 80% of the time")
                .contains("confirmed as consistent at least 80% of the time");
        assertThat(out).contains("before multiplicity adjustment").contains("zigzags");
    }

    @Test
    void jsonCarriesTheSameSizesWithASchemaVersion() throws Exception {
        JsonNode ref = REFERENCE.get("acceptance");
        List<String> args = new ArrayList<>(List.of(strings(ref.get("command"))));
        args.addAll(List.of("--format", "json"));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode root = JSON.readTree(run.out());
        assertThat(root.get("schema_version").asInt()).isEqualTo(1);
        assertThat(root.get("n").asLong()).isEqualTo(ref.get("n").asLong());
        JsonNode plan = root.get("plans").get(0);
        assertThat(plan.get("n_interval").asLong()).isEqualTo(ref.get("n_interval").asLong());
        assertThat(plan.get("n_detect").asLong()).isEqualTo(ref.get("n_detect").asLong());
        assertThat(plan.get("n_agree").asLong()).isEqualTo(ref.get("n_agree").asLong());
        assertThat(plan.get("exact").asBoolean()).isTrue();
        assertThat(plan.get("searched_up_to").asLong()).isEqualTo(4000);
        for (int i = 0; i < ref.get("rows").size(); i++) {
            JsonNode r = ref.get("rows").get(i);
            JsonNode ours = plan.get("rows").get(i);
            assertThat(ours.get("n").asLong()).isEqualTo(r.get("n").asLong());
            assertThat(ours.get("agree").asDouble()).isCloseTo(r.get("agree").asDouble(), within(1e-9));
            assertThat(ours.get("detect_lower").asDouble()).isCloseTo(r.get("detect_lower").asDouble(), within(1e-9));
            assertThat(ours.get("detect").asDouble()).isCloseTo(
                    Math.min(r.get("detect_lower").asDouble(), r.get("detect_higher").asDouble()), within(1e-9));
        }
        assertThat(root.get("explanation").asText()).startsWith("In plain words:");
        assertThat(root.get("not_planned")).isEmpty();
    }

    /** One direction: one detection column, and the (b) size is where that direction alone reaches the power. */
    @Test
    void oneDirectionPlansOnlyThatSide() throws Exception {
        CliRun both = CliRun.of("plan", "--metric", "accuracy", "--claim", "87.4", "--test-size", "4000", "--format", "json");
        CliRun lower = CliRun.of("plan", "--metric", "accuracy", "--claim", "87.4", "--test-size", "4000", "--direction",
                "lower", "--format", "json");
        JsonNode b = JSON.readTree(both.out()).get("plans").get(0);
        JsonNode l = JSON.readTree(lower.out()).get("plans").get(0);
        assertThat(l.get("higher_truth").isNull()).isTrue();
        assertThat(l.get("rows").get(0).get("detect_higher").isNull()).isTrue();
        assertThat(l.get("n_detect").asLong()).isLessThanOrEqualTo(b.get("n_detect").asLong());
        // every row's lower-side power is the same whichever direction is planned
        assertThat(l.get("rows").get(0).get("detect_lower").asDouble()).isEqualTo(b.get("rows").get(0).get("detect_lower").asDouble());
        CliRun text = CliRun.of("plan", "--metric", "accuracy", "--claim", "87.4", "--test-size", "4000", "--direction", "lower");
        assertThat(text.out()).contains("detect 86.4%").doesNotContain("detect 88.4%").contains("1 point lower than");
    }

    /** ROC AUC from class counts in a claims table: statsmodels' sizes for the Hanley–McNeil standard error. */
    @Test
    void rocAucIsPlannedFromTheClassCounts() throws Exception {
        JsonNode ref = REFERENCE.get("hanley_mcneil").get(0);
        Path claims = Files.writeString(tmp.resolve("claims.yaml"), """
                tables:
                  - id: T3
                    test_size: 2000
                    class_counts: {bird: 1200, noise: 800}
                    claims:
                      - {row: Ours, column: [AUC], metric: roc_auc, params: {positive: bird}, value: "0.912", scale: fraction, margin: 0.02}
                """);
        CliRun run = CliRun.of("plan", "--claims", claims.toString(), "--format", "json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode plan = JSON.readTree(run.out()).get("plans").get(0);
        assertThat(plan.get("exact").asBoolean()).isFalse();
        assertThat(plan.get("method").asText()).contains("Hanley–McNeil");
        assertThat(plan.get("n_interval").asLong()).isEqualTo(ref.get("n_interval").asLong());
        assertThat(plan.get("n_detect").asLong()).isEqualTo(ref.get("n_detect").asLong());
        assertThat(plan.get("n_agree").asLong()).isEqualTo(ref.get("n_agree").asLong());
        // the same from the command line, the positive class named in the metric
        CliRun direct = CliRun.of("plan", "--metric", "roc_auc:positive=bird", "--claim", "0.912", "--scale", "fraction",
                "--class-counts", "bird=1200,noise=800", "--margin", "2", "--format", "json");
        assertThat(direct.exitCode()).as(direct.err()).isZero();
        assertThat(JSON.readTree(direct.out()).get("n").asLong()).isEqualTo(JSON.readTree(run.out()).get("n").asLong());
    }

    /**
     * A pilot's bootstrap standard error extrapolated to n: MAE of the invented regression pilot,
     * against statsmodels' sizes for its plug-in spread (numpy). The bootstrap estimates that spread
     * with about 0.7% Monte Carlo error at 10,000 resamples, so the sizes may differ by 3%.
     */
    @Test
    void aPilotsSpreadIsExtrapolated() throws Exception {
        JsonNode ref = REFERENCE.get("pilot");
        Path pilot = Path.of("src/test/resources", ref.get("file").asText());
        CliRun run = CliRun.of("plan", "--metric", "mae", "--claim", ref.get("claim").asText(), "--test-size",
                ref.get("test_size").asText(), "--margin", "5", "--pilot", pilot.toString(), "--task", "regression",
                "--format", "json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode plan = JSON.readTree(run.out()).get("plans").get(0);
        assertThat(plan.get("method").asText()).contains("bootstrap standard error of the pilot");
        for (String key : new String[] {"n_interval", "n_detect", "n_agree"}) {
            double expected = ref.get(key).asDouble();
            assertThat(plan.get(key).asDouble()).as(key).isCloseTo(expected, within(0.03 * expected));
        }
        assertThat(plan.get("notes").toString()).contains("se² ∝ 1/n").contains("300 items");
    }

    /**
     * Every claim of a table: the 87.4% accuracy line has the acceptance sizes, the size that serves
     * them all is the largest line, and claims that cannot be planned are listed with the reason.
     */
    @Test
    void aClaimsTableIsPlannedClaimByClaim() throws Exception {
        JsonNode ref = REFERENCE.get("acceptance");
        Path claims = Files.writeString(tmp.resolve("claims.yaml"), """
                tables:
                  - id: T2
                    test_size: 4000
                    claims:
                      - {row: Ours, column: [Accuracy], metric: accuracy, value: "87.4", scale: percent}
                      - {row: Ours, column: [Top-3], metric: top_k_accuracy, params: {k: 3}, value: "96.1", scale: percent}
                      - {row: Ours, column: [Macro F1], metric: macro_f1, value: "71.3", scale: percent}
                      - {row: Ours, column: [Novelty], metric: novelty_score, value: "12.5", scale: percent}
                      - {row: Baseline, column: [Accuracy], metric: accuracy, value: "83.1", scale: percent}
                  - id: T9
                    test_size: 100
                    claims:
                      - {row: Ours, column: [Accuracy], metric: accuracy, value: "80", scale: percent}
                """);
        CliRun run = CliRun.of("plan", "--claims", claims.toString(), "--table", "T2", "--format", "json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode root = JSON.readTree(run.out());
        JsonNode plans = root.get("plans");
        assertThat(plans).hasSize(3);
        JsonNode accuracy = plans.get(0);
        assertThat(accuracy.get("printed").asText()).isEqualTo("87.4");
        assertThat(accuracy.get("n").asLong()).isEqualTo(ref.get("n").asLong());
        long max = 0;
        for (JsonNode p : plans) max = Math.max(max, p.get("n").asLong());
        assertThat(root.get("n").asLong()).isEqualTo(max);
        // each line is the plan of that claim on its own
        JsonNode topK = JSON.readTree(CliRun.of("plan", "--metric", "top_k_accuracy:k=3", "--claim", "96.1", "--test-size",
                "4000", "--format", "json").out()).get("plans").get(0);
        assertThat(plans.get(1).get("n").asLong()).isEqualTo(topK.get("n").asLong());
        JsonNode skipped = root.get("not_planned");
        assertThat(skipped).hasSize(2);
        assertThat(skipped.get(0).get("metric").asText()).isEqualTo("macro_f1");
        assertThat(skipped.get(0).get("reason").asText()).contains("--pilot");
        assertThat(skipped.get(1).get("reason").asText()).contains("unknown metric 'novelty_score'");

        CliRun text = CliRun.of("plan", "--claims", claims.toString(), "--table", "T2", "--row", "Ours");
        assertThat(text.exitCode()).as(text.err()).isZero();
        assertThat(text.out()).contains("Ours / Accuracy (accuracy)").doesNotContain("Baseline")
                .contains("not planned:").contains("Ours / Macro F1");
        assertThat(text.out().lines().filter(l -> l.startsWith("In plain words:")).count()).isEqualTo(1);
        assertThat(text.out()).containsPattern("Evaluate n = \\d+ items: the size that serves every planned claim.");
    }

    /** Mistakes are one line on stderr with exit code 2. */
    @Test
    void mistakesAreOneLineErrors() throws Exception {
        Path claims = Files.writeString(tmp.resolve("two.yaml"), """
                tables:
                  - {id: A, test_size: 100, claims: [{row: r, column: [c], metric: accuracy, value: "80", scale: percent}]}
                  - {id: B, test_size: 100, claims: [{row: r, column: [c], metric: accuracy, value: "81", scale: percent}]}
                """);
        String[][] cases = {
            {"unknown metric 'accurasy'", "plan", "--metric", "accurasy", "--claim", "87.4", "--test-size", "4000"},
            {"outside the range of accuracy", "plan", "--metric", "accuracy", "--claim", "101.2", "--test-size", "4000"},
            {"beyond the test set's 4000 items", "plan", "--metric", "accuracy", "--claim", "87.4", "--test-size", "4000",
                "--sizes", "300,5000"},
            {"could be a fraction", "plan", "--metric", "roc_auc", "--claim", "0.912", "--class-counts", "a=10,b=20"},
            {"test-set size is not known", "plan", "--metric", "accuracy", "--claim", "87.4"},
            {"needs the class counts", "plan", "--metric", "roc_auc", "--claim", "91.2", "--test-size", "2000"},
            {"class counts add up to 30", "plan", "--metric", "roc_auc", "--claim", "91.2", "--test-size", "2000",
                "--class-counts", "a=10,b=20"},
            {"needs a pilot", "plan", "--metric", "macro_f1", "--claim", "71.3", "--test-size", "4000"},
            {"--alpha and --confidence", "plan", "--metric", "accuracy", "--claim", "87.4", "--test-size", "4000",
                "--alpha", "0.05", "--confidence", "0.9"},
            {"not a plain decimal", "plan", "--metric", "accuracy", "--claim", "87,4", "--test-size", "4000"},
            {"takes no parameter 'k'", "plan", "--metric", "accuracy:k=3", "--claim", "87.4", "--test-size", "4000"},
            {"no true value of accuracy lies one margin above", "plan", "--metric", "accuracy", "--claim", "99.5",
                "--test-size", "4000", "--direction", "higher"},
            {"has 2 tables", "plan", "--claims", claims.toString()},
            {"unknown --direction", "plan", "--metric", "accuracy", "--claim", "87.4", "--test-size", "4000",
                "--direction", "down"},
        };
        for (String[] c : cases) {
            CliRun run = CliRun.of(java.util.Arrays.copyOfRange(c, 1, c.length));
            assertThat(run.exitCode()).as(String.join(" ", c) + "\n" + run.err()).isEqualTo(2);
            assertThat(run.errLines()).as(run.err()).hasSize(1);
            assertThat(run.err()).startsWith("assay: ").contains(c[0]).doesNotContain("Exception");
        }
    }

    private static String[] strings(JsonNode array) {
        String[] out = new String[array.size()];
        for (int i = 0; i < out.length; i++) out[i] = array.get(i).asText();
        return out;
    }
}
