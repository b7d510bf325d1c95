package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

/** The SVG writer: escaping of attributes and text, locale-free numbers, and line wrapping. */
class SvgTest {
    @Test
    void attributeValuesAndTextAreEscapedAndParseBackUnchanged() {
        String hostile = "<script>alert(1)</script> & \"quoted\" 'single'";
        String svg = new Svg().open("svg", "data-x", hostile).element("text", hostile, "class", "t").close("svg").toString();
        assertThat(svg).doesNotContain("<script").contains("&lt;script&gt;").contains("&amp;").contains("&quot;")
                .contains("&#39;");
        Element root = SvgReader.parse(svg);
        assertThat(root.getAttribute("data-x")).isEqualTo(hostile);
        assertThat(SvgReader.one(root, "t").getTextContent()).isEqualTo(hostile);
        assertThat(SvgReader.byTag(root, "script")).isEmpty();
    }

    @Test
    void numbersHaveTwoDecimalsAPointAndNoNegativeZero() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertThat(Svg.num(1.5)).isEqualTo("1.50");
            assertThat(Svg.num(-0.001)).isEqualTo("0.00");
            assertThat(Svg.num(-2.345678)).isEqualTo("-2.35");
            assertThat(Svg.num(12345.0)).isEqualTo("12345.00");
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void wrapBreaksAtSpacesWithinTheWidthAndKeepsEveryWord() {
        String text = "the ranking is real only to depth 24 (query '0' has 24 scored candidates)";
        List<String> lines = Svg.wrap(text, 20);
        assertThat(lines).allSatisfy(l -> assertThat(l.length()).isLessThanOrEqualTo(20));
        assertThat(String.join(" ", lines)).isEqualTo(text);
        assertThat(Svg.wrap("short", 20)).containsExactly("short");
        assertThat(Svg.wrap("a averyveryverylongword b", 8)).containsExactly("a", "averyveryverylongword", "b");
    }
}
