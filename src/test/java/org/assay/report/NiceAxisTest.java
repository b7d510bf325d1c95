package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;

/**
 * Tick positions against the R package labeling's {@code heckbert()} (labeling 0.4.2, R 4.2.2; values in
 * axis_ticks_labeling.json, written by src/test/reference/axis_ticks_reference.R), which implements
 * Heckbert's loose labeling from "Nice numbers for graph labels" (Graphics Gems, 1990).
 */
class NiceAxisTest {
    private static final JsonNode REFERENCE = ReferenceData.load("axis_ticks_labeling.json");

    @Test
    void ticksMatchLabelingHeckbert() {
        assertThat(REFERENCE.get("cases").size()).isGreaterThan(50);
        for (JsonNode c : REFERENCE.get("cases")) {
            double lo = c.get("dmin").asDouble(), hi = c.get("dmax").asDouble();
            NiceAxis axis = NiceAxis.covering(lo, hi, c.get("m").asInt());
            double[] expected = ReferenceData.doubles(c.get("ticks"));
            List<Double> ticks = axis.ticks();
            assertThat(ticks).as("[%s, %s] m=%s", lo, hi, c.get("m")).hasSize(expected.length);
            for (int i = 0; i < expected.length; i++) {
                assertThat(ticks.get(i)).as("[%s, %s] tick %d", lo, hi, i).isCloseTo(expected[i], within(axis.step() * 1e-9));
            }
            assertThat(axis.min()).isLessThanOrEqualTo(lo);
            assertThat(axis.max()).isGreaterThanOrEqualTo(hi);
        }
    }

    @Test
    void labelsShowEachTickExactlyWithTheDecimalsTheStepNeeds() {
        // Heckbert's nfrac = max(-floor(log10(step)), 0) digits after the point
        for (JsonNode c : REFERENCE.get("cases")) {
            NiceAxis axis = NiceAxis.covering(c.get("dmin").asDouble(), c.get("dmax").asDouble(), c.get("m").asInt());
            for (double t : ReferenceData.doubles(c.get("ticks"))) {
                String label = axis.label(t);
                assertThat(Double.parseDouble(label)).as(label).isCloseTo(t, within(axis.step() * 1e-6));
                assertThat(label).doesNotMatch("-0(\\.0*)?").doesNotContain(",");   // never a negative zero
            }
        }
        assertThat(NiceAxis.covering(0.4, 0.6, 5).ticks().stream().map(NiceAxis.covering(0.4, 0.6, 5)::label))
                .containsExactly("0.40", "0.45", "0.50", "0.55", "0.60");
        assertThat(NiceAxis.covering(80.88, 89.75, 6).label(84)).isEqualTo("84");
    }

    @Test
    void aSingleValueGetsARangeAroundIt() {
        // where assay differs from labeling::heckbert, which takes log10(0) for an empty range: every
        // resample equal, or an interval of width 0, still needs an axis with the value inside it
        NiceAxis point = NiceAxis.covering(0.5, 0.5, 5);
        assertThat(point.min()).isLessThan(0.5);
        assertThat(point.max()).isGreaterThan(0.5);
        NiceAxis zero = NiceAxis.covering(0, 0, 5);
        assertThat(zero.min()).isLessThan(0);
        assertThat(zero.max()).isGreaterThan(0);
    }

    @Test
    void positionsAreLinearFromEndToEnd() {
        NiceAxis axis = NiceAxis.covering(80.88, 89.75, 6);   // 80 to 90
        assertThat(axis.position(80, 14, 540)).isEqualTo(14);
        assertThat(axis.position(90, 14, 540)).isEqualTo(540);
        assertThat(axis.position(85, 14, 540)).isCloseTo(277, within(1e-9));
    }
}
