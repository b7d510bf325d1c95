package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.report.TemplateRenderer.Escaping;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The template engine places values and repeats sections, nothing more: expression and lookup
 * syntax of other template languages comes out as text, objects expose no methods, partials
 * cannot leave the template folder, and every value is escaped for its format.
 */
class TemplateRendererTest {
    @TempDir Path dir;

    private String render(String template, Map<String, Object> model, Escaping escaping) throws Exception {
        Files.writeString(dir.resolve("t.mustache"), template);
        return new TemplateRenderer(TemplateSource.folder(dir)).render("t.mustache", model, escaping);
    }

    @Test
    void expressionAndLookupSyntaxOfOtherEnginesIsRenderedLiterally() throws Exception {
        // StringSubstitutor lookups (${script:...}, ${file:...}), JSP/EL and Velocity-style syntax
        String template = "${script:javascript:1+1} ${file:UTF-8:/etc/passwd} #{1+1} $!{x} <%= 7*7 %> {{title}}";
        String out = render(template, Map.of("title", "ok"), Escaping.NONE);
        assertThat(out).isEqualTo("${script:javascript:1+1} ${file:UTF-8:/etc/passwd} #{1+1} $!{x} <%= 7*7 %> ok");
    }

    @Test
    void valuesExposeNoMethodsOrFields() throws Exception {
        // a template cannot reach getClass(), a String's methods or a map's own methods
        String out = render("[{{title.class}}][{{title.bytes}}][{{title.length}}][{{model.size}}][{{model.entrySet}}]",
                Map.of("title", "abc", "model", Map.of("a", "1")), Escaping.NONE);
        assertThat(out).isEqualTo("[][][][][]");
    }

    @Test
    void noMethodIsCalledFromAnyScope() throws Exception {
        // Object methods as sections and names, at the top (the model map) and inside a string's and a list's
        // scope. How it was checked: with TemplateRenderer's MapObjectHandler replaced by mustache.java's
        // ReflectionObjectHandler, this prints "[abc]" (toString), the byte array, "[false]" (isEmpty) and "[1]" (size).
        String template = "[{{#toString}}T{{/toString}}][{{class.name}}][{{getClass}}][{{hashCode}}]"
                + "{{#title}}[{{toString}}][{{class.simpleName}}][{{bytes}}][{{empty}}]{{/title}}"
                + "{{#items}}[{{size}}][{{class}}]{{/items}}[{{items.size}}][{{items.0.class}}]";
        String out = render(template, Map.of("title", "abc", "items", List.of("x")), Escaping.NONE);
        assertThat(out).isEqualTo("[][][][][][][][][][][][]");
    }

    @Test
    void aTemplateOrPartialThatLinksOutOfTheFolderIsRefused() throws Exception {
        // a symbolic link inside the folder is a plain file name; what it points to must be inside too
        Path outside = Files.writeString(dir.getParent().resolve("secret-" + dir.getFileName() + ".txt"), "SECRET");
        try {
            Files.createSymbolicLink(dir.resolve("link.mustache"), outside);
            Files.createSymbolicLink(dir.resolve("passwd.mustache"), Path.of("/etc/passwd"));
            for (String name : List.of("link.mustache", "passwd.mustache")) {
                assertThatThrownBy(() -> render("a{{> " + name + "}}b", Map.of(), Escaping.NONE))
                        .isInstanceOf(UserInputException.class).hasMessageContaining("outside the template folder");
                assertThatThrownBy(() -> new TemplateRenderer(TemplateSource.folder(dir)).render(name, Map.of(), Escaping.NONE))
                        .isInstanceOf(UserInputException.class).hasMessageContaining("outside the template folder");
            }
            // a link to a file in the same folder is fine
            Files.writeString(dir.resolve("real.mustache"), "[{{x}}]");
            Files.createSymbolicLink(dir.resolve("alias.mustache"), dir.resolve("real.mustache"));
            assertThat(render("{{> alias.mustache}}", Map.of("x", "1"), Escaping.NONE)).isEqualTo("[1]");
        } finally {
            Files.deleteIfExists(outside);
        }
    }

    @Test
    void aValueThatLooksLikeATemplateIsNotRenderedAgain() throws Exception {
        String out = render("{{label}}", Map.of("label", "{{secret}} ${env:HOME}", "secret", "leak"), Escaping.NONE);
        assertThat(out).isEqualTo("{{secret}} ${env:HOME}");
    }

    @Test
    void partialsResolveByPlainNameInsideTheFolderOnly() throws Exception {
        Files.writeString(dir.resolve("part.mustache"), "[{{x}}]");
        assertThat(render("a{{> part.mustache}}b", Map.of("x", "1"), Escaping.NONE)).isEqualTo("a[1]b");
        Files.writeString(dir.getParent().resolve("outside.mustache"), "secret");
        for (String bad : List.of("../outside.mustache", "/etc/passwd", "sub/part.mustache")) {
            assertThatThrownBy(() -> render("{{> " + bad + "}}", Map.of(), Escaping.NONE))
                    .isInstanceOf(UserInputException.class).hasMessageContaining("not a plain file name");
        }
    }

