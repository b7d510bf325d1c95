package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Pattern;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** report.html and check.html from the command line, read with jsoup's HTML5 parser (no browser needed). */
class HtmlReportCommandTest {
    @TempDir Path tmp;

    @Test
    void labelsWithMarkupAreTextInTheReportAndItsPlots() throws Exception {
        Path audit = HostileDemo.write(tmp.resolve("demo"));
        CliRun run = CliRun.of("audit", audit.toString(), "--out", tmp.resolve("r").toString(), "--resamples", "1000",
                "--format", "html,json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String html = Files.readString(tmp.resolve("r/report.html"));
        // the caption's five special characters, escaped wherever the caption is placed, the plot's title included
        String caption = "Fish &amp; chips &lt;b&gt;bold&lt;/b&gt; &quot;quoted&quot; &#39;single&#39;";
        assertThat(html).contains("<h2>Table T2: " + caption + "</h2>").contains("<title>Forest plot: Table T2: " + caption)
                .doesNotContain(HostileDemo.CAPTION).doesNotContain("<b>bold");
        assertThat(html).doesNotContain(HostileDemo.SCRIPT).doesNotContain(HostileDemo.IMG)
                .contains("&lt;script&gt;alert(1)&lt;/script&gt;").contains("&lt;img src=x onerror=alert(1)&gt;");
        Document d = Jsoup.parse(html);
        assertThat(d.select("script, img, [onerror]")).isEmpty();
        assertThat(d.title()).isEqualTo("Audit of reported results: " + HostileDemo.SCRIPT
                + " ChirpNet: species identification from dawn-chorus clips (invented)");
        assertThat(d.select("svg.forest-plot .claim-label").first().text()).startsWith(HostileDemo.ROW);
    }

    @Test
    void theReportIsOneSelfContainedFileWithoutScriptsOrOutsideResources() throws Exception {
        Path out = tmp.resolve("demo");
        CliRun run = CliRun.of("demo", "--out", out.toString(), "--resamples", "1000", "--format", "html");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String html = Files.readString(out.resolve("report.html"));
        assertThat(html).startsWith("<!DOCTYPE html>").contains("<style>").contains("@media print")
                .doesNotContain("<script").doesNotContain("<link").doesNotContain("<img").doesNotContain("<iframe")
                .doesNotContain("@import").doesNotContain("url(").doesNotContain("src=");
        // the only address is the SVG namespace name, which is never fetched
        assertThat(html.replace("http://www.w3.org/2000/svg", "")).doesNotContain("http:").doesNotContain("https:");
        Document d = Jsoup.parse(html);
        assertThat(d.select("meta[http-equiv=Content-Security-Policy]").attr("content")).startsWith("default-src 'none'");
        // the same sections as report.md
        assertThat(d.select("h2").eachText()).containsSubsequence("Verdicts", "Table T2: Species identification on the "
                        + "DawnChorus-4k test set", "Claims not audited", "Claim-only checks", "How to read this report",
                "Cautions", "Provenance");
        assertThat(d.select("#cautions").text()).contains("not a validation").contains("decisions about people")
                .contains("subsample.txt: simple random sample without replacement of 400 from 4000 ids");
    }

    @Test
    void theReportIsTheSameBytesForAnyThreadCount() throws Exception {
        CliRun a = CliRun.of("demo", "--out", tmp.resolve("a").toString(), "--resamples", "1000", "--threads", "1",
                "--format", "html");
        CliRun b = CliRun.of("demo", "--out", tmp.resolve("b").toString(), "--resamples", "1000", "--threads", "2",
                "--format", "html");
        assertThat(a.exitCode()).isZero();
        assertThat(b.exitCode()).isZero();
        // principle 5; the provenance block records each run's own command line and folder, so it is left out
        String ha = Files.readString(tmp.resolve("a/report.html"));
        String hb = Files.readString(tmp.resolve("b/report.html"));
        assertThat(ha).contains("class=\"forest-plot\"").contains("class=\"bootstrap-histogram\"");
        assertThat(ha.substring(0, ha.indexOf("<section id=\"provenance\">")))
                .isEqualTo(hb.substring(0, hb.indexOf("<section id=\"provenance\">")));
    }

    @Test
    void checkWritesAnHtmlFileWithEveryFindingOfCheckJson() throws Exception {
        Path demo = tmp.resolve("demo");
        assertThat(CliRun.of("demo", "--out", demo.toString(), "--resamples", "1000", "--format", "json").exitCode()).isZero();
        Path out = tmp.resolve("check");
        CliRun run = CliRun.of("check", demo.resolve("inputs/claims.yaml").toString(), "--out", out.toString(),
                "--format", "html,json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode json = new ObjectMapper().readTree(out.resolve("check.json").toFile());
        Document d = Jsoup.parse(Files.readString(out.resolve("check.html")));
        assertThat(json.get("findings").size()).isPositive();
        assertThat(d.select("ul.check-findings > li")).hasSize(json.get("findings").size());
        for (JsonNode f : json.get("findings")) {
            Element li = d.select("ul.check-findings > li:has(code:containsOwn(" + f.get("id").asText() + "))").first();
            assertThat(li).as(f.get("id").asText()).isNotNull();
            assertThat(li.attr("data-kind")).isEqualTo(f.get("kind").asText());
            assertThat(li.text()).contains(f.get("message").asText());
        }
        for (var e : json.get("counts").properties()) {
            Element row = d.select("table.check-counts tr:has(td:containsOwn(" + e.getKey() + "))").first();
            assertThat(row.select("td.num").text()).as(e.getKey()).isEqualTo(e.getValue().asText());
        }
        assertThat(d.select("h1").text()).startsWith("Claim-only checks: ChirpNet");
        assertThat(d.select("#provenance code.hash").eachText()).allMatch(Pattern.compile("[0-9a-f]{64}").asMatchPredicate());
        assertThat(d.select("ol.comments > li")).isNotEmpty();
    }
}
