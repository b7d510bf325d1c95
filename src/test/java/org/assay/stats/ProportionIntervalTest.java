package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.assay.common.UserInputException;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;

class ProportionIntervalTest {

    /** statsmodels proportion_confint, versions in the JSON's generated_by (proportion_reference.py). */
    static Stream<Arguments> statsmodelsCases() {
        JsonNode root = ReferenceData.load("proportion_reference");
        List<Arguments> cases = new ArrayList<>();
        for (JsonNode c : root.get("intervals")) {
            cases.add(Arguments.of(c.get("method").asText(), c.get("successes").asLong(), c.get("trials").asLong(),
                    c.get("confidence").asDouble(), c.get("lower").asDouble(), c.get("upper").asDouble()));
        }
        assertThat(cases).hasSize(6 * 2 * 5);
        return cases.stream();
    }

    @ParameterizedTest(name = "{0} {1}/{2} at {3}")
    @MethodSource("statsmodelsCases")
    void matchesStatsmodels(String method, long k, long n, double confidence, double lower, double upper) {
        Interval ci = ProportionMethod.fromId(method).interval().compute(k, n, confidence);
        assertThat(ci.lower()).isCloseTo(lower, within(1e-9));
        assertThat(ci.upper()).isCloseTo(upper, within(1e-9));
        assertThat(ci.confidence()).isEqualTo(confidence);
    }

    /**
     * Newcombe (1998), Statistics in Medicine 17:857-872, Table I, 95% intervals at the 4 decimals
     * printed there: method 3 (score, Wilson) and method 5 (exact, Clopper-Pearson).
     * From memory: the table could not be consulted while writing this test.
     */
    @ParameterizedTest(name = "{0} {1}/{2}")
    @CsvSource({
            "wilson, 81, 263, 0.2553, 0.3662",
            "clopper-pearson, 81, 263, 0.2527, 0.3676",
            "wilson, 15, 148, 0.0624, 0.1605",
            "clopper-pearson, 15, 148, 0.0578, 0.1617",
    })
    void matchesNewcombeTableOne(String method, long k, long n, double lower, double upper) {
        Interval ci = ProportionMethod.fromId(method).interval().compute(k, n, 0.95);
        assertThat(ci.lower()).isCloseTo(lower, within(0.5e-4));
        assertThat(ci.upper()).isCloseTo(upper, within(0.5e-4));
    }

    @Test
    void idsRoundTripAndUnknownIdListsTheValidOnes() {
        for (ProportionMethod m : ProportionMethod.values()) {
            assertThat(ProportionMethod.fromId(m.id())).isSameAs(m);
        }
        assertThatThrownBy(() -> ProportionMethod.fromId("score"))
                .isInstanceOf(UserInputException.class)
                .hasMessageContaining("'score'")
                .hasMessageContaining("wald, wilson, clopper-pearson, jeffreys, agresti-coull");
    }

    @ParameterizedTest(name = "k={0} n={1} confidence={2}")
    @CsvSource({"-1, 10, 0.95", "11, 10, 0.95", "0, 0, 0.95", "5, 10, 0", "5, 10, 1", "5, 10, NaN"})
    void everyMethodRejectsBadArguments(long k, long n, double confidence) {
        for (ProportionMethod m : ProportionMethod.values()) {
            assertThatThrownBy(() -> m.interval().compute(k, n, confidence))
                    .as(m.id()).isInstanceOf(IllegalArgumentException.class);
        }
    }

    @Test
    void everyIntervalNamesItsMethodAndContainsTheEstimateExceptJeffreysAtTheEdges() {
        // Common practice: the Wald, Wilson, Clopper-Pearson and Agresti-Coull intervals contain k/n.
        for (ProportionMethod m : ProportionMethod.values()) {
            for (long k = 0; k <= 30; k++) {
                Interval ci = m.interval().compute(k, 30, 0.95);
                assertThat(ci.method()).isNotBlank();
                if (m != ProportionMethod.JEFFREYS || (k > 0 && k < 30)) {
                    assertThat(ci.contains(k / 30.0)).as(m.id() + " k=" + k).isTrue();
                }
            }
        }
    }
}
