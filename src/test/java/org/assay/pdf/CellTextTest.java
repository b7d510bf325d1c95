package org.assay.pdf;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.assay.claims.PrintedValue;
import org.assay.pdf.ParsedCell.Kind;
import org.assay.pdf.ParsedCell.UncertaintyStyle;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * Cell texts as PDFs print them. How tables print numbers, uncertainties, percent signs, footnote marks and
 * missing values is common practice; code points are named after the Unicode Standard.
 */
class CellTextTest {

    /** Numbers: printed value, uncertainty, style, percent, markers (joined with '|'), plain value. */
    @ParameterizedTest(name = "[{index}] \"{0}\"")
    @CsvSource(delimiter = ';', nullValues = "null", ignoreLeadingAndTrailingWhitespace = false, textBlock = """
            94.1;94.1;null;null;false;;94.1
            -3.2;-3.2;null;null;false;;-3.2
            \u22123.2;-3.2;null;null;false;;-3.2
            \u20123.2;-3.2;null;null;false;;-3.2
            \u20133.2;-3.2;null;null;false;;-3.2
            \u20143.2;-3.2;null;null;false;;-3.2
            \uFE633.2;-3.2;null;null;false;;-3.2
            \uFF0D3.2;-3.2;null;null;false;;-3.2
            +1.5;+1.5;null;null;false;;+1.5
            87.4%;87.4;null;null;true;;87.4
            87.4 %;87.4;null;null;true;;87.4
            87.4\u2009%;87.4;null;null;true;;87.4
            87.4\u00A0%;87.4;null;null;true;;87.4
            87.4\uFF05;87.4;null;null;true;;87.4
            94.1 ± 0.3;94.1;0.3;PLUS_MINUS;false;;94.1
            94.1±0.3;94.1;0.3;PLUS_MINUS;false;;94.1
            94.1 +- 0.3;94.1;0.3;PLUS_MINUS;false;;94.1
            94.1 +/- 0.3;94.1;0.3;PLUS_MINUS;false;;94.1
            94.1 +\u22120.3;94.1;0.3;PLUS_MINUS;false;;94.1
            94.1 (0.3);94.1;0.3;PARENTHESES;false;;94.1
            94.1(0.3);94.1;0.3;PARENTHESES;false;;94.1
            94.1 (±0.3);94.1;0.3;PLUS_MINUS;false;;94.1
            94.1 ± 0.3%;94.1;0.3;PLUS_MINUS;true;;94.1
            94.1% ± 0.3%;94.1;0.3;PLUS_MINUS;true;;94.1
            94.1 (0.3)%;94.1;0.3;PARENTHESES;true;;94.1
            0.912 ± .004;0.912;.004;PLUS_MINUS;false;;0.912
            94.1†;94.1;null;null;false;†;94.1
            94.1 †‡;94.1;null;null;false;†|‡;94.1
            *94.1;94.1;null;null;false;*;94.1
            94.1*;94.1;null;null;false;*;94.1
            94.1§¶;94.1;null;null;false;§|¶;94.1
            94.1‖;94.1;null;null;false;‖;94.1
            94.1#;94.1;null;null;false;#;94.1
            **94.1;94.1;null;null;false;*|*;94.1
            94.1† ± 0.3;94.1;0.3;PLUS_MINUS;false;†;94.1
            100;100;null;null;false;;100
            0.912;0.912;null;null;false;;0.912
            94.10;94.10;null;null;false;;94.10
            007;007;null;null;false;;007
            .943;.943;null;null;false;;0.943
            -.5;-.5;null;null;false;;-0.5
            """)
    void cleanNumbers(String cell, String value, String pm, UncertaintyStyle style, boolean percent, String markers,
            String plain) {
        ParsedCell p = CellText.parse(cell);
        assertThat(p.kind()).isEqualTo(Kind.NUMBER);
        assertThat(p.value()).isEqualTo(value);
        assertThat(p.pm()).isEqualTo(pm);
        assertThat(p.pmStyle()).isEqualTo(style);
        assertThat(p.percent()).isEqualTo(percent);
        assertThat(p.markers()).containsExactlyElementsOf(markers == null ? List.of() : List.of(markers.split("\\|")));
        assertThat(p.plainValue()).isEqualTo(plain);
        assertThat(p.confidence()).isEqualTo(1.0);
        // the plain form is what the claims model reads, and it keeps the printed decimals
        assertThat(PrintedValue.parse(p.plainValue()).decimals()).isEqualTo(decimals(value));
    }

    private static int decimals(String printed) {
        int dot = printed.indexOf('.');
        return dot < 0 ? 0 : printed.length() - dot - 1;
    }

    /** Readings that are guesses: value, plain value, markers, and the confidence they carry. */
    @ParameterizedTest(name = "[{index}] \"{0}\"")
    @CsvSource(delimiter = ';', nullValues = "null", textBlock = """
            1,234;1,234;1234;;0.8
            12,345.6;12,345.6;12345.6;;0.8
            94,1;94,1;94.1;;0.6
            0,912;0,912;0.912;;0.6
            9 4.1;94.1;94.1;;0.6
            94 .1;94.1;94.1;;0.6
            94. 1;94.1;94.1;;0.6
            1 234;1234;1234;;0.6
            94.1a;94.1;94.1;a;0.7
            94.1b†;94.1;94.1;†|b;0.7
            """)
    void guessedNumbers(String cell, String value, String plain, String markers, double confidence) {
        ParsedCell p = CellText.parse(cell);
        assertThat(p.kind()).isEqualTo(Kind.NUMBER);
        assertThat(p.value()).isEqualTo(value);
        assertThat(p.plainValue()).isEqualTo(plain);
        assertThat(p.markers()).containsExactlyElementsOf(markers == null ? List.of() : List.of(markers.split("\\|")));
        assertThat(p.confidence()).isEqualTo(confidence, org.assertj.core.api.Assertions.within(1e-12));
    }

