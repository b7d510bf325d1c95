package org.assay.pdf;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;
import org.assay.claims.ClaimsFile;
import org.assay.claims.ClaimsReader;
import org.assay.claims.Scale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A claims draft written as CSV ({@code assay extract --out claims.csv}) from a table whose labels look like
 * spreadsheet formulas: every such text cell is written with a leading quote, numbers are not, and the
 * claims reader gives back the labels as printed. How it was checked: with the guard call removed from
 * ClaimsDraftWriter.csv, the cells are written bare and both tests fail (the row '=quoted then reads back
 * as =quoted); with the unguard call removed from CsvTreeReader, {@code theClaimsReaderReadsTheLabelsBackAsPrinted}
 * fails (the rows read back as '=SUM(A1) and so on).
 */
class ClaimsDraftCsvGuardTest {
    private static final List<String> ROWS = List.of("=SUM(A1)", "+cmd|' /C calc'!A0", "-2+3", "@SUM(1)", "'=quoted",
            "ChirpNet (ours)");
    private static final String COLUMN = "=HYPERLINK(\"http://127.0.0.1:1/\",\"Accuracy\")";
    private static final String CAPTION = "-Results on the invented test set";

    @TempDir Path tmp;

    private static Extraction extraction(String value) {
        List<ExtractedCell> cells = new ArrayList<>();
        for (String row : ROWS) {
            ParsedCell parsed = new ParsedCell(ParsedCell.Kind.NUMBER, value, null, null, false, List.of(), value, 1.0);
            cells.add(new ExtractedCell(List.of(row), List.of(COLUMN), value, parsed, false, false, List.of(), 3,
                    10, 20, 30, 40, 1.0));
        }
        ExtractedTable t = new ExtractedTable("2", CAPTION, 3, 0, 0, 100, 100, List.of(List.of(COLUMN)),
                List.of(new MetricGuess("accuracy", Map.of(), 0.9, "header says Accuracy")),
                List.of(new ScaleGuess(Scale.PERCENT, 0.9, "values above 1")), List.of("Method"),
                ROWS.stream().map(List::of).toList(), cells);
        return new Extraction(Path.of("paper.pdf"), "Invented paper", 4, List.of(t), List.of());
    }

    @Test
    void formulaLabelsAreQuotedInTheFile() throws Exception {
        String csv = ClaimsDraftWriter.write(extraction("-0.5"), "csv");
        List<Map<String, String>> rows = new ArrayList<>();
        try (MappingIterator<Map<String, String>> it = new CsvMapper().enable(CsvParser.Feature.WRAP_AS_ARRAY)
                .readerForMapOf(String.class).with(com.fasterxml.jackson.dataformat.csv.CsvSchema.emptySchema().withHeader())
                .readValues(csv)) {
            it.forEachRemaining(rows::add);
        }
        assertThat(rows).hasSize(ROWS.size());
        for (int i = 0; i < ROWS.size(); i++) {
            Map<String, String> r = rows.get(i);
            String row = ROWS.get(i);
            assertThat(r.get("row")).isEqualTo(row.equals("ChirpNet (ours)") ? row : "'" + row);
            assertThat(r.get("column")).isEqualTo("'" + COLUMN);
            assertThat(r.get("caption")).isEqualTo("'" + CAPTION);
            assertThat(r.get("value")).as("a number stays a number").isEqualTo("-0.5");
            for (String cell : r.values()) {
                if (!cell.isEmpty() && "=+-@\t\r".indexOf(cell.charAt(0)) >= 0) assertThat(cell).isEqualTo("-0.5");
            }
        }
    }

    @Test
    void theClaimsReaderReadsTheLabelsBackAsPrinted() throws Exception {
        Path file = Files.writeString(tmp.resolve("claims.csv"), ClaimsDraftWriter.write(extraction("94.1"), "csv"));
        ClaimsFile read = ClaimsReader.read(file);
        assertThat(read.tables()).singleElement().satisfies(t -> assertThat(t.caption()).isEqualTo(CAPTION));
        assertThat(read.allClaims()).extracting(Claim::row).containsExactlyElementsOf(ROWS);
        assertThat(read.allClaims()).allSatisfy(c -> assertThat(c.column()).containsExactly(COLUMN));
    }
}
