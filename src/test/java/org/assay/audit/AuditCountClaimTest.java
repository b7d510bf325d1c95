package org.assay.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import org.assay.claims.PrintedValue;
import org.assay.claims.Scale;
import org.assay.testing.ReferenceData;
import org.junit.jupiter.api.Test;

/**
 * The exact p-value and "range if the claim were true" of a count claim on a random subsample
 * of a finite test set, against scipy.stats.hypergeom (src/test/reference/audit_reference.py;
 * scipy version in the JSON's generated_by).
 */
class AuditCountClaimTest {

    @Test
    void pValueAndRangeEqualScipyHypergeom() {
        JsonNode doc = ReferenceData.load("audit_counts.json");
        for (JsonNode c : doc.get("cases")) {
            double[] ci = PrintedValue.parse(c.get("printed").asText()).roundingInterval(Scale.PERCENT);
            CountEvidence e = new CountEvidence(c.get("k").asLong(), c.get("n").asLong(), c.get("N").asLong(),
                    IntervalChoice.EXACT);
            long[] ks = e.populationCounts(ci[0], ci[1]);
            assertThat(ks).containsExactly(c.get("K_range").get(0).asLong(), c.get("K_range").get(1).asLong());
            assertThat(e.pValue(ci[0], ci[1])).as(c.toString()).isCloseTo(c.get("p_value").asDouble(), within(1e-9));
            double[] range = e.rangeIfTrue(ci[0], ci[1], 0.95);
            assertThat(range[0]).isCloseTo(c.get("range_if_true").get(0).asDouble(), within(1e-12));
            assertThat(range[1]).isCloseTo(c.get("range_if_true").get(1).asDouble(), within(1e-12));
        }
    }

    @Test
    void fullTestSetLeavesNoSamplingError() {
        // n == N: the reproduction measures the published quantity itself (common practice), so
        // the interval is a point and a claim either rounds from it or not
        CountEvidence e = new CountEvidence(3548, 4000, 4000L, IntervalChoice.EXACT);
        assertThat(e.interval(0.95).lower()).isEqualTo(e.interval(0.95).upper());
        double[] inside = PrintedValue.parse("88.7").roundingInterval(Scale.PERCENT);   // 3548/4000 = 88.70%
        double[] outside = PrintedValue.parse("88.9").roundingInterval(Scale.PERCENT);
        assertThat(e.pValue(inside[0], inside[1])).isEqualTo(1.0);
        assertThat(e.pValue(outside[0], outside[1])).isLessThan(1e-12);
    }

    @Test
    void infeasibleClaimIsTestedAgainstTheNearestAchievableCounts() {
        // "98.21" on 4,000 items: k/4000 steps by 0.025 points, none within [98.205, 98.215]
        double[] ci = PrintedValue.parse("98.21").roundingInterval(Scale.PERCENT);
        CountEvidence e = new CountEvidence(390, 400, 4000L, IntervalChoice.EXACT);
        assertThat(e.populationCounts(ci[0], ci[1])).containsExactly(3928L, 3929L);
    }
}
