package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class DeLongTest {

    /**
     * R pROC (Robin et al. 2011, BMC Bioinformatics 12:77; version in generated_by), direction "<":
     * auc(), var(method = "delong"), ci.auc(method = "delong") and the internal delongPlacements(),
     * on generated data with ties and on pROC's aSAH data (delong_reference.R).
     */
    static Stream<JsonNode> pROCCases() {
        List<JsonNode> cases = new ArrayList<>();
        ReferenceData.load("delong_reference").get("cases").forEach(cases::add);
        assertThat(cases).extracting(c -> c.get("name").asText())
                .contains("aSAH s100b vs outcome", "aSAH wfns vs outcome");
        return cases.stream();
    }

    @ParameterizedTest(name = "{index}")
    @MethodSource("pROCCases")
    void matchesPROC(JsonNode c) {
        double[] scores = ReferenceData.doubles(c.get("scores"));
        boolean[] positive = ReferenceData.booleans(c.get("positive"));
        DeLong.AucVariance v = DeLong.of(scores, positive);
        String name = c.get("name").asText();
        assertThat(v.auc()).as(name).isCloseTo(c.get("auc").asDouble(), within(1e-9));
        assertThat(v.variance()).as(name).isCloseTo(c.get("variance").asDouble(), within(1e-9));
        Interval ci95 = DeLong.interval(v, 0.95, 1.0);
        assertThat(ci95.lower()).as(name).isCloseTo(c.get("ci95").get(0).asDouble(), within(1e-9));
        assertThat(ci95.upper()).as(name).isCloseTo(c.get("ci95").get(1).asDouble(), within(1e-9));
        Interval ci90 = DeLong.interval(v, 0.90, 1.0);
        assertThat(ci90.lower()).as(name).isCloseTo(c.get("ci90").get(0).asDouble(), within(1e-9));
        assertThat(ci90.upper()).as(name).isCloseTo(c.get("ci90").get(1).asDouble(), within(1e-9));
        assertThat(ci95.method()).isEqualTo("DeLong");

        // pROC lists case placements in the order of the cases, control placements likewise.
        DeLong.Placements pl = DeLong.placements(scores, positive);
        double[] cases = ReferenceData.doubles(c.get("case_placements"));
        double[] controls = ReferenceData.doubles(c.get("control_placements"));
        int a = 0, b = 0;
        for (int i = 0; i < scores.length; i++) {
            double expected = positive[i] ? cases[a++] : controls[b++];
            assertThat(pl.values()[i]).as(name + " item " + i).isCloseTo(expected, within(1e-12));
        }
        assertThat(a).isEqualTo(v.positives());
        assertThat(b).isEqualTo(v.negatives());
    }

    /** The jackknife values from placements equal the AUC recomputed without each item. */
    @Test
    void leaveOneOutAucEqualsRecomputationWithoutTheItem() {
        JsonNode c = ReferenceData.load("delong_reference").get("cases").get(0);
        double[] scores = ReferenceData.doubles(c.get("scores"));
        boolean[] positive = ReferenceData.booleans(c.get("positive"));
        double[] jackknife = DeLong.placements(scores, positive).leaveOneOutAuc();
        for (int drop = 0; drop < scores.length; drop += 7) {
            double[] s = new double[scores.length - 1];
            boolean[] p = new boolean[scores.length - 1];
            for (int i = 0, j = 0; i < scores.length; i++) {
                if (i == drop) continue;
                s[j] = scores[i];
                p[j++] = positive[i];
            }
            assertThat(jackknife[drop]).isCloseTo(DeLong.of(s, p).auc(), within(1e-12));
        }
    }

    /** The variance factor multiplies the variance, so the half-width scales with its square root. */
    @Test
    void varianceFactorScalesTheHalfWidth() {
        DeLong.AucVariance v = new DeLong.AucVariance(0.8, 0.0016, 50, 50);
        Interval full = DeLong.interval(v, 0.95, 1.0);
        Interval corrected = DeLong.interval(v, 0.95, 0.25);
        assertThat(corrected.halfWidth()).isCloseTo(full.halfWidth() / 2, within(1e-12));
        // 1.959963984540054 is the standard normal 0.975 quantile (common practice).
        assertThat(full.halfWidth()).isCloseTo(1.959963984540054 * 0.04, within(1e-12));
        assertThat(DeLong.interval(new DeLong.AucVariance(0.99, 0.01, 5, 5), 0.95, 1).upper()).isEqualTo(1.0);
    }

    @Test
    void anEmptyClassIsAUsageError() {
        assertThatThrownBy(() -> DeLong.of(new double[] {0.1, 0.2}, new boolean[] {true, true}))
                .isInstanceOf(UserInputException.class).hasMessageContaining("0 negatives");
        assertThatThrownBy(() -> DeLong.of(new double[] {0.1, Double.NaN}, new boolean[] {true, false}))
                .isInstanceOf(UserInputException.class).hasMessageContaining("item 2");
        DeLong.AucVariance single = DeLong.of(new double[] {0.1, 0.2, 0.3}, new boolean[] {true, false, false});
        assertThat(single.auc()).isEqualTo(0.0);
        assertThat(single.variance()).isNaN();
        assertThatThrownBy(() -> DeLong.interval(single, 0.95, 1)).isInstanceOf(UserInputException.class);
    }
}
