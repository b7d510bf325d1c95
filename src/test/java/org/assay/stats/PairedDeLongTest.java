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

class PairedDeLongTest {

    /**
     * R pROC 1.18 (Robin et al. 2011, BMC Bioinformatics 12:77; versions in generated_by):
     * roc.test(method = "delong", paired = TRUE), var() and cov() with method "delong", on
     * generated correlated scores, heavy ties, a small unbalanced case and pROC's aSAH data
     * (paired_delong_reference.R).
     */
    static Stream<JsonNode> pROCCases() {
        List<JsonNode> cases = new ArrayList<>();
        ReferenceData.load("paired_delong_reference").get("cases").forEach(cases::add);
        assertThat(cases).extracting(c -> c.get("name").asText()).contains("aSAH s100b vs wfns");
        return cases.stream();
    }

    @ParameterizedTest(name = "{index}")
    @MethodSource("pROCCases")
    void matchesPROCRocTest(JsonNode c) {
        boolean[] positive = ReferenceData.booleans(c.get("positive"));
        PairedDeLong d = PairedDeLong.of(ReferenceData.doubles(c.get("scores_a")), ReferenceData.doubles(c.get("scores_b")),
                positive);
        String name = c.get("name").asText();
        assertThat(d.aucA()).as(name).isCloseTo(c.get("auc_a").asDouble(), within(1e-9));
        assertThat(d.aucB()).as(name).isCloseTo(c.get("auc_b").asDouble(), within(1e-9));
        assertThat(d.varianceA()).as(name).isCloseTo(c.get("variance_a").asDouble(), within(1e-9));
        assertThat(d.varianceB()).as(name).isCloseTo(c.get("variance_b").asDouble(), within(1e-9));
        assertThat(d.covariance()).as(name).isCloseTo(c.get("covariance").asDouble(), within(1e-9));
        assertThat(d.z(1)).as(name).isCloseTo(c.get("z").asDouble(), within(1e-9));
        assertThat(d.pValue(1)).as(name).isCloseTo(c.get("p_value").asDouble(), within(1e-9));
        Interval ci = d.interval(0.95, 1);
        assertThat(ci.lower()).as(name).isCloseTo(c.get("conf_int_95").get(0).asDouble(), within(1e-9));
        assertThat(ci.upper()).as(name).isCloseTo(c.get("conf_int_95").get(1).asDouble(), within(1e-9));
        assertThat(ci.method()).isEqualTo("paired DeLong");
    }

    /**
     * The same scores twice: the covariance is each variance, so the difference has variance 0 and
     * no evidence against equality (p = 1). Swapping the systems negates z and keeps p (common practice).
     */
    @Test
    void identicalSystemsGiveNoDifferenceAndSwappingNegatesZ() {
        JsonNode c = ReferenceData.load("paired_delong_reference").get("cases").get(0);
        double[] a = ReferenceData.doubles(c.get("scores_a"));
        double[] b = ReferenceData.doubles(c.get("scores_b"));
        boolean[] positive = ReferenceData.booleans(c.get("positive"));
        PairedDeLong same = PairedDeLong.of(a, a, positive);
        assertThat(same.differenceVariance()).isCloseTo(0, within(1e-15));
        assertThat(same.pValue(1)).isEqualTo(1.0);
        PairedDeLong ab = PairedDeLong.of(a, b, positive);
        PairedDeLong ba = PairedDeLong.of(b, a, positive);
        assertThat(ba.z(1)).isCloseTo(-ab.z(1), within(1e-12));
        assertThat(ba.pValue(1)).isCloseTo(ab.pValue(1), within(1e-15));
    }

    /** A variance factor f < 1 (the finite-population correction) divides z by sqrt(f) and narrows the interval by sqrt(f). */
    @Test
    void varianceFactorScalesZAndTheInterval() {
        JsonNode c = ReferenceData.load("paired_delong_reference").get("cases").get(0);
        PairedDeLong d = PairedDeLong.of(ReferenceData.doubles(c.get("scores_a")), ReferenceData.doubles(c.get("scores_b")),
                ReferenceData.booleans(c.get("positive")));
        assertThat(d.z(0.25)).isCloseTo(2 * d.z(1), within(1e-12));
        assertThat(d.interval(0.95, 0.25).halfWidth()).isCloseTo(d.interval(0.95, 1).halfWidth() / 2, within(1e-12));
    }

    @Test
    void needsTwoItemsOfEachClass() {
        assertThatThrownBy(() -> PairedDeLong.of(new double[] {0.1, 0.2, 0.9}, new double[] {0.3, 0.2, 0.5},
                new boolean[] {false, false, true})).isInstanceOf(UserInputException.class).hasMessageContaining("two positives");
    }
}
