package org.assay.claims;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.assay.common.UserInputException;

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
            if (Files.size(file) > InputLimits.MAX_FILE_BYTES) {
                throw new UserInputException(file, null,
                        "the file is larger than " + InputLimits.MAX_FILE_BYTES / (1024 * 1024) + " MB",
                        "split the claims into smaller files");
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new UserInputException(file, null, "the file does not exist", "check the path", e);
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the file: " + e.getMessage(),
                    "check that it is a readable file", e);
        }
        String text = decodeUtf8(file, bytes);
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    /** Strict UTF-8; a bad byte is reported by its line and byte offset, so the user can find it. */
    static String decodeUtf8(Path file, byte[] bytes) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult result = decoder.decode(in, out, true);
        if (!result.isError()) result = decoder.flush(out);
        if (result.isError()) {
            int offset = in.position();
            int line = 1;
            for (int i = 0; i < offset; i++) if (bytes[i] == '\n') line++;
            throw new UserInputException(file, "line " + line + " (byte offset " + offset + ")",
                    String.format("the file is not UTF-8 text (byte 0x%02X here)", bytes[offset] & 0xFF),
                    "save it with UTF-8 encoding");
        }
        return out.flip().toString();
    }
}