    @Test
    void kerningGapInsideANumberWithUncertainty() {
        ParsedCell p = CellText.parse("9 4.1 ± 0.3");
        assertThat(p.value()).isEqualTo("94.1");
        assertThat(p.pm()).isEqualTo("0.3");
        assertThat(p.confidence()).isLessThan(1.0);
    }

    @Test
    void plainUncertaintyGetsItsLeadingZero() {
        assertThat(CellText.parse("0.912 ± .004").plainPm()).isEqualTo("0.004");
        assertThat(CellText.parse("94.1").plainPm()).isNull();
    }

    /** Missing-value marks (common practice); U+2013 EN DASH, U+2014 EM DASH, U+2212 MINUS SIGN. */
    @ParameterizedTest
    @ValueSource(strings = {"-", "\u2013", "\u2014", "\u2212", "--", "---", "\u2014\u2014", "n/a", "N/A", "n.a.", "NA",
            "N.A.", " - "})
    void missingMarks(String cell) {
        ParsedCell p = CellText.parse(cell);
        assertThat(p.kind()).isEqualTo(Kind.MISSING);
        assertThat(p.value()).isNull();
        assertThat(p.confidence()).isEqualTo(1.0);
    }

    @Test
    void missingPairIsMissingWithLessConfidence() {
        ParsedCell p = CellText.parse("\u2013/\u2013");
        assertThat(p.kind()).isEqualTo(Kind.MISSING);
        assertThat(p.confidence()).isEqualTo(0.8);
    }

    @Test
    void missingWithAFootnoteKeepsTheMark() {
        ParsedCell p = CellText.parse("\u2013\u2020");
        assertThat(p.kind()).isEqualTo(Kind.MISSING);
        assertThat(p.markers()).containsExactly("†");
    }

    @ParameterizedTest
    @ValueSource(strings = {"", " ", "\u00A0", "\u2009\u2009", "\u200B"})
    void emptyCells(String cell) {
        ParsedCell p = CellText.parse(cell);
        assertThat(p.kind()).isEqualTo(Kind.EMPTY);
        assertThat(p.text()).isEmpty();
    }

    @Test
    void nullIsEmpty() {
        assertThat(CellText.parse(null).kind()).isEqualTo(Kind.EMPTY);
    }

    /** Text: the cell, its kind's confidence, and its trailing markers. */
    @ParameterizedTest(name = "[{index}] \"{0}\"")
    @CsvSource(delimiter = ';', nullValues = "null", textBlock = """
            yes;1.0;
            ViT-B/16;1.0;
            ViT-B/16†;1.0;†
            ×;1.0;
            ✓;1.0;
            C#;1.0;
            94.1 / 95.2;0.3;
            94.1/95.2;0.3;
            94.1 95.2;0.3;
            93.2–95.0;0.3;
            (94.1);0.5;
            ~94;0.5;
            1.2e-3;0.5;
            †;0.5;
            """)
    void textCells(String cell, double confidence, String markers) {
        ParsedCell p = CellText.parse(cell);
        assertThat(p.kind()).isEqualTo(Kind.TEXT);
        assertThat(p.value()).isNull();
        assertThat(p.plainValue()).isNull();
        assertThat(p.text()).isEqualTo(cell);
        assertThat(p.confidence()).isEqualTo(confidence);
        assertThat(p.markers()).containsExactlyElementsOf(markers == null ? List.of() : List.of(markers.split("\\|")));
    }

    @Test
    void textKeepsTheGlyphsAsPrinted() {
        // the normalised text keeps the printed minus glyph; only value gets the ASCII hyphen-minus
        ParsedCell p = CellText.parse("\u22123.2\u00A0\u00B1\u20090.1");
        assertThat(p.text()).isEqualTo("\u22123.2 ± 0.1");
        assertThat(p.value()).isEqualTo("-3.2");
    }

    /** NFKC folds ligatures and full-width forms (Unicode Standard Annex #15). */
    @ParameterizedTest(name = "[{index}] \"{0}\"")
    @CsvSource(delimiter = ';', textBlock = """
            \uFB01ne-tuned;fine-tuned
            \uFB02ow;flow
            e\uFB00ect;effect
            e\uFB03cient;efficient
            ba\uFB04e;baffle
            \uFF21\uFF43\uFF43;Acc
            Text\u00A0\u2192\u2009Video;Text → Video
            a\u2194b;a↔b
            94.1 ± 0.3;94.1 ± 0.3
            2 × 2;2 × 2
            Ours\u2020\u2021;Ours†‡
            \u0020 Top-1 \t Acc\u202F;Top-1 Acc
            Acc ( % );Acc (%)
            P , R ;P, R
            Acc . ;Acc.
            a , b : c;a, b: c
            self-\u00ADattention;self-attention
            multi- task;multi- task
            """)
    void labels(String raw, String expected) {
        assertThat(CellText.normaliseLabel(raw)).isEqualTo(expected);
    }
}
