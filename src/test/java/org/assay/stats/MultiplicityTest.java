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

    /** statsmodels multipletests(method="fdr_bh") (holm_reference.py; versions in generated_by). */
    @Test
    void benjaminiHochbergMatchesStatsmodels() {
        JsonNode root = ReferenceData.load("holm_reference");
        for (JsonNode c : root.get("cases")) {
            double[] p = ReferenceData.doubles(c.get("p"));
            double[] expected = ReferenceData.doubles(c.get("adjusted_bh"));
            assertThat(Multiplicity.benjaminiHochberg(p)).as(c.get("p").toString()).containsExactly(expected, within(1e-12));
            assertThat(MultiplicityMethod.BH.adjust(p)).containsExactly(expected, within(1e-12));
            assertThat(MultiplicityMethod.HOLM.adjust(p)).containsExactly(ReferenceData.doubles(c.get("adjusted")), within(1e-12));
        }
    }

    /**
     * Benjamini &amp; Hochberg (1995) by hand: p = (0.01, 0.02, 0.03, 0.04) with m = 4 gives
     * m p_(i) / i = 0.04 for every i, where Holm gives (0.04, 0.06, 0.06, 0.06): the false discovery
     * rate is never stricter than the family-wise rate (common practice).
     */
    @Test
    void benjaminiHochbergIsNeverAboveHolm() {
        assertThat(Multiplicity.benjaminiHochberg(new double[] {0.03, 0.01, 0.04, 0.02}))
                .containsExactly(new double[] {0.04, 0.04, 0.04, 0.04}, within(1e-15));
        double[] p = {0.2, 0.001, 0.04, 0.04, 0.7, 0.011};
        double[] bh = Multiplicity.benjaminiHochberg(p);
        double[] holm = Multiplicity.holm(p);
        for (int i = 0; i < p.length; i++) assertThat(bh[i]).isBetween(p[i], holm[i]);
    }

    @Test
    void methodsParseTheirIds() {
        assertThat(MultiplicityMethod.parse(" BH ")).isEqualTo(MultiplicityMethod.BH);
        assertThat(MultiplicityMethod.parse("holm")).isEqualTo(MultiplicityMethod.HOLM);
        assertThatThrownBy(() -> MultiplicityMethod.parse("bonferroni"))
                .isInstanceOf(org.assay.common.UserInputException.class).hasMessageContaining("holm");
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
        assertThatThrownBy(() -> Multiplicity.benjaminiHochberg(new double[] {-0.1})).isInstanceOf(IllegalArgumentException.class);
        assertThat(Multiplicity.benjaminiHochberg(new double[0])).isEmpty();
    }
}
