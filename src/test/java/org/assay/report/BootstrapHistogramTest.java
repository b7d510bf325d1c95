package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assay.report.SvgReader.byClass;
import static org.assay.report.SvgReader.byTag;
import static org.assay.report.SvgReader.num;
import static org.assay.report.SvgReader.one;

import java.util.List;
import org.assay.audit.Finding;
import org.assay.audit.Histogram;
import org.assay.audit.Verdict;
import org.assay.claims.Scale;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/**
 * The bootstrap histogram read back as XML. The fixture's bins are 0.71, 0.72, ... on the fraction
 * scale, so on the printed (percent) scale bin i runs from 71 + i to 72 + i; the claim printed 84.1
 * has the rounding interval [84.05, 84.15]; the reproduced value is 77.09.
 */
class BootstrapHistogramTest {
    private static final double PX = 0.02;
    private final Finding f1 = PlotFixtures.macroF1();

    @Test
    void oneBarPerBinWithItsCountWhereTheBinLiesAndAsTallAsItsCount() {
        Element svg = SvgReader.parse(BootstrapHistogram.render(f1));
        assertThat(svg.getAttribute("class")).isEqualTo("bootstrap-histogram");
        SvgReader.Scale axis = SvgReader.ticks(svg);
        List<Element> bars = byClass(svg, "bin");
        int[] counts = f1.histogram().counts();
        assertThat(bars).hasSize(counts.length);
        double tallest = 140;   // the largest count of the fixture
        double fullHeight = BootstrapHistogram.BARS_BOTTOM - BootstrapHistogram.BARS_TOP;
        for (int i = 0; i < counts.length; i++) {
            Element bar = bars.get(i);
            assertThat(bar.getAttribute("data-count")).isEqualTo(String.valueOf(counts[i]));
            assertThat(num(bar, "x")).isCloseTo(axis.x(71 + i), within(PX));
            assertThat(num(bar, "x") + num(bar, "width")).isCloseTo(axis.x(72 + i), within(PX));
            assertThat(num(bar, "height")).isCloseTo(fullHeight * counts[i] / tallest, within(PX));
            assertThat(num(bar, "y") + num(bar, "height")).isCloseTo(BootstrapHistogram.BARS_BOTTOM, within(PX));
        }
        assertThat(byClass(svg, "histogram-key").get(0).getTextContent()).isEqualTo("600 bootstrap resamples of the reproduced value");
    }

    @Test
    void theClaimsRoundingIntervalAndTheEstimateAreMarked() {
        Element svg = SvgReader.parse(BootstrapHistogram.render(f1));
        SvgReader.Scale axis = SvgReader.ticks(svg);
        Element rounding = one(svg, "rounding-interval");
        assertThat(num(rounding, "x")).isCloseTo(axis.x(84.05), within(PX));
        assertThat(num(rounding, "x") + num(rounding, "width")).isCloseTo(axis.x(84.15), within(PX));
        Element estimate = one(svg, "estimate-line");
        assertThat(num(estimate, "x1")).isCloseTo(axis.x(77.09), within(PX));
        assertThat(num(estimate, "x2")).isEqualTo(num(estimate, "x1"));
        // the axis reaches the rounding interval even though no resample does
        List<Element> ticks = byClass(svg, "tick-label");
        assertThat(Double.parseDouble(ticks.get(ticks.size() - 1).getTextContent())).isGreaterThanOrEqualTo(84.15);
        assertThat(Double.parseDouble(ticks.get(0).getTextContent())).isLessThanOrEqualTo(71);
    }

    @Test
    void resamplesThatAreAllEqualGiveOneVisibleBarAtTheirValue() {
        Finding flat = PlotFixtures.computed(PlotFixtures.claim("Ours", "F1", "macro_f1", "0.50", Scale.FRACTION),
                Verdict.INCONCLUSIVE, 0.5, 0.5, 0.5, 0.5, 0.5, new Histogram(0.5, 0, new int[] {1000}));
        Element svg = SvgReader.parse(BootstrapHistogram.render(flat));
        SvgReader.Scale axis = SvgReader.ticks(svg);
        Element bar = one(svg, "bin");
        assertThat(num(bar, "width")).isEqualTo(BootstrapHistogram.MIN_BAR);
        assertThat(num(bar, "x") + BootstrapHistogram.MIN_BAR / 2).isCloseTo(axis.x(0.5), within(PX));
    }

    @Test
    void theLabelIsTextNeverMarkup() {
        Finding hostile = PlotFixtures.computed(
                PlotFixtures.claim("<script>alert(1)</script>", "F1 & <b>", "macro_f1", "84.1", Scale.PERCENT),
                Verdict.DISCREPANT, 0.7709, 0.7217, 0.8176, 0.73, 0.81, f1.histogram());
        String text = BootstrapHistogram.render(hostile);
        assertThat(text).doesNotContain("<script").doesNotContain("<b>");
        Element svg = SvgReader.parse(text);
        assertThat(byTag(svg, "script")).isEmpty();
        assertThat(byTag(svg, "title").get(0).getTextContent())
                .isEqualTo("Bootstrap distribution: <script>alert(1)</script> / F1 & <b> (macro_f1)");
    }

    @Test
    void aFindingWithoutResamplesHasNoHistogram() {
        assertThatThrownBy(() -> BootstrapHistogram.render(PlotFixtures.accuracy("Ours")))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
