package org.assay.common;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * Strict UTF-8 decoding of a small file read whole (a claims file, a template). The first
 * malformed byte is reported by its line and byte offset, so the user can find it; the JDK's
 * {@code MalformedInputException} says only that something, somewhere, was wrong.
 */
public final class Utf8Text {
    private Utf8Text() {}

    /** The text of {@code bytes}, or a {@link UserInputException} naming {@code file}, the line and the offset. */
    public static String decode(Path file, byte[] bytes) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length);   // UTF-8 never gives more chars than bytes
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
