package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.math.BigDecimal;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Values computed by scikit-learn (src/test/reference/feasibility_reference.py; the JSON names
 * the versions: scikit-learn 1.2.1 functions recall_score, precision_score, f1_score with
 * zero_division=0, roc_auc_score, balanced_accuracy_score) on concrete confusion matrices and
 * score vectors, printed with Python's format(). Each printed value must be found feasible on
 * its test-set size, and the exact counts behind it must print as the same string.
 */
class FeasibilityReferenceTest {
    private static final JsonNode DOC = ReferenceData.load("feasibility_sklearn");

    @Test
    void everyScikitLearnValuePrintsFeasibly() {
        int checked = 0;
        for (JsonNode c : DOC.get("cases")) {
            long num = c.get("num").asLong();
            long den = c.get("den").asLong();
            double value = c.get("value").asDouble();
            // our counts-to-value mapping agrees with scikit-learn's definition
            assertThat(value).as(c.toString()).isCloseTo((double) num / den, org.assertj.core.data.Offset.offset(1e-12));
            for (String key : List.of("fraction_2", "fraction_3", "percent_1", "percent_2")) {
                String text = c.get("printed").get(key).asText();
                Printed p = Printed.of(text, key.startsWith("percent") ? 100 : 1);
                String ctx = c.get("metric").asText() + " " + key + "=" + text + " " + c;
                // Python prints the nearest double exactly; the exact value may sit on a half, in which
                // case the double can fall either side of it. So the exact fraction prints as the text
                // under half-up or half-even, or (a tie whose double fell below) under truncation.
                boolean exact = p.printsAs(num, den, RoundingRule.HALF_UP) || p.printsAs(num, den, RoundingRule.HALF_EVEN);
                boolean tieBelow = new BigDecimal(value * p.scaleFactor()).compareTo(p.value()) < 0
                        && p.printsAs(num, den, RoundingRule.TRUNCATE);
                assertThat(exact || tieBelow).as(ctx).isTrue();
                Feasibility f = check(c, p);
                assertThat(f.exhaustive()).as(ctx).isTrue();
                if (exact) assertThat(f.roundedFeasible()).as(ctx + " -> " + f).isTrue();
                else assertThat(f.truncatedFeasible()).as(ctx + " -> " + f).isTrue();
                checked++;
            }
        }
        assertThat(checked).isGreaterThan(200);
    }

    private static Feasibility check(JsonNode c, Printed p) {
        return switch (c.get("metric").asText()) {
            case "recall" -> RatioFeasibility.recall(p, c.get("n").asLong(), c.get("positives").asLong());
            case "precision" -> RatioFeasibility.precision(p, c.get("n").asLong(), c.get("positives").asLong());
            case "f1" -> RatioFeasibility.f1(p, c.get("n").asLong(), c.get("positives").asLong());
            case "roc_auc" -> RatioFeasibility.rocAuc(p, c.get("positives").asLong(), c.get("negatives").asLong());
            case "balanced_accuracy" -> {
                JsonNode counts = c.get("class_counts");
                long[] n = new long[counts.size()];
                for (int i = 0; i < n.length; i++) n[i] = counts.get(i).asLong();
                yield RatioFeasibility.macroRecall(p, n);
            }
            default -> throw new IllegalStateException("unknown metric " + c.get("metric"));
        };
    }

    /** The same cases with the test-set size unknown to the positives: recall, precision, F1 over every P. */
    @Test
    void scikitLearnValuesAreFeasibleWithoutThePositiveCount() {
        for (JsonNode c : DOC.get("cases")) {
            String metric = c.get("metric").asText();
            if (!List.of("recall", "precision", "f1").contains(metric)) continue;
            long n = c.get("n").asLong();
            long num = c.get("num").asLong();
            long den = c.get("den").asLong();
            Printed p = Printed.of(c.get("printed").get("percent_2").asText(), 100);
            if (!p.printsAs(num, den, RoundingRule.HALF_UP) && !p.printsAs(num, den, RoundingRule.HALF_EVEN)) continue;
            Feasibility f = switch (metric) {
                case "recall" -> RatioFeasibility.recall(p, n, null);
                case "precision" -> RatioFeasibility.precision(p, n, null);
                default -> RatioFeasibility.f1(p, n, null);
            };
            assertThat(f.roundedFeasible()).as(metric + " " + c).isTrue();
        }
    }
}
