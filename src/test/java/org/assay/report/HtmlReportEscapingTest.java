package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.assay.audit.AuditResult;
import org.assay.report.TemplateRenderer.Escaping;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every string of the report model reaches report.html escaped: each is replaced by a marker that
 * carries the five characters HTML must escape, and the rendered file must hold every placed marker in
 * its escaped form and none in its raw form. Only the plots (built and escaped by assay) are placed raw.
 */
class HtmlReportEscapingTest {
    private static final String DANGER = " & < > \" '";
    private static final String ESCAPED = " &amp; &lt; &gt; &quot; &#39;";
    private static final Set<String> RAW = Set.of("forest_svg", "histogram_svg");
    /** A Mustache tag that is not a triple mustache: {{name}}, {{#name}}, {{^name}}, {{/name}}, {{> name}}. */
    private static final Pattern TAG = Pattern.compile("(?<!\\{)\\{\\{(?!\\{)\\s*([#^/>&]?)\\s*([^}\\s]+)\\s*}}");

    @TempDir Path tmp;

    @Test
    void everyStringOfTheModelLandsEscaped() throws Exception {
        AuditResult r = DemoAudit.run(tmp, "birdcalls", DemoAudit.BIRDCALLS);
        Map<String, Object> model = HtmlPlots.withPlots(ReportModel.audit(r, DemoAudit.provenance()), r);
        // switch on every optional section, so that its strings are placed too
        model.put("has_warnings", true);
        model.put("warnings", new ArrayList<>(List.of("w")));
        for (Map<String, Object> t : HtmlPlotsTest.list(model.get("tables"))) {
            t.put("has_user_note", true);
            t.put("user_note", "n");
            t.put("has_method_notes", true);
            t.put("method_notes", new ArrayList<>(List.of("m")));
            t.put("has_caption", true);
            t.put("several_runs", true);
            for (Map<String, Object> c : HtmlPlotsTest.list(t.get("claims"))) {
                c.put("has_user_note", true);
                c.put("user_note", "u");
                c.put("own_notes", new ArrayList<>(List.of("o")));
            }
        }
        Map<String, Integer> markers = new java.util.HashMap<>();
        Object marked = mark(model, null, markers);
        @SuppressWarnings("unchecked")
        String html = new TemplateRenderer(TemplateSource.bundled())
                .render("report.html.mustache", (Map<String, Object>) marked, Escaping.HTML);

        assertThat(html).doesNotContain(DANGER.strip());   // no marker anywhere in raw form
        Set<String> placed = names("report.html.mustache", new TreeSet<>(), true);
        List<String> missing = new ArrayList<>();
        for (String key : placed) {
            if (!markers.containsKey(key)) continue;          // a section over maps or booleans
            if (!html.contains("[" + key + "#")) missing.add(key);
        }
        assertThat(placed).contains("title", "caption", "label", "summary", "reason", "message", "sha256", "warnings");
        assertThat(missing).as("model keys the template places but whose strings did not appear escaped").isEmpty();
        Matcher m = Pattern.compile("\\[([a-z_]+)#\\d+]").matcher(html);
        while (m.find()) {
            assertThat(html.startsWith(ESCAPED, m.end())).as("marker " + m.group() + " escaped").isTrue();
        }
        // the plots are the only raw markup: outside the <svg> elements no tag name comes from the data
        assertThat(html.replaceAll("(?s)<svg .*?</svg>", "")).doesNotContain("<script").doesNotContain("<img");
    }

    @Test
    void theHtmlReportPlacesEveryValueTheMarkdownReportPlaces() {
        Set<String> md = names("report.md.mustache", new TreeSet<>(), false);
        Set<String> html = names("report.html.mustache", new TreeSet<>(), false);
        assertThat(md).isNotEmpty().contains("summary", "range_if_true", "sha256");
        assertThat(html).containsAll(md);
    }

    @Test
    void theCheckReportPlacesEveryValueTheMarkdownCheckPlaces() {
        Set<String> md = names("check.md.mustache", new TreeSet<>(), false);
        Set<String> html = names("check.html.mustache", new TreeSet<>(), false);
        assertThat(html).containsAll(md);
    }

    /** Replaces every string leaf by "[key#n] & < > \" '", keeping the plots. */
    private static Object mark(Object v, String key, Map<String, Integer> markers) {
        if (v instanceof Map<?, ?> m) {
            Map<String, Object> out = new java.util.LinkedHashMap<>();
            m.forEach((k, x) -> out.put((String) k, RAW.contains(k) ? x : mark(x, (String) k, markers)));
            return out;
        }
        if (v instanceof List<?> l) {
            List<Object> out = new ArrayList<>();
            for (Object x : l) out.add(mark(x, key, markers));
            return out;
        }
        if (v instanceof String) {
            int n = markers.merge(key, 1, Integer::sum);
            return "[" + key + "#" + n + "]" + DANGER;
        }
        return v;
    }

    /** The names a template and its partials use: values placed with {{name}}, and sections too when asked. */
    private static Set<String> names(String template, Set<String> into, boolean withSections) {
        Matcher m = TAG.matcher(TemplateSource.bundled().load(template));
        while (m.find()) {
            String sigil = m.group(1), name = m.group(2);
            if (sigil.equals(">")) names(name, into, withSections);
            else if (sigil.isEmpty() && !name.equals(".")) into.add(name);
            else if (withSections && (sigil.equals("#") || sigil.equals("^"))) into.add(name);
        }
        return into;
    }
}
