package org.assay.claims;

import static org.assay.claims.ClaimsTestSupport.rejected;
import static org.assay.claims.ClaimsTestSupport.write;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * One test per way a claims file can be wrong. Each checks that the message names the file,
 * the line (YAML, CSV) or JSON pointer, the problem, and the fix.
 */
class ClaimsValidationTest {
    @TempDir Path dir;

    /** A valid YAML file whose only claim is {@code claimLines}, starting on line 5. */
    private static String yamlClaim(String claimLines) {
        return """
                tables:
                  - id: T1
                    test_size: 100
                    claims:
                """ + claimLines.stripIndent().lines().map(l -> "      " + l + "\n").reduce("", String::concat);
    }

    private UserInputException yamlRejected(String claimLines) {
        return rejected(write(dir, "claims.yaml", yamlClaim(claimLines)));
    }

    private static void assertNames(UserInputException e, String file, String position, String problem, String fix) {
        assertThat(e.where().getFileName()).hasToString(file);
        assertThat(e.position()).isEqualTo(position);
        assertThat(e.problem()).contains(problem);
        assertThat(e.fix()).contains(fix);
        assertThat(e.oneLine()).contains(file).contains(position).contains(fix);
    }

    @Test
    void sanityTheTemplateIsValid() {
        ClaimsFile f = ClaimsReader.read(write(dir, "ok.yaml", yamlClaim("""
                - row: A
                  metric: accuracy
                  value: "50.0"
                  scale: percent
                """)));
        assertThat(f.allClaims()).singleElement().satisfies(c -> assertThat(c.location().line()).isEqualTo(5));
    }

    @Test
    void missingMetric() {
        UserInputException e = yamlRejected("""
                - row: A
                  value: "50.0"
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 5", "claim 1 of table T1 has no metric", "add metric:");
    }

    @Test
    void metricThatIsNotAnId() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: Macro-F1
                  value: "50.0"
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 6", "\"Macro-F1\" is not a metric id", "macro_f1");
    }

    @Test
    void missingValue() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 5", "has no value", "add value:");
    }

    @Test
    void emptyValue() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value:
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 7", "has no value", "exactly as printed");
    }

    @Test
    void decimalComma() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: 94,1
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 7", "decimal comma", "use a decimal point: 94.1");
    }

    @Test
    void spaceInsideTheNumber() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: 9 4.1
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 7", "contains a space", "94.1");
    }

    @Test
    void percentSign() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: 94.1%
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 7", "percent sign", "drop the % and set scale: percent");
    }

    @ParameterizedTest
    @ValueSource(strings = {".nan", "NaN", "inf", "-.inf", "abc", "true", "0x1F", "1e-3"})
    void notAPlainFiniteNumber(String text) {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: %s
                  scale: percent
                """.formatted(text));
        assertThat(e.position()).isEqualTo("line 7");
        assertThat(e.problem()).contains("value").contains(text);
        assertThat(e.fix()).isNotBlank();
    }

