package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.assay.audit.AuditResult;
import org.assay.audit.Finding;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Element;

/** HtmlPlots on the demo audits: which tables and claims get plots, and that the model stays plain and untouched. */
class HtmlPlotsTest {
    @TempDir Path tmp;

    @Test
    void oneForestPlotPerTableAndAHistogramForEachClaimWithBootstrapResamples() throws Exception {
        AuditResult r = DemoAudit.run(tmp, "birdcalls", DemoAudit.BIRDCALLS);
        Map<String, Object> plotted = HtmlPlots.withPlots(ReportModel.audit(r, DemoAudit.provenance()), r);
        List<Map<String, Object>> tables = list(plotted.get("tables"));
        assertThat(tables).hasSize(1);
        Element forest = SvgReader.parse((String) tables.get(0).get("forest_svg"));
        List<Map<String, Object>> claims = list(tables.get(0).get("claims"));
        assertThat(SvgReader.byClass(forest, "forest-row")).hasSize(claims.size()).hasSize(r.findings().size());
        for (int i = 0; i < claims.size(); i++) {
            Finding f = r.findings().get(i);
            Map<String, Object> c = claims.get(i);
            // macro F1 is the demo's bootstrap claim; accuracy and top-3 accuracy are exact, ROC AUC is DeLong
            boolean bootstrap = f.claim().metric().equals("macro_f1");
            assertThat(c.get("has_histogram")).as(f.claim().label()).isEqualTo(bootstrap);
            assertThat(f.histogram() != null).isEqualTo(bootstrap);
            if (bootstrap) {
                Element h = SvgReader.parse((String) c.get("histogram_svg"));
                assertThat(SvgReader.byClass(h, "bin")).hasSize(f.histogram().counts().length);
            } else {
                assertThat(c.get("histogram_svg")).isEqualTo("");
            }
        }
    }

    @Test
    void theModelGivenIsLeftAsItWasAndTheCopyHoldsOnlyPlainValues() throws Exception {
        AuditResult r = DemoAudit.run(tmp, "harbour", DemoAudit.HARBOUR);
        Map<String, Object> model = ReportModel.audit(r, DemoAudit.provenance());
        String before = model.toString();
        Map<String, Object> plotted = HtmlPlots.withPlots(model, r);
        assertThat(model.toString()).isEqualTo(before);
        assertThat(list(model.get("tables")).get(0)).doesNotContainKey("forest_svg");
        assertPlain(plotted);
        // harbour's R@50 cannot be computed: its row says so; RSUM is bootstrapped and has a histogram
        Map<String, Object> table = list(plotted.get("tables")).get(0);
        Element forest = SvgReader.parse((String) table.get("forest_svg"));
        assertThat(SvgReader.byClass(forest, "forest-row")).extracting(e -> e.getAttribute("data-verdict"))
                .contains("not computable", "discrepant", "inconclusive");
        assertThat(list(table.get("claims"))).filteredOn(c -> Boolean.TRUE.equals(c.get("has_histogram")))
                .extracting(c -> c.get("metric")).containsExactly("rsum");
    }

    @Test
    void aModelWhoseClaimsDoNotMatchTheFindingsIsAnInternalError() throws Exception {
        AuditResult r = DemoAudit.run(tmp, "birdcalls", DemoAudit.BIRDCALLS);
        Map<String, Object> model = HtmlPlots.deepCopy(ReportModel.audit(r, DemoAudit.provenance()));
        list(list(model.get("tables")).get(0).get("claims")).remove(0);
        assertThatThrownBy(() -> HtmlPlots.withPlots(model, r)).isInstanceOf(IllegalStateException.class)
                .hasMessageContaining("table T2");
    }

    private static void assertPlain(Object v) {
        if (v instanceof Map<?, ?> m) {
            m.forEach((k, x) -> {
                assertThat(k).isInstanceOf(String.class);
                assertPlain(x);
            });
        } else if (v instanceof List<?> l) {
            l.forEach(HtmlPlotsTest::assertPlain);
        } else if (v != null) {
            assertThat(v).isInstanceOfAny(String.class, Boolean.class);
        }
    }

    @SuppressWarnings("unchecked")
    static List<Map<String, Object>> list(Object o) { return (List<Map<String, Object>>) o; }
}
