package org.assay.data.retrieval;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.TextFiles;

/**
 * A score matrix as comma-separated text: one line per query, one score per candidate, and an
 * optional first line of candidate ids (recognised because not all of its fields are numbers).
 * Blank lines are skipped. {@code inf}, {@code -inf} (as NumPy's savetxt writes them) and
 * Java's {@code Infinity} are accepted; NaN is not.
 *
 * <p>{@link #open} reads the file once to check its shape; {@link #scan} reads it again row by
 * row, so the matrix is never held whole.
 */
public final class CsvScoreMatrix implements ScoreMatrix {
    private final Path file;
    private final int rows;
    private final int columns;
    private final List<String> columnIds;

    private CsvScoreMatrix(Path file, int rows, int columns, List<String> columnIds) {
        this.file = file;
        this.rows = rows;
        this.columns = columns;
        this.columnIds = columnIds;
    }

    public static CsvScoreMatrix open(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new UserInputException(file, null, "score matrix not found (or not a regular file)",
                    "check the path and the working directory");
        }
        int[] shape = {0, -1};
        List<String>[] header = new List[1];
        read(file, (line, fields, first) -> {
            if (first && !allNumbers(fields)) {
                Set<String> seen = new HashSet<>();
                for (String f : fields) {
                    String id = f.trim();
                    if (id.isEmpty() || !seen.add(id)) {
                        throw new UserInputException(file, "line " + line, "the header of candidate ids has "
                                + (id.isEmpty() ? "an empty id" : "the id '" + id + "' twice"),
                                "give every candidate a distinct, non-empty id");
                    }
                }
                header[0] = fields.stream().map(String::trim).toList();
                shape[1] = fields.size();
                return null;
            }
            if (shape[1] < 0) shape[1] = fields.size();
            if (fields.size() != shape[1]) {
                throw new UserInputException(file, "line " + line, "has " + fields.size() + " scores, but the "
                        + (header[0] != null ? "header names " : "first row has ") + shape[1],
                        "give every query a score for every candidate");
            }
            for (int c = 0; c < fields.size(); c++) parse(file, line, c, fields.get(c));
            shape[0]++;
            return null;
        });
        if (shape[0] == 0) {
            throw new UserInputException(file, null, "the score matrix has no rows of scores",
                    "write one line per query with one score per candidate");
        }
        return new CsvScoreMatrix(file, shape[0], shape[1], header[0]);
    }

    @Override public Path file() { return file; }
    @Override public int rows() { return rows; }
    @Override public int columns() { return columns; }
    @Override public List<String> columnIds() { return columnIds; }

    @Override
    public void scan(RowVisitor visitor) {
        double[] row = new double[columns];
        int[] index = {0};
        boolean hasHeader = columnIds != null;
        read(file, (line, fields, first) -> {
            if (first && hasHeader) return null;
            for (int c = 0; c < columns; c++) row[c] = parse(file, line, c, fields.get(c));
            visitor.row(index[0]++, row);
            return null;
        });
    }

    private interface LineVisitor {
        Void line(int line, List<String> fields, boolean first);
    }

    private static void read(Path file, LineVisitor visitor) {
        CsvSchema schema = CsvSchema.emptySchema().withColumnSeparator(',');
        try (Reader reader = new java.io.BufferedReader(TextFiles.openUtf8(file, "score matrix"))) {
            MappingIterator<String[]> it = new CsvMapper().readerFor(String[].class).with(schema)
                    .with(CsvParser.Feature.WRAP_AS_ARRAY).with(CsvParser.Feature.SKIP_EMPTY_LINES)
                    .readValues(reader);
            boolean first = true;
            while (it.hasNextValue()) {
                String[] fields = it.nextValue();
                int line = it.getParser().currentLocation().getLineNr() - 1;
                if (fields.length == 1 && fields[0].isBlank()) continue;
                visitor.line(Math.max(line, 1), List.of(fields), first);
                first = false;
            }
        } catch (CharacterCodingException e) {
            throw new UserInputException(file, null, "the score matrix is not valid UTF-8 text",
                    "save it as UTF-8 CSV");
        } catch (UserInputException e) {
            throw e;
        } catch (IOException | RuntimeException e) {   // Jackson reports bad quoting as a runtime exception
            throw new UserInputException(file, null, "cannot read the CSV score matrix: " + e.getMessage(),
                    "check that it is comma-separated text", e);
        }
    }

    private static boolean allNumbers(List<String> fields) {
        for (String f : fields) if (number(f) == null) return false;
        return true;
    }

    /** The value of a score field, or null when it is not a number. */
    private static Double number(String field) {
        String t = field.trim();
        switch (t.toLowerCase(java.util.Locale.ROOT)) {
            case "inf", "+inf", "infinity", "+infinity": return Double.POSITIVE_INFINITY;
            case "-inf", "-infinity": return Double.NEGATIVE_INFINITY;
            case "nan": return Double.NaN;
            default: break;
        }
        if (t.isEmpty() || !t.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?")) return null;
        return Double.parseDouble(t);
    }

    private static double parse(Path file, int line, int column, String field) {
        Double v = number(field);
        if (v == null || v.isNaN()) {
            throw new UserInputException(file, "line " + line + ", field " + (column + 1),
                    (v == null ? "'" + field + "' is not a number" : "the score is NaN"),
                    "write a decimal score; fill unscored candidates with one sentinel value below every real score");
        }
        return v;
    }
}