    @ParameterizedTest
    @CsvSource({
            "1e1000000666666666668, without an exponent",  // beyond BigDecimal's exponent range (ClaimsFileFuzzTest)
            "1e999999999, without an exponent",            // a billion zeros: no example is spelled out
            "2.5e1, for example 25"})
    void exponentsAreRejectedWithAShortFix(String text, String fix) {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: %s
                  scale: percent
                """.formatted(text));
        assertNames(e, "claims.yaml", "line 7", "is written with an exponent", fix);
        assertThat(e.oneLine()).hasSizeLessThan(300);
    }

    @Test
    void badScale() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: "50.0"
                  scale: percentage
                """);
        assertNames(e, "claims.yaml", "line 8", "\"percentage\" is not percent or fraction", "use percent");
    }

    @Test
    void noScaleOnClaimOrTable() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: "50.0"
                """);
        assertNames(e, "claims.yaml", "line 5", "has no scale", "to the claim or to its table");
    }

    @Test
    void badPmKind() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: "50.0"
                  scale: percent
                  pm: 0.3
                  pm_kind: std
                """);
        assertNames(e, "claims.yaml", "line 10", "pm_kind \"std\"", "sd, se, ci95 or unknown");
    }

    @Test
    void pmWithoutPmKind() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: "50.0"
                  scale: percent
                  pm: 0.3
                """);
        assertNames(e, "claims.yaml", "line 9", "pm is given without pm_kind", "add pm_kind:");
    }

    @Test
    void negativePm() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: "50.0"
                  scale: percent
                  pm: -0.3
                  pm_kind: sd
                """);
        assertNames(e, "claims.yaml", "line 9", "is negative", "without a sign");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"0|at least 1", "-5|at least 1", "12.5|not a whole number",
            "'\"4,000\"'|not a whole number", "unknown|not a whole number"})
    void badTestSize(String text, String problem) {
        UserInputException e = rejected(write(dir, "claims.yaml", """
                tables:
                  - id: T1
                    test_size: %s
                    claims:
                      - {metric: accuracy, value: "50.0", scale: percent}
                """.formatted(text)));
        assertNames(e, "claims.yaml", "line 3", problem, "or null when unknown");
    }

    @Test
    void runsZero() {
        UserInputException e = rejected(write(dir, "claims.yaml", """
                tables:
                  - id: T1
                    runs: 0
                    claims:
                      - {metric: accuracy, value: "50.0", scale: percent}
                """));
        assertNames(e, "claims.yaml", "line 3", "runs of table T1 is 0; it must be at least 1", "at least 1");
    }

    @Test
    void duplicateTableId() {
        UserInputException e = rejected(write(dir, "claims.yaml", """
                tables:
                  - id: T1
                    claims:
                      - {metric: accuracy, value: "50.0", scale: percent}
                  - id: T1
                    claims:
                      - {metric: accuracy, value: "60.0", scale: percent}
                """));
        assertNames(e, "claims.yaml", "line 5", "table id T1 is used twice (first at line 2)", "its own id");
    }

    @Test
    void unknownFieldListsTheAllowedOnes() {
        UserInputException e = rejected(write(dir, "claims.yaml", """
                tables:
                  - id: T1
                    tset_size: 100
                    claims:
                      - {metric: accuracy, value: "50.0", scale: percent}
                """));
        assertNames(e, "claims.yaml", "line 3", "unknown field \"tset_size\"", "test_size");
        assertThat(e.fix()).contains("id, caption, test_size, runs, scale, margin, class_counts, compare, claims");
    }

    @Test
    void unknownClaimField() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: "50.0"
                  scale: percent
                  paramz: {k: 5}
                """);
        assertNames(e, "claims.yaml", "line 9", "unknown field \"paramz\"", "params");
    }

    @Test
    void duplicateKeyInYaml() {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: "50.0"
                  value: "60.0"
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 8", "appears twice", "keep one");
    }

    @Test
    void badYamlSyntaxGivesTheParsersLine() {
        UserInputException e = rejected(write(dir, "claims.yaml", """
                tables:
                  - id: T1
                    claims:
                      - metric: accuracy
                        value: "50.0
                        scale: percent
                """));
        // the unclosed quote on line 5 runs to the end of the stream (line 7)
        assertThat(e.where().getFileName()).hasToString("claims.yaml");
        assertThat(e.problem()).startsWith("YAML syntax error").contains("quoted scalar");
        assertThat(e.position()).isEqualTo("line 7");
    }

    @Test
    void badYamlIndentation() {
        UserInputException e = rejected(write(dir, "claims.yaml", """
                tables:
                  - id: T1
                    claims:
                      - metric: accuracy
                        value: "50.0"
                       scale: percent
                """));
        assertNames(e, "claims.yaml", "line 6", "YAML syntax error", "indentation");
    }

    @Test
    void aliasBombIsStoppedByTheAliasLimit() {
        // The classic "billion laughs": nine levels of nine aliases each.
        StringBuilder y = new StringBuilder("a: &a [\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\"]\n");
        for (char c = 'b'; c <= 'i'; c++) {
            char p = (char) (c - 1);
            y.append(c).append(": &").append(c).append(" [");
            for (int i = 0; i < 9; i++) y.append(i == 0 ? "" : ",").append('*').append(p);
            y.append("]\n");
        }
        UserInputException e = rejected(write(dir, "bomb.yaml", y.toString()));
        assertThat(e.where().getFileName()).hasToString("bomb.yaml");
        // 9 aliases per line from line 2: the 51st alias is on line 7
        assertThat(e.position()).isEqualTo("line 7");
        assertThat(e.problem()).contains("too many YAML aliases").contains("limit yaml-aliases is 50");
        assertThat(e.fix()).contains("--limit yaml-aliases=N");
    }

    @Test
    void aliasBombWithinTheAliasLimitIsStoppedByTheExpansionLimit() {
        // 16 levels of 3 aliases = 48 aliases (under 50) but 3^16 (43 million) leaves.
        StringBuilder y = new StringBuilder("l0: &l0 [x, x, x]\n");
        for (int level = 1; level <= 16; level++) {
            String p = "*l" + (level - 1);
            y.append("l").append(level).append(": &l").append(level)
                    .append(" [").append(p).append(", ").append(p).append(", ").append(p).append("]\n");
        }
        UserInputException e = rejected(write(dir, "bomb.yaml", y.toString()));
        assertThat(e.problem()).contains("expands to too many values").contains("limit yaml-values is 1000000");
        // l_k expands to (3^(k+2)-1)/2 nodes; the running total passes one million inside l11, on line 12
        assertThat(e.position()).isEqualTo("line 12");
    }

    @Test
    void aliasThatContainsItself() {
        UserInputException e = rejected(write(dir, "loop.yaml", "tables: &t [*t]\n"));
        assertThat(e.problem()).contains("nested too deeply").contains("limit depth is 64");
        assertThat(e.position()).isEqualTo("line 1");
    }

    @ParameterizedTest
    @ValueSource(strings = {"!!java.lang.Runtime x", "!foo 50.0", "!!binary aGVsbG8=", "!<tag:example.com,2000:x> 1",
            "!!set {a, b}", "!!python/object:os.system [ls]", "!!java.net.URL [\"http://127.0.0.1:1/\"]",
            "!!javax.script.ScriptEngineManager []", "!include /etc/passwd"})
    void customTagsAreRefused(String tagged) {
        UserInputException e = yamlRejected("""
                - row: A
                  metric: accuracy
                  value: %s
                  scale: percent
                """.formatted(tagged));
        assertThat(e.position()).isEqualTo("line 7");
        assertThat(e.problem()).contains("tag").contains("is not allowed");
        assertThat(e.problem()).contains(tagged.substring(0, tagged.indexOf(' ')));
        assertThat(e.fix()).contains("remove the tag");
    }

    @Test
    void coreTagsAreAllowed() {
        ClaimsFile f = ClaimsReader.read(write(dir, "claims.yaml", yamlClaim("""
                - row: !!str 2019
                  metric: accuracy
                  value: !!str 50.10
                  scale: percent
                """)));
        assertThat(f.allClaims().get(0).row()).isEqualTo("2019");
        assertThat(f.allClaims().get(0).value().text()).isEqualTo("50.10");
    }

    @Test
    void deepYamlNesting() {
        String deep = "tables: " + "[".repeat(5000) + "]".repeat(5000) + "\n";
        UserInputException e = rejected(write(dir, "deep.yaml", deep));
        assertThat(e.problem()).contains("nested too deeply").contains("limit depth is 64");
        assertThat(e.position()).isEqualTo("line 1");
    }

    @Test
    void multiDocumentYaml() {
        UserInputException e = rejected(write(dir, "claims.yaml", """
                tables:
                  - id: T1
                    claims:
                      - {metric: accuracy, value: "50.0", scale: percent}
                ---
                tables: []
                """));
        assertNames(e, "claims.yaml", "line 5", "more than one YAML document", "remove the '---'");
    }

    @ParameterizedTest
    @ValueSource(strings = {"empty.yaml", "empty.json", "empty.csv"})
    void emptyFile(String name) {
        UserInputException e = rejected(write(dir, name, ""));
        assertThat(e.where().getFileName()).hasToString(name);
        assertThat(e.problem()).isEqualTo("the file is empty");
    }

    @Test
    void commentsOnlyYamlIsEmpty() {
        UserInputException e = rejected(write(dir, "c.yaml", "# nothing here yet\n"));
        assertThat(e.problem()).isEqualTo("the file is empty");
    }

    @Test
    void oversizedFileIsRefusedBeforeReading() throws Exception {
        Path big = dir.resolve("big.yaml");
        try (java.io.RandomAccessFile f = new java.io.RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(50L * 1024 * 1024 + 1); // sparse: nothing is actually written
        }
        UserInputException e = rejected(big);
        assertThat(e.problem()).isEqualTo("the file has 52428801 bytes (limit claims-bytes is 52428800)");
        assertThat(e.fix()).contains("--limit claims-bytes=N");
    }

    @Test
    void notUtf8() throws Exception {
        Path p = dir.resolve("latin1.yaml");
        java.nio.file.Files.write(p, "tables:\n  - id: caf\u00e9\n".getBytes(java.nio.charset.StandardCharsets.ISO_8859_1));
        UserInputException e = rejected(p);
        // "tables:\n" is 8 bytes and "  - id: caf" 11 more: the Latin-1 é is byte 19, on line 2
        assertNames(e, "latin1.yaml", "line 2 (byte offset 19)", "the file is not UTF-8 text (byte 0xE9 here)", "UTF-8");
    }

    @Test
    void controlCharacterInYaml() {
        UserInputException e = rejected(write(dir, "bell.yaml", "tables:\n  - id: T\u0007\n"));
        assertThat(e.problem()).contains("U+0007");
        assertThat(e.position()).isEqualTo("line 2");
    }

    @Test
    void unknownExtension() {
        UserInputException e = rejected(write(dir, "claims.txt", "tables: []"));
        assertThat(e.fix()).contains(".yaml, .yml, .json or .csv");
    }

    // ---- JSON: positions are JSON pointers with the line

    @Test
    void jsonErrorNamesThePointer() {
        UserInputException e = rejected(write(dir, "claims.json", """
                {"tables": [{"id": "T1", "claims": [
                  {"metric": "accuracy", "value": "50.0", "scale": "percent"},
                  {"metric": "accuracy",
                   "value": "94,1", "scale": "percent"}]}]}
                """));
        assertNames(e, "claims.json", "/tables/0/claims/1/value (line 4)", "decimal comma", "use a decimal point: 94.1");
    }

    @Test
    void jsonMissingValueNamesTheClaim() {
        UserInputException e = rejected(write(dir, "claims.json", """
                {"tables": [{"id": "T1", "claims": [
                  {"metric": "accuracy", "scale": "percent"}]}]}
                """));
        assertNames(e, "claims.json", "/tables/0/claims/0 (line 2)", "has no value", "add value:");
    }

    @Test
    void jsonUnknownField() {
        UserInputException e = rejected(write(dir, "claims.json", """
                {"tables": [{"id": "T1", "tset_size": 5, "claims": []}]}
                """));
        assertNames(e, "claims.json", "/tables/0/tset_size (line 1)", "unknown field", "test_size");
    }

    @Test
    void deepJsonNestingFailsWithAMessageNotAStackOverflow() {
        String deep = "{\"tables\": " + "[".repeat(200_000) + "]".repeat(200_000) + "}";
        UserInputException e = rejected(write(dir, "deep.json", deep));
        assertThat(e.where().getFileName()).hasToString("deep.json");
        assertThat(e.problem()).contains("nested").contains("64");
        assertThat(e.position()).startsWith("/tables/0/0/0").endsWith("(line 1)");
    }

    @Test
    void jsonDuplicateKey() {
        UserInputException e = rejected(write(dir, "claims.json", """
                {"tables": [{"id": "T1", "claims": [
                  {"metric": "accuracy", "value": "50.0",
                   "value": "60.0", "scale": "percent"}]}]}
                """));
        assertNames(e, "claims.json", "/tables/0/claims/0/value (line 3)", "appears twice in one object (first at line 2)", "keep one");
    }

    @Test
    void jsonWithTrailingContent() {
        UserInputException e = rejected(write(dir, "claims.json", """
                {"tables": []}
                {"tables": []}
                """));
        assertThat(e.problem()).contains("more after the end of the JSON document");
        assertThat(e.position()).isEqualTo("line 2");
    }

    @Test
    void badJsonSyntax() {
        UserInputException e = rejected(write(dir, "claims.json", """
                {"tables": [
                  {"id": "T1",, "claims": []}]}
                """));
        assertThat(e.problem()).startsWith("JSON syntax error");
        assertThat(e.position()).endsWith("(line 2)");
    }

    // ---- CSV

    private static final String HEADER = "table,row,column,metric,params,value,scale,test_size,runs,pm,pm_kind\n";

    @Test
    void csvRaggedRow() {
        UserInputException e = rejected(write(dir, "claims.csv", HEADER
                + "T1,A,Acc,accuracy,,50.0,percent,100,1,,\n"
                + "T1,B,Acc,accuracy,,60.0,percent,100,1\n"));
        assertNames(e, "claims.csv", "line 3", "the row has 9 cells but the header has 11 columns", "quote cells");
    }

    @Test
    void csvConflictingTestSize() {
        UserInputException e = rejected(write(dir, "claims.csv", HEADER
                + "T1,A,Acc,accuracy,,50.0,percent,100,1,,\n"
                + "T2,A,Acc,accuracy,,50.0,percent,300,1,,\n"
                + "T1,B,Acc,accuracy,,60.0,percent,200,1,,\n"));
        assertNames(e, "claims.csv", "line 4", "rows of table T1 disagree on test_size: \"200\" here but \"100\" at line 2",
                "same test_size");
    }

    @Test
    void csvUnknownColumn() {
        UserInputException e = rejected(write(dir, "claims.csv",
                HEADER.replace("test_size", "tset_size") + "T1,A,Acc,accuracy,,50.0,percent,100,1,,\n"));
        assertNames(e, "claims.csv", "line 1", "unknown column \"tset_size\"", "test_size");
    }

    @Test
    void csvMissingColumns() {
        UserInputException e = rejected(write(dir, "claims.csv",
                "table,row,column,metric,params,value,scale,test_size,runs\nT1,A,Acc,accuracy,,50.0,percent,100,1\n"));
        assertNames(e, "claims.csv", "line 1", "lacks the columns pm, pm_kind", "caption, page and margin are optional");
    }

    @Test
    void csvValueErrorNamesTheRowLine() {
        UserInputException e = rejected(write(dir, "claims.csv", HEADER
                + "T1,A,Acc,accuracy,,50.0,percent,100,1,,\n"
                + "T1,B,Acc,accuracy,,94.1%,percent,100,1,,\n"));
        assertNames(e, "claims.csv", "line 3", "percent sign", "drop the %");
    }

    @Test
    void csvBadParams() {
        UserInputException e = rejected(write(dir, "claims.csv", HEADER
                + "T1,A,Acc,recall_at_k,k5,50.0,percent,100,1,,\n"));
        assertNames(e, "claims.csv", "line 2", "not key=value", "key=value;key=value");
    }

    @Test
    void csvMissingScaleSaysWhichColumn() {
        UserInputException e = rejected(write(dir, "claims.csv", HEADER
                + "T1,A,Acc,accuracy,,50.0,,100,1,,\n"));
        assertNames(e, "claims.csv", "line 2", "has no scale", "fill the scale column");
    }

    @Test
    void csvLineNumbersCountQuotedLineBreaks() {
        UserInputException e = rejected(write(dir, "claims.csv", HEADER
                + "T1,\"two\nlines\",Acc,accuracy,,50.0,percent,100,1,,\n"
                + "T1,B,Acc,accuracy,,5 0,percent,100,1,,\n"));
        assertNames(e, "claims.csv", "line 4", "contains a space", "50");
    }

    @Test
    void validUtf8WithFourByteCharactersStillReads() {
        ClaimsFile f = ClaimsReader.read(write(dir, "ok.yaml", yamlClaim("""
                - row: "A \uD83D\uDE00 \u00E9"
                  metric: accuracy
                  value: "50.0"
                  scale: percent
                """)));
        assertThat(f.allClaims().get(0).row()).isEqualTo("A \uD83D\uDE00 \u00E9");
    }

    @Test
    void duplicateClaimNamesBothLines() {
        UserInputException e = yamlRejected("""
                - row: A
                  column: [Acc]
                  metric: accuracy
                  value: "50.0"
                  scale: percent
                - row: B
                  column: [Acc]
                  metric: accuracy
                  value: "51.0"
                  scale: percent
                - row: A
                  column: [Acc]
                  metric: accuracy
                  value: "52.0"
                  scale: percent
                """);
        assertNames(e, "claims.yaml", "line 15", "repeats the row, column and metric of the claim at line 5", "keep one");
        assertThat(e.problem()).contains("\"50.0\"").contains("\"52.0\"");
    }

    @Test
    void sameCellWithAnotherMetricOrParamsIsNotADuplicate() {
        ClaimsFile f = ClaimsReader.read(write(dir, "ok.yaml", yamlClaim("""
                - {row: A, column: [R], metric: recall_at_k, params: {k: 1}, value: "50.0", scale: percent}
                - {row: A, column: [R], metric: recall_at_k, params: {k: 5}, value: "60.0", scale: percent}
                - {row: A, column: [R], metric: accuracy, value: "70.0", scale: percent}
                """)));
        assertThat(f.allClaims()).hasSize(3);
    }

    @Test
    void csvWithAnotherSeparatorSaysWhichOne() {
        for (String[] c : new String[][] {{";", "';'"}, {"\t", "tabs"}, {"|", "'|'"}}) {
            String text = (HEADER + "T1,A,Acc,accuracy,,50.0,percent,100,1,,\n").replace(",", c[0]);
            UserInputException e = rejected(write(dir, "claims.csv", text));
            assertNames(e, "claims.csv", "line 1", "separated by " + c[1] + ", not commas", "commas between cells");
        }
    }

    @Test
    void aHugeExponentIsRefusedWithoutSpellingItOut() {
        // spelling "1e999999999" out would take a billion digits (it once ran the JVM out of memory)
        for (String huge : new String[] {"1e999999999", "1e99999999999", "-2.5E-999999999"}) {
            UserInputException e = yamlRejected("""
                    - row: A
                      metric: accuracy
                      value: "%s"
                      scale: percent
                    """.formatted(huge));
            assertNames(e, "claims.yaml", "line 7", "is written with an exponent", "write the digits as printed");
            assertThat(e.fix()).doesNotContain("for example");
        }
        // a short one still gets its plain form
        UserInputException small = yamlRejected("""
                - {row: A, metric: accuracy, value: "9.41e1", scale: percent}
                """);
        assertThat(small.fix()).endsWith("for example 94.1");
    }

    @Test
    void moreDigitsThanAnyPrintedNumberIsRefused() {
        // 34 digits once reached the exact granularity arithmetic and ended in an internal error
        UserInputException e = yamlRejected("""
                - {row: A, metric: accuracy, value: "94.10000000000000000000000000000001", scale: percent}
                """);
        assertNames(e, "claims.yaml", "line 5", "has 34 digits, more than the limit of 15", "exactly as the paper prints it");
        // a pm is kept as a double, so the writer's 17 significant digits still read back
        assertThat(ClaimsReader.read(write(dir, "pm.yaml", yamlClaim("""
                - {row: A, metric: accuracy, value: "50.0", scale: percent, pm: 0.30000000000000004, pm_kind: sd}
                """))).allClaims().get(0).pm()).isEqualTo(0.1 + 0.2);
        // fifteen digits are still a number
        ClaimsFile f = ClaimsReader.read(write(dir, "ok.yaml", yamlClaim("""
                - {row: A, metric: accuracy, value: "0.9410000000000", scale: fraction}
                """)));
        assertThat(f.allClaims().get(0).value().decimals()).isEqualTo(13);
    }

    @Test
    void compareMustNameTwoRowsOfTheTable() {
        String claims = """
                tables:
                  - id: T1
                    test_size: 100
                    compare: [[Ours, %s]]
                    claims:
                      - {row: Ours, column: [Acc], metric: accuracy, value: "50.0", scale: percent}
                      - {row: Base, column: [Acc], metric: accuracy, value: "40.0", scale: percent}
                """;
        // a misspelt row once made the comparison vanish without a word
        UserInputException e = rejected(write(dir, "claims.yaml", claims.formatted("Bsae")));
        assertNames(e, "claims.yaml", "line 4", "compare names the row \"Bsae\", which has no claims in table T1",
                "exactly as the claims");
        e = rejected(write(dir, "claims.yaml", claims.formatted("Ours")));
        assertNames(e, "claims.yaml", "line 4", "pairs the row \"Ours\" with itself", "two different rows");
        e = rejected(write(dir, "claims.yaml", claims.formatted("~")));
        assertNames(e, "claims.yaml", "line 4", "compare names the row \"null\"", "exactly as the claims");
        assertThat(ClaimsReader.read(write(dir, "ok.yaml", claims.formatted("Base"))).tables().get(0).compare())
                .containsExactly(java.util.List.of("Ours", "Base"));
    }

    @Test
    void aClassCountTooLargeForANumberIsRefused() {
        UserInputException e = rejected(write(dir, "claims.yaml", """
                tables:
                  - id: T1
                    class_counts: {a: 99999999999999999999, b: 1}
                    claims:
                      - {row: Ours, column: [Acc], metric: accuracy, value: "50.0", scale: percent}
                """));
        assertNames(e, "claims.yaml", "line 3", "\"99999999999999999999\", too large", "number of test items");
    }
}
