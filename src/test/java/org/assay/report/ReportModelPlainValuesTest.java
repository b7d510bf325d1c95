package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.assay.audit.InputFile;
import org.assay.audit.checks.ClaimChecker;
import org.assay.claims.ClaimsReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A Mustache section runs a function it finds in the model ({@code {{#f}}...{{/f}}} calls a
 * {@code java.util.function.Function}), whatever the object handler, so a template can run no code only
 * while the models hold nothing but maps with string keys, lists, strings and booleans. Checked for the
 * audit model of both demo scenarios and for the check model. How it was checked: with a lambda put into
 * ReportModel.audit's top map, {@code auditModelsHoldOnlyPlainValues} fails naming it.
 */
class ReportModelPlainValuesTest {
    @TempDir Path tmp;

    @Test
    void auditModelsHoldOnlyPlainValues() throws Exception {
        assertPlain("birdcalls", ReportModel.audit(DemoAudit.run(tmp.resolve("b"), "birdcalls", DemoAudit.BIRDCALLS),
                DemoAudit.provenance()));
        assertPlain("harbour", ReportModel.audit(DemoAudit.run(tmp.resolve("h"), "harbour", DemoAudit.HARBOUR),
                DemoAudit.provenance()));
    }

    @Test
    void theCheckModelHoldsOnlyPlainValues() {
        Path claims = Path.of("examples/birdcalls/claims.yaml");
        Map<String, Object> model = ReportModel.check(new ClaimChecker().check(ClaimsReader.read(claims)),
                DemoAudit.provenance(), List.of(InputFile.of("claims", claims)));
        assertPlain("check", model);
    }

    private static void assertPlain(String where, Object v) {
        if (v instanceof Map<?, ?> m) {
            m.forEach((k, x) -> {
                assertThat(k).as(where).isInstanceOf(String.class);
                assertPlain(where + "." + k, x);
            });
        } else if (v instanceof List<?> l) {
            for (int i = 0; i < l.size(); i++) assertPlain(where + "[" + i + "]", l.get(i));
        } else if (v != null) {
            assertThat(v).as(where).isInstanceOfAny(String.class, Boolean.class);
        }
    }
}
