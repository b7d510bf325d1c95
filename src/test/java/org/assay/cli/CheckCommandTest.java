package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `assay check` on the demo's claims, and the audit report's claim-only section. */
class CheckCommandTest {
    @TempDir Path tmp;

    private Path demoClaims() throws Exception {
        Path demo = tmp.resolve("demo");
        assertThat(CliRun.of("demo", "--out", demo.toString(), "--resamples", "1000").exitCode()).isZero();
        return demo.resolve("inputs/claims.yaml");
    }

    @Test
    void demoClaimsShowThePlantedImpossibleValueAndAnOverstatedOne() throws Exception {
        Path out = tmp.resolve("check");
        Path claims = demoClaims();
        CliRun run = CliRun.of("check", claims.toString(), "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        // 98.21% on 4,000 clips: k/4000 moves in steps of 0.025 points, so 98.200 and 98.225 are the neighbours
        assertThat(run.out()).contains("infeasible").contains("98.21").contains("98.20");
        assertThat(run.out()).contains("overstated precision").contains("83.05");
        JsonNode json = new ObjectMapper().readTree(out.resolve("check.json").toFile());
        assertThat(json.get("schema_version").asInt()).isEqualTo(1);
        assertThat(json.get("counts").get("infeasible").asInt()).isEqualTo(1);
        String comments = Files.readString(out.resolve("reviewer-comments.md"));
        assertThat(comments).contains("Could the authors").contains("98.21%").contains("[granularity-");
        assertThat(Files.readString(out.resolve("check.md"))).doesNotContain("${");
        // --fail-on infeasible turns the finding into exit code 1
        CliRun strict = CliRun.of("check", claims.toString(), "--out", tmp.resolve("c2").toString(),
                "--fail-on", "infeasible");
        assertThat(strict.exitCode()).isEqualTo(1);
    }

    @Test
    void auditReportIncludesTheChecks() throws Exception {
        Path demo = tmp.resolve("d");
        assertThat(CliRun.of("demo", "--out", demo.toString(), "--resamples", "1000").exitCode()).isZero();
        String md = Files.readString(demo.resolve("report.md"));
        assertThat(md).contains("## Claim-only checks").contains("cannot arise on 4000 items");
        JsonNode json = new ObjectMapper().readTree(demo.resolve("report.json").toFile());
        assertThat(json.get("checks")).isNotEmpty();
        assertThat(json.get("checks").findValuesAsText("kind")).contains("infeasible", "overstated precision");
    }

    @Test
    void missingClaimsFileIsBadInput() {
        CliRun run = CliRun.of("check", tmp.resolve("nope.yaml").toString(), "--out", tmp.resolve("x").toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("nope.yaml");
        assertThat(tmp.resolve("x")).doesNotExist();
    }
}
