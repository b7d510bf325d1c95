package org.assay.pdf;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.assay.audit.checks.MetricFacts;
import org.assay.claims.PrintedValue;
import org.assay.claims.Scale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Percent or fraction. The rules are facts of the trade (common practice): a metric bounded by 1 printed
 * above 1 is in percent; "0.874" is a fraction; ranks and errors in the target's unit are printed as they
 * are; RSUM adds six Recall@K percentages, so it runs to 600.
 */
class ScaleGuesserTest {

    private static List<ParsedCell> cells(String printed) {
        List<ParsedCell> out = new ArrayList<>();
        for (String p : printed.split("\\|", -1)) out.add(CellText.parse(p));
        return out;
    }

    /** header levels joined by '|'; caption; cells joined by '|'; expected scale (or null). */
    @ParameterizedTest(name = "[{index}] {0}: {2}")
    @CsvSource(delimiter = ';', nullValues = "null", textBlock = """
            Accuracy;null;87.4|91.2|–;PERCENT
            Accuracy;null;0.874|0.912;FRACTION
            Accuracy;null;.874|.912;FRACTION
            Accuracy;null;87.4%|91.2%;PERCENT
            Accuracy;null;0.9%|0.8%;PERCENT
            Accuracy (%);null;0.9|0.8;PERCENT
            Error|Top-1;null;0.9|0.8;FRACTION
            Accuracy;All numbers are percentages.;0.9|0.8;PERCENT
            Accuracy;Accuracy (%) on the bird-call test set.;0.9|0.8;PERCENT
            F1;null;94.1 ± 0.3|93.2 ± 0.4;PERCENT
            F1;null;0.941 (0.003)|0.932 (0.004);FRACTION
            MCC;null;-0.12|0.45;FRACTION
            MCC;null;-12.0|45.3;PERCENT
            R²;null;0.81|0.77;FRACTION
            R@1;null;45.2|51.0;PERCENT
            BLEU;null;27.3|28.1;PERCENT
            BLEU;null;0.273|0.281;FRACTION
            AUC;null;1.000|0.981;FRACTION
            MedR;null;2.0|3.0;FRACTION
            MnR;null;14.3|12.8;FRACTION
            MAE;null;0.41|0.38;FRACTION
            RMSE;null;12.9|13.4;FRACTION
            RSUM;null;512.3|498.0;PERCENT
            RSUM;null;5.12|4.98;FRACTION
            RSUM;null;–|–;PERCENT
            Accuracy;null;–||n/a;null
            """)
    void scales(String path, String caption, String printed, Scale expected) {
        ScaleGuess g = ScaleGuesser.guess(List.of(path.split("\\|")), caption, cells(printed));
        assertThat(g.scale()).as(g.reason()).isEqualTo(expected);
        assertThat(g.reason()).isNotBlank();
        if (expected == null) assertThat(g.confidence()).isZero();
        else assertThat(g.confidence()).isBetween(0.5, 1.0);
    }

    @Test
    void signIsSurerThanTheCaption() {
        double sign = ScaleGuesser.guess(List.of("Accuracy"), null, cells("87.4%")).confidence();
        double caption = ScaleGuesser.guess(List.of("Accuracy"), "in percent", cells("0.9")).confidence();
        assertThat(sign).isEqualTo(1.0);
        assertThat(caption).isLessThan(sign);
    }

    @Test
    void smallErrorRatesAsFractionsAreLessSure() {
        double error = ScaleGuesser.guess(List.of("Error rate"), null, cells("0.8|0.6")).confidence();
        double accuracy = ScaleGuesser.guess(List.of("Accuracy"), null, cells("0.8|0.6")).confidence();
        assertThat(error).isLessThan(accuracy);
    }

    @Test
    void unknownMetricHalvesTheConfidence() {
        ScaleGuess g = ScaleGuesser.guess(List.of("Score"), null, cells("87.4|91.2"));
        assertThat(g.scale()).isEqualTo(Scale.PERCENT);
        assertThat(g.confidence()).isLessThanOrEqualTo(0.5);
        assertThat(g.reason()).contains("unknown");
    }

    @Test
    void rankWithAPercentSignIsDoubtful() {
        ScaleGuess g = ScaleGuesser.guess(List.of("RMSE (%)"), null, cells("12.9|13.4"));
        assertThat(g.scale()).isEqualTo(Scale.FRACTION);
        assertThat(g.confidence()).isEqualTo(0.5);
    }

    /**
     * The chosen scale puts the printed values inside the metric's range as MetricFacts states it: the scale
     * guess and the claim-only checks agree on what a printed number means.
     */
    @ParameterizedTest(name = "[{index}] {0}: {1}")
    @CsvSource(delimiter = ';', textBlock = """
            Accuracy;87.4|91.2
            Accuracy;0.874|0.912
            MedR;2.0|3.0
            MnR;14.3|12.8
            RSUM;512.3|498.0
            RSUM;5.12|4.98
            MCC;-12.0|45.3
            """)
    void chosenScaleFitsTheMetricRange(String header, String printed) {
        String metric = MetricGuesser.guess(List.of(header), null).metric();
        MetricFacts facts = MetricFacts.of(metric);
        Scale scale = ScaleGuesser.guess(List.of(header), null, cells(printed)).scale();
        for (ParsedCell c : cells(printed)) {
            double v = PrintedValue.parse(c.plainValue()).fraction(scale);
            assertThat(v).as(metric + " " + c.value()).isBetween(facts.lowest(), facts.highest());
        }
    }
}
