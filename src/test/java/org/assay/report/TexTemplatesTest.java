package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The bundled LaTeX templates place every value through {@code {{name}}}, which LatexText escapes:
 * Mustache's unescaped forms ({@code {{{name}}}}, {@code {{&name}}}) and a delimiter change, which could
 * hide one, would let a label write LaTeX (the Mustache manual's tag types).
 */
class TexTemplatesTest {
    @ParameterizedTest
    @ValueSource(strings = {"claims-table.tex.mustache", "check-findings.tex.mustache"})
    void everyValueIsEscaped(String name) {
        String template = TemplateSource.bundled().load(name);
        assertThat(template).doesNotContain("{{{").doesNotContain("{{&").doesNotContain("{{=");
        assertThat(template).contains("\\documentclass").contains("% --- begin ").contains("% --- end ");
    }
}
