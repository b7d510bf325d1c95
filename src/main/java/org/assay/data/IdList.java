package org.assay.data;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import org.assay.common.UserInputException;

/**
 * The ids of a full test set, in file order, to draw a subsample from: a text file with one id per
 * line (blank lines and {@code #} lines skipped), or a column of a CSV/TSV/JSONL file, optionally
 * with a second column whose values are the strata. Ids are checked like prediction ids (no
 * empty, repeated or case/space-variant ids).
 *
 * @param strata per id its stratum label, or null when not stratified
 */
public record IdList(Path file, List<String> ids, List<String> strata) {

    /** Reads a plain list (idColumn null) or a column of a table file. */
    public static IdList read(Path file, String idColumn, String stratumColumn) {
        if (idColumn == null) {
            if (stratumColumn != null) {
                throw UserInputException.usage("--stratify-by needs a table file with the stratum column",
                        "give a CSV with an id column and a label column, and --id-column");
            }
            return plain(file);
        }
        List<String> ids = new ArrayList<>();
        List<String> strata = stratumColumn == null ? null : new ArrayList<>();
        try (TableRows rows = TableRows.open(file, "id list")) {
            int id = rows.requireColumn(idColumn, "ids", "name the id column with --id-column");
            int s = stratumColumn == null ? -1 : rows.requireColumn(stratumColumn, "strata", "name the label column with --stratify-by");
            rows.requireFirstRow();
            do {
                ids.add(rows.uniqueId(id));
                if (s >= 0) {
                    String v = rows.text(s);
                    if (v.isBlank()) {
                        throw new UserInputException(file, "line " + rows.line(), "the stratum is empty",
                                "give every row a value in column " + stratumColumn);
                    }
                    strata.add(v);
                }
            } while (rows.next());
        }
        return new IdList(file, ids, strata);
    }

    private static IdList plain(Path file) {
        IdRegistry registry = new IdRegistry(file);
        List<String> ids = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(StrictUtf8Reader.open(file, "id list"))) {
            int line = 0;
            for (String text = r.readLine(); text != null; text = r.readLine()) {
                line++;
                if (text.isBlank() || text.startsWith("#")) continue;
                registry.add(text, line);
                ids.add(text);
            }
        } catch (IOException e) {
            throw RowErrors.unreadable(file, e);
        }
        if (ids.isEmpty()) throw new UserInputException(file, null, "the id list is empty", "write one id per line");
        return new IdList(file, ids, null);
    }

    public int size() { return ids.size(); }

    /** SHA-256 of the ids in file order joined by newlines (UTF-8), recorded in every manifest. */
    public String sha256() { return sha256(ids); }

    static String sha256(List<String> ids) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            for (int i = 0; i < ids.size(); i++) {
                if (i > 0) md.update((byte) '\n');
                md.update(ids.get(i).getBytes(StandardCharsets.UTF_8));
            }
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
