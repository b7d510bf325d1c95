package org.assay.claims;

import static org.assay.claims.ClaimsTestSupport.fixture;
import static org.assay.claims.ClaimsTestSupport.withoutLocations;
import static org.assay.claims.ClaimsTestSupport.write;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ClaimsWriterTest {
    @TempDir Path dir;

    @Test
    void yamlRoundTrip() {
        ClaimsFile original = ClaimsReader.read(fixture("sample.yaml"));
        ClaimsFile again = ClaimsReader.read(write(dir, "again.yaml", ClaimsWriter.toYaml(original)));
        assertThat(withoutLocations(again)).isEqualTo(withoutLocations(original));
    }

    @Test
    void jsonRoundTrip() {
        ClaimsFile original = ClaimsReader.read(fixture("sample.json"));
        ClaimsFile again = ClaimsReader.read(write(dir, "again.json", ClaimsWriter.toJson(original)));
        assertThat(withoutLocations(again)).isEqualTo(withoutLocations(original));
    }

    @Test
    void awkwardValuesSurviveBothWriters() {
        Claim c = new Claim("T:1", "Ours: \"big\" # not a comment", List.of("a / b", "yes", "null"), "bleu",
                Map.of("k", "05", "smoothing", "true"), PrintedValue.parse("100.000"), Scale.PERCENT,
                0.1 + 0.2, PmKind.CI95, 3, 0.003, null);
        ClaimsFile f = new ClaimsFile(null, "Title: with colon", null,
                List.of(new ClaimTable("T:1", null, null, 5, List.of(c))));
        ClaimsFile yaml = ClaimsReader.read(write(dir, "w.yaml", ClaimsWriter.toYaml(f)));
        ClaimsFile json = ClaimsReader.read(write(dir, "w.json", ClaimsWriter.toJson(f)));
        assertThat(withoutLocations(yaml)).isEqualTo(f);
        assertThat(withoutLocations(json)).isEqualTo(f);
    }

    @Test
    void valuesAreWrittenAsQuotedStrings() {
        ClaimsFile f = ClaimsReader.read(fixture("sample.yaml"));
        assertThat(ClaimsWriter.toYaml(f)).contains("value: \"87.40\"").contains("value: \"91.250\"");
        assertThat(ClaimsWriter.toJson(f)).contains("\"value\" : \"87.40\"");
    }
}
