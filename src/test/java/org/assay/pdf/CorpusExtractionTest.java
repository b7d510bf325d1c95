package org.assay.pdf;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Extraction against the corpus of pdfTeX papers in src/test/resources/pdf: each answer key was
 * written by hand from the LaTeX source and checked against poppler's {@code pdftotext -layout}
 * (verify-keys.sh), so it is independent of this code. Acceptance: every table found, and at least
 * 99% of numeric cells with the exact printed value and the right row and column paths.
 */
class CorpusExtractionTest {
    static final Path CORPUS = Path.of("src/test/resources/pdf");
    private static final List<String> problems = new ArrayList<>();
    private static int numericCells;
    private static int numericRight;
    private static int styledCells;
    private static int styledRight;
    private static int tablesExpected;
    private static int tablesFound;
    private static int extraTables;

    @BeforeAll
    static void extractEveryPaper() throws IOException {
        List<Path> keys;
        try (Stream<Path> s = Files.list(CORPUS.resolve("keys"))) {
            keys = s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
        }
        assertThat(keys).as("answer keys").hasSizeGreaterThanOrEqualTo(11);
        for (Path key : keys) compare(new YAMLMapper().readTree(key.toFile()));
        problems.forEach(System.out::println);
        System.out.printf("corpus: %d/%d tables, %d extra; numeric cells %d/%d; marks and styles %d/%d%n",
                tablesFound, tablesExpected, extraTables, numericRight, numericCells, styledRight, styledCells);
    }

    @Test
    void everyTableIsFoundAndNoOtherIs() {
        assertThat(tablesFound).as("tables found; problems: %s", problems).isEqualTo(tablesExpected);
        assertThat(extraTables).as("tables that are not in the keys; problems: %s", problems).isZero();
    }

    @Test
    void numericCellsHaveTheirPrintedValueAndPaths() {
        assertThat(numericCells).isGreaterThan(300);
        assertThat((double) numericRight / numericCells).as("share right; problems: %s", problems).isGreaterThanOrEqualTo(0.99);
    }

    @Test
    void boldUnderlineMarksAndPercentSignsAreRecorded() {
        assertThat(styledCells).isGreaterThan(20);
        assertThat((double) styledRight / styledCells).as("share right; problems: %s", problems).isGreaterThanOrEqualTo(0.99);
    }

    private static void compare(JsonNode key) {
        String pdf = key.get("pdf").asText();
        Extraction x = new TableExtractor().extract(CORPUS.resolve(pdf), null, null, null);
        boolean cellsListed = !key.has("cells_listed") || key.get("cells_listed").asBoolean();
        List<ExtractedTable> unmatched = new ArrayList<>(x.tables());
        for (JsonNode t : key.get("tables")) {
            tablesExpected++;
            String number = t.get("number").asText();
            int page = t.get("page").asInt();
            ExtractedTable found = x.tables().stream().filter(e -> e.number().equals(number) && e.page() == page)
                    .findFirst().orElse(null);
            if (found == null) {
                problems.add(pdf + ": table " + number + " on page " + page + " not found");
                if (cellsListed) for (JsonNode c : t.get("cells")) if (c.has("value")) numericCells++;
                continue;
            }
            tablesFound++;
            unmatched.remove(found);
            String captionStart = t.get("caption_start").asText();
            if (!found.caption().startsWith(captionStart)) {
                problems.add(pdf + " T" + number + ": caption '" + found.caption() + "' does not start with '" + captionStart + "'");
            }
            if (cellsListed) compareCells(pdf, number, t, found);
        }
        for (ExtractedTable e : unmatched) {
            extraTables++;
            problems.add(pdf + ": extra table " + e.number() + " on page " + e.page());
        }
    }

    private static void compareCells(String pdf, String number, JsonNode t, ExtractedTable found) {
        List<List<String>> columns = paths(t.get("columns"));
        List<List<String>> rows = paths(t.get("rows"));
        if (!columns.equals(found.columns())) problems.add(pdf + " T" + number + ": columns " + found.columns() + " expected " + columns);
        if (!rows.equals(found.rows())) problems.add(pdf + " T" + number + ": rows " + found.rows() + " expected " + rows);
        for (JsonNode c : t.get("cells")) {
            List<String> row = path(c.get("row")), column = path(c.get("column"));
            ExtractedCell e = found.cells().stream().filter(x -> x.rowPath().equals(row) && x.columnPath().equals(column))
                    .findFirst().orElse(null);
            String where = pdf + " T" + number + " " + row + " " + column;
            if (c.has("value")) {
                numericCells++;
                boolean right = e != null && e.parsed().kind() == ParsedCell.Kind.NUMBER
                        && c.get("value").asText().equals(e.parsed().value())
                        && text(c, "pm").equals(e.parsed().pm() == null ? "" : e.parsed().pm());
                if (right) numericRight++;
                else problems.add(where + ": expected " + c.get("value").asText() + " ± " + text(c, "pm") + ", got "
                        + (e == null ? "no cell" : e.parsed()));
            } else if (c.has("missing") && (e == null || e.parsed().kind() != ParsedCell.Kind.MISSING)) {
                problems.add(where + ": expected a missing mark, got " + (e == null ? "no cell" : e.parsed()));
            }
            boolean styled = c.has("bold") || c.has("underline") || c.has("markers") || c.has("percent");
            boolean extractedStyled = e != null && (e.bold() || e.underline() || !e.markers().isEmpty() || e.parsed().percent());
            if (!styled && !extractedStyled) continue;
            styledCells++;
            boolean right = e != null && e.bold() == c.path("bold").asBoolean(false)
                    && e.underline() == c.path("underline").asBoolean(false)
                    && e.parsed().percent() == c.path("percent").asBoolean(false)
                    && e.markers().equals(c.has("markers") ? path(c.get("markers")) : List.of());
            if (right) styledRight++;
            else problems.add(where + ": style expected " + c + ", got " + (e == null ? "no cell" : "bold=" + e.bold()
                    + " underline=" + e.underline() + " percent=" + e.parsed().percent() + " markers=" + e.markers()));
        }
    }

    private static String text(JsonNode c, String field) { return c.has(field) ? c.get(field).asText() : ""; }

    private static List<List<String>> paths(JsonNode n) {
        List<List<String>> out = new ArrayList<>();
        for (JsonNode p : n) out.add(path(p));
        return out;
    }

    private static List<String> path(JsonNode n) {
        List<String> out = new ArrayList<>();
        for (JsonNode s : n) out.add(s.asText());
        return out;
    }
}