    @Test
    void aBadPartialIsReportedWhereItIsIncluded() throws Exception {
        Files.writeString(dir.resolve("part.mustache"), "line 1\n{{> ../../etc/passwd}}\n");
        Files.writeString(dir.resolve("t.mustache"), "a\n{{> part.mustache}}\n");
        TemplateRenderer r = new TemplateRenderer(TemplateSource.folder(dir));
        assertThatThrownBy(() -> r.render("t.mustache", Map.of(), Escaping.NONE))
                .isInstanceOfSatisfying(UserInputException.class, e -> {
                    assertThat(e.where()).isEqualTo(dir.resolve("part.mustache"));
                    assertThat(e.position()).isEqualTo("line 2");
                    assertThat(e.problem()).contains("'../../etc/passwd' is not a plain file name");
                });
        Files.writeString(dir.resolve("t.mustache"), "a\n\n{{> missing.mustache}}\n");
        assertThatThrownBy(() -> r.render("t.mustache", Map.of(), Escaping.NONE))
                .isInstanceOfSatisfying(UserInputException.class, e -> {
                    assertThat(e.where()).isEqualTo(dir.resolve("t.mustache"));
                    assertThat(e.position()).isEqualTo("line 3");
                    assertThat(e.problem()).contains("'missing.mustache' is neither");
                });
    }

    @Test
    void dynamicPartialsAreRefusedSoTheModelCannotNameAFile() throws Exception {
        // {{>*key}} would take the file name from the model, that is, from the claims file's text
        assertThatThrownBy(() -> render("x\n{{>*label}}", Map.of("label", "cautions.md.mustache"), Escaping.NONE))
                .isInstanceOfSatisfying(UserInputException.class, e -> {
                    assertThat(e.position()).isEqualTo("line 2");
                    assertThat(e.problem()).contains("dynamic partials");
                });
    }

    @Test
    void compileErrorsNameTheTemplateAndLine() throws Exception {
        assertThatThrownBy(() -> render("{{#a}}\n{{#b}}\n{{/a}}\n", Map.of(), Escaping.NONE))
                .isInstanceOfSatisfying(UserInputException.class, e -> {
                    assertThat(e.where()).isEqualTo(dir.resolve("t.mustache"));
                    assertThat(e.position()).isEqualTo("line 3");
                    assertThat(e.problem()).contains("Mismatched").doesNotContain("@[");
                });
    }

    @Test
    void aTemplateThatIsNotUtf8NamesTheByte() throws Exception {
        Files.write(dir.resolve("t.mustache"), new byte[] {'#', ' ', 'R', (byte) 0xE9, 's', '\n'});
        assertThatThrownBy(() -> TemplateSource.folder(dir).load("t.mustache"))
                .isInstanceOfSatisfying(UserInputException.class, e -> {
                    assertThat(e.position()).isEqualTo("line 1 (byte offset 3)");
                    assertThat(e.problem()).contains("not UTF-8").contains("0xE9");
                });
    }

    @Test
    void eachFormatEscapesItsSpecialCharacters() throws Exception {
        Map<String, Object> m = Map.of("v", "<img src=x onerror=alert(1)> & \"q\" | 50% $x_1 \\cmd{y}");
        assertThat(render("{{v}}", m, Escaping.HTML))
                .isEqualTo("&lt;img src=x onerror=alert(1)&gt; &amp; &quot;q&quot; | 50% $x_1 \\cmd{y}");
        assertThat(render("{{v}}", m, Escaping.MARKDOWN)).contains("&lt;img").contains("\\|").doesNotContain("<img");
        String tex = render("{{v}}", m, Escaping.LATEX);
        assertThat(tex).contains("50\\%").contains("\\$x\\_1").contains("\\textbackslash{}cmd\\{y\\}").contains("\\&");
    }

    @Test
    void aUsersTemplateFolderOverridesTheShippedOnesFileByFile() throws Exception {
        Files.writeString(dir.resolve("cautions.md.mustache"), "MY CAUTIONS for {{title}}");
        TemplateSource source = TemplateSource.folder(dir);
        assertThat(new TemplateRenderer(source).render("cautions.md.mustache", Map.of("title", "T"), Escaping.MARKDOWN))
                .isEqualTo("MY CAUTIONS for T");
        // a file the folder lacks comes from the shipped set
        assertThat(source.load("provenance.md.mustache")).contains("## Provenance");
    }

    @Test
    void theShippedListNamesExactlyTheFilesOfAuditTemplates() throws Exception {
        try (var files = Files.list(Path.of("audit-templates"))) {
            assertThat(files.map(p -> p.getFileName().toString()).sorted().toList())
                    .containsExactlyInAnyOrderElementsOf(TemplateSource.SHIPPED);
        }
    }

    @Test
    void anOversizedTemplateIsRefused() throws Exception {
        Files.write(dir.resolve("big.mustache"), new byte[(int) org.assay.common.Limit.TEMPLATE_BYTES.defaultValue() + 1]);
        assertThatThrownBy(() -> TemplateSource.folder(dir).load("big.mustache"))
                .isInstanceOf(UserInputException.class).hasMessageContaining("limit template-bytes")
                .hasMessageContaining("--limit template-bytes=N");
    }

    @Test
    void theLaunchersTemplateFolderServesAsTheShippedSetWithoutARebuild() throws Exception {
        // ./assay passes -Dassay.templates=<checkout>/audit-templates
        Files.writeString(dir.resolve("cautions.md.mustache"), "edited in the checkout");
        String before = System.getProperty("assay.templates");
        try {
            System.setProperty("assay.templates", dir.toString());
            assertThat(TemplateSource.bundled().load("cautions.md.mustache")).isEqualTo("edited in the checkout");
            assertThat(TemplateSource.bundled().load("provenance.md.mustache")).contains("## Provenance");   // from the jar
            System.setProperty("assay.templates", dir.resolve("missing").toString());
            assertThat(TemplateSource.bundled().load("cautions.md.mustache")).contains("## Cautions");
        } finally {
            if (before == null) System.clearProperty("assay.templates"); else System.setProperty("assay.templates", before);
        }
    }
}
