package org.assay.data;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.dataformat.csv.CsvFactory;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import org.assay.common.Limit;
import org.assay.common.UserInputException;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Comma- or tab-separated rows read with jackson-dataformat-csv. Quoting follows RFC 4180
 * (common practice): a field in double quotes may hold the separator, a newline, or a doubled
 * quote; the same quoting is accepted in tab-separated files. Blank lines are skipped (they hold
 * no row) here rather than by Jackson's {@code SKIP_EMPTY_LINES}, which also strips the leading
 * spaces of every record's first field (jackson-dataformat-csv 2.23), so an id written " d" would
 * silently become "d"; fields are kept exactly as written.
 *
 * <p>A header of one field that holds another common separator (a semicolon, say) is an error
 * naming that separator: otherwise it surfaces as a missing column with a misleading fix.
 *
 * <p>The header is read as the first record rather than through {@code CsvSchema.withHeader()}:
 * the header schema maps each row to named fields and so cannot report a row with too few fields
 * or a header that repeats a name, and both must be errors here.
 */
final class DelimitedRowSource implements RowSource {
    private final Path file;
    private final Reader reader;
    private final MappingIterator<String[]> rows;
    private final CsvParser parser;
    private final List<String> columns;
    private final int headerLine;
    private final char separator;
    private String[] current;
    private int line;
    private long dataRows;

    DelimitedRowSource(Path file, Reader reader, char separator) {
        this.file = file;
        this.reader = reader;
        this.separator = separator;
        CsvSchema schema = CsvSchema.emptySchema().withColumnSeparator(separator);
        try {
            CsvFactory factory = CsvFactory.builder()
                    .streamReadConstraints(StreamReadConstraints.builder()
                            .maxStringLength(Limit.LINE_CHARS.intValue()).build())
                    .build();
            this.rows = new CsvMapper(factory).readerFor(String[].class)
                    .with(schema)
                    .with(CsvParser.Feature.WRAP_AS_ARRAY)
                    .readValues(reader);
        } catch (IOException e) {
            throw RowErrors.unreadable(file, e);
        }
        this.parser = (CsvParser) rows.getParser();
        if (!advance()) throw RowErrors.empty(file, "file");
        this.headerLine = line;
        this.columns = List.of(current);
        checkHeader();
    }

    private void checkHeader() {
        if (Limit.COLUMNS.exceededBy(columns.size())) {
            throw Limit.COLUMNS.exceeded(file, RowErrors.line(headerLine), "the header has " + columns.size() + " columns");
        }
        if (columns.size() == 1) {
            Character other = otherSeparator(columns.get(0));
            if (other != null) {
                throw new UserInputException(file, RowErrors.line(headerLine),
                        "the header is one column '" + columns.get(0) + "': the file looks separated by "
                                + separatorName(other) + ", not by " + separatorName(separator),
                        separator == ',' && other == '\t'
                                ? "name a tab-separated file .tsv, or save it comma-separated"
                                : separator == '\t' && other == ','
                                ? "name a comma-separated file .csv, or save it tab-separated"
                                : "save it " + (separator == ',' ? "comma" : "tab") + "-separated"
                                        + " (spreadsheet programs in some locales use ';' unless told otherwise)");
            }
        }
        Map<String, Integer> seen = new HashMap<>();
        for (int i = 0; i < columns.size(); i++) {
            Integer before = seen.putIfAbsent(columns.get(i), i);
            if (before != null) {
                throw new UserInputException(file, RowErrors.line(headerLine),
                        "the header names column '" + columns.get(i) + "' twice (fields "
                                + (before + 1) + " and " + (i + 1) + ")",
                        "give every column a distinct name");
            }
        }
    }

    /**
     * The separator a one-column header seems to use instead of ours, or null. Column names do not
     * hold separators, so a lone header field holding another common one is almost certainly a
     * file written with that separator (a semicolon is the spreadsheet default where the decimal
     * mark is a comma).
     */
    private Character otherSeparator(String header) {
        for (char c : new char[] {';', '\t', ',', '|'}) {
            if (c != separator && header.indexOf(c) >= 0) return c;
        }
        return null;
    }

    private static String separatorName(char c) {
        switch (c) {
            case ',': return "commas";
            case '\t': return "tabs";
            case ';': return "semicolons";
            default: return "'" + c + "'";
        }
    }

    @Override public Path file() { return file; }
    @Override public List<String> columns() { return columns; }
    @Override public int line() { return line; }
    @Override public int headerLine() { return headerLine; }

    @Override
    public boolean next() {
        if (!advance()) return false;
        if (Limit.ROWS.exceededBy(++dataRows)) {
            throw Limit.ROWS.exceeded(file, RowErrors.line(line), "the file has more than " + Limit.ROWS.value() + " rows");
        }
        if (current.length != columns.size()) {
            String name = separator == '\t' ? "tab" : "comma";
            throw new UserInputException(file, RowErrors.line(line),
                    "this row has " + current.length + " fields but the header has " + columns.size(),
                    "quote fields that contain a " + name + " or a line break in double quotes"
                            + " (RFC 4180), or add the missing fields");
        }
        return true;
    }

    private boolean advance() {
        int start = line + 1;
        try {
            do {
                if (!rows.hasNextValue()) return false;
                // After hasNextValue the parser stands at the start of the record: its line is the
                // record's first line even when a quoted field spans several lines.
                start = parser.currentLocation().getLineNr();
                current = rows.nextValue();
            } while (isBlankLine(current));
            line = start;
            return true;
        } catch (JsonProcessingException e) {
            throw syntaxError(start, e);
        } catch (IOException e) {
            throw RowErrors.unreadable(file, e);
        }
    }

    /** A record of one empty or all-blank field: a blank line, which holds no row. */
    private static boolean isBlankLine(String[] record) {
        return record.length == 0 || record.length == 1 && record[0].isBlank();
    }

    /** A malformed record, reported at the line it starts on (Jackson notices at its end). */
    private UserInputException syntaxError(int start, JsonProcessingException e) {
        UserInputException fromReader = RowErrors.userErrorCause(e);
        if (fromReader != null) return fromReader;   // bad UTF-8, wrapped by Jackson
        long noticed = e.getLocation() == null ? -1 : e.getLocation().getLineNr();
        return new UserInputException(file, RowErrors.line(start),
                "cannot parse the row: " + e.getOriginalMessage()
                        + (noticed > start ? " (noticed on line " + noticed + ")" : ""),
                "check the quoting: a quoted field must end with a closing double quote,"
                        + " and a quote inside it must be doubled (RFC 4180)", e);
    }

    @Override
    public String value(int column) {
        return current[column];
    }

    @Override
    public void close() {
        try {
            rows.close();
            reader.close();
        } catch (IOException e) {
            throw RowErrors.unreadable(file, e);
        }
    }
}
