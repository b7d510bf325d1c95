package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assay.report.SvgReader.byClass;
import static org.assay.report.SvgReader.byTag;
import static org.assay.report.SvgReader.num;
import static org.assay.report.SvgReader.one;

import java.util.List;
import java.util.Locale;
import org.assay.audit.Finding;
import org.assay.claims.Scale;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/**
 * The forest plot read back as XML: its rows, markers and verdict words, and the positions of its marks
 * read against the labelled ticks the way a reader would, compared with values derived here by hand
 * from each claim's printed value (the rounding interval is the printed value ± half a unit in its last
 * digit, DESIGN.md principle 2; the margin is 1 point, 0.01 on the fraction scale).
 */
class ForestPlotTest {
    private static final double PX = 0.02;   // coordinates are written with two decimals

    private final Finding accuracy = PlotFixtures.accuracy("Ours");
    private final Finding auc = PlotFixtures.auc();
    private final Finding f1 = PlotFixtures.macroF1();
    private final Finding missing = PlotFixtures.notComputable(
            PlotFixtures.claim("Ours", "R@50", "recall_at_k", "97.6", Scale.PERCENT),
            "the ranking is real only to depth 24");
    private final List<Finding> findings = List.of(accuracy, auc, missing, f1);

    @Test
    void oneRowPerClaimInOrderWithItsVerdictWordAndOneMarkerPerComputedClaim() {
        Element svg = SvgReader.parse(ForestPlot.render("Table T2", findings));
        assertThat(svg.getTagName()).isEqualTo("svg");
        assertThat(svg.getAttribute("class")).isEqualTo("forest-plot");
        List<Element> rows = byClass(svg, "forest-row");
        assertThat(rows).extracting(r -> r.getAttribute("data-verdict"))
                .containsExactly("inconclusive", "consistent", "not computable", "discrepant");
        assertThat(rows).extracting(r -> one(r, "verdict-label").getTextContent())
                .containsExactly("inconclusive", "consistent", "not computable", "discrepant");
        assertThat(rows).extracting(r -> one(r, "claim-label").getTextContent())
                .containsExactly("Ours / Accuracy — accuracy, printed 88.7%", "Ours / Wren AUC — roc_auc, printed 0.991",
                        "Ours / R@50 — recall_at_k, printed 97.6%", "Ours / Macro F1 — macro_f1, printed 84.1%");
        // one estimate marker per computed claim, none for the claim that could not be computed
        assertThat(byClass(svg, "estimate-marker")).hasSize(3);
        assertThat(byClass(rows.get(2), "estimate-marker")).isEmpty();
        // the verdict is in the marker's shape as well as its colour, and the shapes differ
        assertThat(rows).extracting(r -> one(r, "verdict-key").getAttribute("data-shape"))
                .containsExactly("diamond", "circle", "dash", "square");
        for (Element r : List.of(rows.get(0), rows.get(1), rows.get(3))) {
            assertThat(one(r, "estimate-marker").getAttribute("data-shape"))
                    .isEqualTo(one(r, "verdict-key").getAttribute("data-shape"));
        }
    }

    @Test
    void marksSitWhereTheFindingPutsThemOnTheClaimsPrintedScale() {
        List<Element> rows = byClass(SvgReader.parse(ForestPlot.render("Table T2", findings)), "forest-row");
        // accuracy printed 88.7 (percent): rounding interval [88.65, 88.75], margin band [87.65, 89.75]
        expectMarks(rows.get(0), 88.65, 88.75, 87.65, 89.75, 81.88, 88.63, 82.45, 88.18, 85.50);
        // ROC AUC printed 0.991 (fraction): rounding interval [0.9905, 0.9915], margin band [0.9805, 1.0015]
        expectMarks(rows.get(1), 0.9905, 0.9915, 0.9805, 1.0015, 0.9903, 0.9983, 0.9909, 0.9976, 0.9943);
        // macro F1 printed 84.1 (percent): [84.05, 84.15], band [83.05, 85.15]; the reproduction lies below
        expectMarks(rows.get(3), 84.05, 84.15, 83.05, 85.15, 72.17, 81.76, 73.0, 81.0, 77.09);
    }

    private static void expectMarks(Element row, double roundLo, double roundHi, double bandLo, double bandHi,
                                    double lo, double hi, double eqLo, double eqHi, double estimate) {
        SvgReader.Scale axis = SvgReader.ticks(row);
        Element band = one(row, "margin-band");
        assertThat(num(band, "x")).isCloseTo(axis.x(bandLo), within(PX));
        assertThat(num(band, "x") + num(band, "width")).isCloseTo(axis.x(bandHi), within(PX));
        Element rounding = one(row, "rounding-interval");
        assertThat(num(rounding, "x")).isCloseTo(axis.x(roundLo), within(PX));
        assertThat(num(rounding, "x") + num(rounding, "width")).isCloseTo(axis.x(roundHi), within(PX));
        Element interval = one(row, "reproduced-interval");
        assertThat(num(interval, "x1")).isCloseTo(axis.x(lo), within(PX));
        assertThat(num(interval, "x2")).isCloseTo(axis.x(hi), within(PX));
        assertThat(byClass(row, "interval-end")).extracting(e -> num(e, "x1"))
                .containsExactly(num(interval, "x1"), num(interval, "x2"));
        Element equivalence = one(row, "equivalence-interval");
        assertThat(num(equivalence, "x1")).isCloseTo(axis.x(eqLo), within(PX));
        assertThat(num(equivalence, "x2")).isCloseTo(axis.x(eqHi), within(PX));
        assertThat(SvgReader.translateX(one(row, "estimate-marker"))).isCloseTo(axis.x(estimate), within(PX));
        // every mark lies on the axis, between its first and last tick
        List<Element> ticks = byClass(row, "tick-label");
        double first = num(ticks.get(0), "x"), last = num(ticks.get(ticks.size() - 1), "x");
        for (double x : new double[] {axis.x(bandLo), axis.x(bandHi), axis.x(lo), axis.x(hi)}) {
            assertThat(x).isBetween(first - PX, last + PX);
        }
    }

