package org.assay.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.math.BigDecimal;
import org.assay.claims.PrintedValue;
import org.assay.pdf.CellText;
import org.assay.pdf.ParsedCell;

/**
 * Fuzzes the PDF cell parser: CellText turns a cell's text into a printed number (with its uncertainty,
 * percent sign and marks) or a missing mark or text. It is pure string work and never rejects a cell, so
 * any exception is a finding. A number's plain form goes into the claims draft and is read back by the
 * claims reader (PrintedValue.parse) and by the scale guess (BigDecimal), so both must accept it.
 */
class CellTextFuzzTest {

    @FuzzTest(maxDuration = "20s")
    void cell(byte[] input) {
        String text = new String(input, java.nio.charset.StandardCharsets.UTF_8);
        ParsedCell cell = CellText.parse(text);
        CellText.normaliseLabel(text);
        if (!(cell.confidence() >= 0 && cell.confidence() <= 1)) {
            throw new AssertionError("confidence " + cell.confidence() + " for [" + text + "]");
        }
        if (cell.kind() == ParsedCell.Kind.NUMBER) {
            plainNumber(cell.plainValue(), text);
            if (cell.pm() != null) plainNumber(cell.plainPm(), text);
        } else if (cell.value() != null || cell.pm() != null) {
            throw new AssertionError(cell.kind() + " cell with a value, for [" + text + "]");
        }
    }

    private static void plainNumber(String plain, String text) {
        try {
            PrintedValue.parse(plain);
            new BigDecimal(plain);
        } catch (NumberFormatException e) {
            throw new AssertionError("plain form [" + plain + "] of [" + text + "] is not a plain decimal", e);
        }
    }
}
