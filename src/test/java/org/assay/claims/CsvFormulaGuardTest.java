package org.assay.claims;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The CSV formula guard: which cells get a leading quote (the characters the OWASP page on CSV injection
 * lists: = + - @ tab and carriage return; common practice), which stay as they are (plain numbers, other
 * text), and that reading undoes writing exactly.
 */
class CsvFormulaGuardTest {
    @ParameterizedTest
    @CsvSource(delimiter = '|', quoteCharacter = '"', value = {
            "=SUM(A1)|'=SUM(A1)",
            "=HYPERLINK(\"http://127.0.0.1:1/\";\"x\")|'=HYPERLINK(\"http://127.0.0.1:1/\";\"x\")",
            "+cmd|'+cmd",
            "-2+3|'-2+3",
            "@SUM(1)|'@SUM(1)",
            "'=already quoted|''=already quoted",
            "-0.5|-0.5",
            "+1.5|+1.5",
            "-.5|-.5",
            "1e-3|1e-3",
            "-12.5E+2|-12.5E+2",
            "94.1|94.1",
            "ChirpNet (ours)|ChirpNet (ours)",
            "a=b|a=b",
            "'plain|'plain",
            "- dash list|'- dash list"})
    void guardsFormulaStartsAndLeavesNumbersAndOtherText(String cell, String written) {
        assertThat(CsvFormulaGuard.guard(cell)).isEqualTo(written);
        assertThat(CsvFormulaGuard.unguard(written)).isEqualTo(cell);
    }

    @Test
    void tabAndCarriageReturnStartsAreGuarded() {
        assertThat(CsvFormulaGuard.guard("\t=1+1")).isEqualTo("'\t=1+1");
        assertThat(CsvFormulaGuard.guard("\r=1+1")).isEqualTo("'\r=1+1");
        assertThat(CsvFormulaGuard.guard("")).isEmpty();
        assertThat(CsvFormulaGuard.guard(null)).isNull();
    }

    @Test
    void readingUndoesWritingForEveryShortString() {
        // every string of up to 4 characters over the characters that matter, and a few that do not
        char[] alphabet = {'\'', '=', '+', '-', '@', '\t', '\r', '1', '.', 'e', 'a'};
        List<String> all = new ArrayList<>(List.of(""));
        List<String> last = List.of("");
        for (int length = 1; length <= 4; length++) {
            List<String> next = new ArrayList<>();
            for (String s : last) for (char c : alphabet) next.add(s + c);
            all.addAll(next);
            last = next;
        }
        for (String s : all) {
            String written = CsvFormulaGuard.guard(s);
            assertThat(CsvFormulaGuard.unguard(written)).as("round trip of %s", s).isEqualTo(s);
            // what is written never starts a formula, unless it is a plain number
            if (!written.isEmpty() && "=+-@\t\r".indexOf(written.charAt(0)) >= 0) {
                assertThat(written).as(s).matches("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");
            }
        }
    }
}
