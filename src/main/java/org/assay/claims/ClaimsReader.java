package org.assay.claims;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.assay.common.Limit;
import org.assay.common.UserInputException;
import org.assay.common.Utf8Text;

/**
 * Reads a claims file in YAML ({@code .yaml}, {@code .yml}), JSON ({@code .json}) or CSV
 * ({@code .csv}) and validates it. Every problem is a {@link UserInputException} that names
 * the file, the line (JSON: the JSON pointer and line) and what to do.
 */
public final class ClaimsReader {
    private ClaimsReader() {}

    public static ClaimsFile read(Path file) {
        ClaimsFormat format = ClaimsFormat.of(file);
        String text = readText(file);
        TreeNode tree = switch (format) {
            case YAML -> YamlTreeReader.read(file, text);
            case JSON -> JsonTreeReader.read(file, text);
            case CSV -> CsvTreeReader.read(file, text);
        };
        return new ClaimsTreeMapper(file, format).map(tree);
    }

    /** The file as UTF-8 text without a byte-order mark; size-checked before reading. */
    static String readText(Path file) {
        byte[] bytes;
        try {
            long size = Files.size(file);
            if (Limit.CLAIMS_BYTES.exceededBy(size)) {
                throw Limit.CLAIMS_BYTES.exceeded(file, null, "the file has " + size + " bytes");
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new UserInputException(file, null, "the file does not exist", "check the path", e);
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the file: " + e.getMessage(),
                    "check that it is a readable file", e);
        }
        String text = Utf8Text.decode(file, bytes);
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }
}
