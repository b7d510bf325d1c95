package org.assay.claims;

import static org.assay.claims.ClaimsTestSupport.fixture;
import static org.assay.claims.ClaimsTestSupport.withoutLocations;
import static org.assay.claims.ClaimsTestSupport.write;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The three spellings of the same invented claims (src/test/resources/claims/sample.*). */
class ClaimsReaderTest {
    @TempDir Path dir;

    @Test
    void yamlJsonAndCsvReadToTheSameModel() {
        ClaimsFile yaml = withoutLocations(ClaimsReader.read(fixture("sample.yaml")));
        ClaimsFile json = withoutLocations(ClaimsReader.read(fixture("sample.json")));
        // sample.csv starts with a UTF-8 byte-order mark, which must be stripped
        ClaimsFile csv = withoutLocations(ClaimsReader.read(fixture("sample.csv")));
        assertThat(json).isEqualTo(yaml);
        // CSV has no source block; everything else is the same
        assertThat(csv).isEqualTo(new ClaimsFile(null, null, null, yaml.tables()));
    }

    @Test
    void yamlFixtureReadsToTheFieldsWritten() {
        ClaimsFile f = ClaimsReader.read(fixture("sample.yaml"));
        assertThat(f.title()).isEqualTo("A made-up study of toy classifiers");
        assertThat(f.document()).isEqualTo("toy-paper.pdf");
        assertThat(f.tables()).extracting(ClaimTable::id).containsExactly("T1", "T2");

        ClaimTable t1 = f.tables().get(0);
        assertThat(t1.caption()).isEqualTo("Results on an invented benchmark");
        assertThat(t1.testSize()).isEqualTo(4000);
        assertThat(t1.runs()).isEqualTo(1);

        Claim ours = t1.claims().get(0);
        assertThat(ours.tableId()).isEqualTo("T1");
        assertThat(ours.row()).isEqualTo("Ours");
        assertThat(ours.column()).containsExactly("Clip-level", "Accuracy");
        assertThat(ours.metric()).isEqualTo("accuracy");
        assertThat(ours.params()).isEmpty();
        assertThat(ours.scale()).isEqualTo(Scale.PERCENT);
        assertThat(ours.pm()).isEqualTo(0.3);
        assertThat(ours.pmKind()).isEqualTo(PmKind.SD);
        assertThat(ours.page()).isEqualTo(6);
        // margin 1.0 on the percent scale is one percentage point = 0.01 on the fraction scale
        assertThat(ours.margin()).isCloseTo(0.01, within(1e-15));
        assertThat(ours.location().line()).isEqualTo(9);
        assertThat(ours.location().pointer()).isNull();

        Claim baseline = t1.claims().get(1);
        assertThat(baseline.column()).containsExactly("Macro F1"); // a single string is a one-level path
        assertThat(baseline.scale()).isEqualTo(Scale.FRACTION);
        assertThat(baseline.pm()).isNull();
        assertThat(baseline.pmKind()).isNull();
        assertThat(baseline.margin()).isNull();

        assertThat(t1.claims().get(2).params()).isEqualTo(Map.of("k", "5")); // values are stringified

        ClaimTable t2 = f.tables().get(1);
        assertThat(t2.testSize()).isNull();
        assertThat(t2.runs()).isEqualTo(3);
        Claim auc = t2.claims().get(0);
        assertThat(auc.scale()).isEqualTo(Scale.PERCENT); // table default
        assertThat(auc.margin()).isCloseTo(0.005, within(1e-15)); // table default 0.5 percent
    }

    @Test
    void unquotedYamlNumbersKeepTheirPrintedDecimals() {
        ClaimsFile f = ClaimsReader.read(fixture("sample.yaml"));
        PrintedValue v = f.tables().get(0).claims().get(0).value(); // written as value: 87.40
        assertThat(v.text()).isEqualTo("87.40");
        assertThat(v.decimals()).isEqualTo(2);
        PrintedValue auc = f.tables().get(1).claims().get(0).value(); // value: 91.250
        assertThat(auc.text()).isEqualTo("91.250");
        assertThat(auc.decimals()).isEqualTo(3);
        assertThat(f.tables().get(0).claims().get(2).value().text()).isEqualTo("94");
    }

    @Test
    void unquotedJsonNumbersKeepTheirPrintedDecimals() {
        ClaimsFile f = ClaimsReader.read(fixture("sample.json"));
        assertThat(f.tables().get(0).claims().get(0).value().text()).isEqualTo("87.40");
        assertThat(f.tables().get(1).claims().get(0).value().text()).isEqualTo("91.250");
    }

    @Test
    void trailingZerosSurviveInEveryUnquotedSpelling() {
        String yaml = """
                tables:
                  - id: T
                    scale: fraction
                    claims:
                      - {metric: accuracy, value: 0.90}
                      - {metric: accuracy, value: 1.0}
                      - metric: accuracy
                        value: 0.9000
                """;
        String json = """
                {"tables": [{"id": "T", "scale": "fraction", "claims": [
                  {"metric": "accuracy", "value": 0.90},
                  {"metric": "accuracy", "value": 1.0},
                  {"metric": "accuracy", "value": 0.9000}]}]}
                """;
        for (Path p : List.of(write(dir, "z.yaml", yaml), write(dir, "z.json", json))) {
            List<Claim> claims = ClaimsReader.read(p).allClaims();
            assertThat(claims).extracting(c -> c.value().text()).containsExactly("0.90", "1.0", "0.9000");
            assertThat(claims).extracting(c -> c.value().decimals()).containsExactly(2, 1, 4);
        }
    }

    @Test
    void jsonClaimsRecordPointerAndLine() {
        ClaimsFile f = ClaimsReader.read(fixture("sample.json"));
        SourceLocation second = f.tables().get(0).claims().get(1).location();
        assertThat(second.pointer()).isEqualTo("/tables/0/claims/1");
        assertThat(second.line()).isEqualTo(12);
        assertThat(second.file()).isEqualTo(fixture("sample.json"));
    }

    @Test
    void csvClaimsRecordTheirRowLine() {
        ClaimsFile f = ClaimsReader.read(fixture("sample.csv"));
        assertThat(f.allClaims()).extracting(c -> c.location().line()).containsExactly(2, 3, 4, 5);
        assertThat(f.tables().get(1).claims().get(0).params())
                .isEqualTo(Map.of("positive", "bird", "average", "macro"));
    }

    @Test
    void csvCellsWithCommasMayBeQuoted() {
        Path p = write(dir, "q.csv", """
                table,row,column,metric,params,value,scale,test_size,runs,pm,pm_kind
                T,"Ours, large",Acc,accuracy,,50.0,percent,10,,,
                """);
        Claim c = ClaimsReader.read(p).allClaims().get(0);
        assertThat(c.row()).isEqualTo("Ours, large");
        assertThat(ClaimsReader.read(p).tables().get(0).runs()).isEqualTo(1); // empty runs: default 1
    }
}
