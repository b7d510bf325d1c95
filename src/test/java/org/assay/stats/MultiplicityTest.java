package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

class MultiplicityTest {

    /** statsmodels multipletests(method="holm") (holm_reference.py; versions in generated_by). */
    @Test
    void holmMatchesStatsmodels() {
        JsonNode root = ReferenceData.load("holm_reference");
        assertThat(root.get("cases").size()).isGreaterThanOrEqualTo(7);
        for (JsonNode c : root.get("cases")) {
            double[] p = ReferenceData.doubles(c.get("p"));
            double[] expected = ReferenceData.doubles(c.get("adjusted"));
            double[] actual = Multiplicity.holm(p);
            assertThat(actual).as(c.get("p").toString()).containsExactly(expected, within(1e-12));
        }
    }

    /** Holm (1979): adjusted values never fall below the raw ones and keep their order. */
    @Test
    void adjustedValuesAreMonotoneAndAtLeastTheRawValues() {
        double[] p = {0.2, 0.001, 0.04, 0.04, 0.7, 0.011};
        double[] adjusted = Multiplicity.holm(p);
        for (int i = 0; i < p.length; i++) {
            assertThat(adjusted[i]).isGreaterThanOrEqualTo(p[i]).isLessThanOrEqualTo(1);
            for (int j = 0; j < p.length; j++) {
                if (p[i] <= p[j]) assertThat(adjusted[i]).isLessThanOrEqualTo(adjusted[j]);
            }
        }
    }

    @Test
    void rejectsValuesOutsideTheUnitInterval() {
        assertThatThrownBy(() -> Multiplicity.holm(new double[] {0.1, 1.2})).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Multiplicity.holm(new double[] {Double.NaN})).isInstanceOf(IllegalArgumentException.class);
        assertThat(Multiplicity.holm(new double[0])).isEmpty();
    }
}
