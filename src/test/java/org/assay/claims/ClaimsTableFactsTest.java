package org.assay.claims;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The table facts the claim-only checks use: class counts, compared rows, per-claim sizes, bold. */
class ClaimsTableFactsTest {
    @TempDir Path tmp;

    private static final String YAML = String.join("\n",
            "tables:",
            "  - id: R1",
            "    test_size: 1000",
            "    class_counts: {pos: 120, neg: 880}",
            "    compare: [[Ours, Baseline]]",
            "    claims:",
            "      - {row: Ours, column: [Text to image, R@1], metric: recall_at_k, params: {k: 1}, value: \"41.2\",",
            "         scale: percent, test_size: 5000, bold: true}",
            "      - {row: Baseline, column: [Text to image, R@1], metric: recall_at_k, params: {k: 1}, value: \"40.9\",",
            "         scale: percent, test_size: 5000}",
            "");

    @Test
    void factsAreReadAndRoundTrip() throws Exception {
        ClaimsFile f = ClaimsReader.read(Files.writeString(tmp.resolve("c.yaml"), YAML));
        ClaimTable t = f.tables().get(0);
        assertThat(t.classCounts()).isEqualTo(Map.of("pos", 120L, "neg", 880L));
        assertThat(t.compare()).containsExactly(List.of("Ours", "Baseline"));
        Claim ours = t.claims().get(0);
        assertThat(ours.bold()).isTrue();
        assertThat(ours.testSizeIn(t)).isEqualTo(5000);
        assertThat(t.claims().get(1).bold()).isFalse();
        Path again = Files.writeString(tmp.resolve("again.yaml"), ClaimsWriter.toYaml(f));
        assertThat(ClaimsTestSupport.withoutLocations(ClaimsReader.read(again)))
                .isEqualTo(ClaimsTestSupport.withoutLocations(f));
    }

    @Test
    void badFactsNameTheLine() throws Exception {
        Path bad = Files.writeString(tmp.resolve("b.yaml"), YAML.replace("pos: 120", "pos: many"));
        assertThatThrownBy(() -> ClaimsReader.read(bad)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("b.yaml").hasMessageContaining("line 4").hasMessageContaining("whole number");
        Path pair = Files.writeString(tmp.resolve("p.yaml"), YAML.replace("[[Ours, Baseline]]", "[[Ours]]"));
        assertThatThrownBy(() -> ClaimsReader.read(pair)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("line 5").hasMessageContaining("pair");
        Path flag = Files.writeString(tmp.resolve("f.yaml"), YAML.replace("bold: true", "bold: yes please"));
        assertThatThrownBy(() -> ClaimsReader.read(flag)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("true or false");
    }
}