    @Test
    void eachClaimHasItsOwnAxisLabelledOnItsPrintedScale() {
        List<Element> rows = byClass(SvgReader.parse(ForestPlot.render("Table T2", findings)), "forest-row");
        // percent claims are labelled in points (80, 82, ...), the AUC on 0-1 (0.98, 0.99, ...)
        assertThat(byClass(rows.get(0), "tick-label")).extracting(Element::getTextContent)
                .containsExactly("80", "82", "84", "86", "88", "90");
        assertThat(byClass(rows.get(1), "tick-label")).extracting(Element::getTextContent)
                .containsExactly("0.98", "0.99", "1.00", "1.01");
        assertThat(byClass(rows.get(2), "tick-label")).isEmpty();
    }

    @Test
    void aClaimThatCouldNotBeComputedIsARowThatSaysWhy() {
        Element row = byClass(SvgReader.parse(ForestPlot.render("Table T2", findings)), "forest-row").get(2);
        assertThat(one(row, "not-computable-reason").getTextContent()).isEqualTo("the ranking is real only to depth 24");
        assertThat(byClass(row, "margin-band")).isEmpty();
        assertThat(byClass(row, "reproduced-interval")).isEmpty();
        assertThat(byTag(row, "title").get(0).getTextContent()).contains("not computable: the ranking is real only to depth 24");
    }

    @Test
    void labelsAndReasonsAreTextNeverMarkup() {
        String script = "<script>alert(1)</script>";
        String img = "<img src=x onerror=alert(1)>";
        Finding hostile = PlotFixtures.accuracy("Ours " + script);
        Finding reason = PlotFixtures.notComputable(
                PlotFixtures.claim("A & \"B\" 'C'", "R@50", "recall_at_k", "97.6", Scale.PERCENT), "bad " + img);
        String text = ForestPlot.render("Table " + script, List.of(hostile, reason));
        assertThat(text).doesNotContain("<script").doesNotContain("<img").contains("&lt;script&gt;alert(1)&lt;/script&gt;")
                .contains("A &amp; &quot;B&quot; &#39;C&#39;");
        Element svg = SvgReader.parse(text);
        assertThat(byTag(svg, "script")).isEmpty();
        assertThat(byTag(svg, "img")).isEmpty();
        assertThat(byClass(svg, "claim-label").get(0).getTextContent()).startsWith("Ours " + script);
        assertThat(one(svg, "not-computable-reason").getTextContent()).isEqualTo("bad " + img);
        assertThat(byTag(svg, "title").get(0).getTextContent()).isEqualTo("Forest plot: Table " + script);
    }

    @Test
    void titleAndDescriptionNameTheTableAndEveryClaimForScreenReaders() {
        Element svg = SvgReader.parse(ForestPlot.render("Table T2: birds", findings));
        assertThat(svg.getAttribute("role")).isEqualTo("img");
        Element first = (Element) svg.getElementsByTagName("*").item(0);
        assertThat(first.getTagName()).isEqualTo("title");
        assertThat(first.getTextContent()).isEqualTo("Forest plot: Table T2: birds");
        String desc = byTag(svg, "desc").get(0).getTextContent();
        assertThat(desc).contains("Ours / Accuracy (accuracy): printed 88.7%, rounding interval [88.65, 88.75]; "
                        + "reproduced 85.50, 95% interval [81.88, 88.63]; margin [87.65, 89.75]; inconclusive.")
                .contains("consistent.").contains("discrepant.").contains("not computable");
    }

    @Test
    void sameBytesWhateverTheDefaultLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.ROOT);
            String root = ForestPlot.render("Table T2", findings);
            Locale.setDefault(Locale.GERMANY);   // a decimal comma, were any number formatted with the default locale
            String german = ForestPlot.render("Table T2", findings);
            assertThat(german).isEqualTo(root);
            assertThat(root).contains("x=\"").doesNotContainPattern("x=\"[0-9]+,[0-9]");
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void aTableOfClaimsThatCouldNotBeComputedHasNoLegendButStillOneRowEach() {
        Element svg = SvgReader.parse(ForestPlot.render("Table T9", List.of(missing, missing)));
        assertThat(byClass(svg, "legend")).isEmpty();
        assertThat(byClass(svg, "forest-row")).hasSize(2);
        assertThat(num(svg, "height")).isGreaterThan(0);
    }
}
