package org.assay.data;

import org.assay.common.Limit;
import org.assay.common.Progress;
import org.assay.common.UserInputException;

import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Decodes a file as UTF-8, failing on the first malformed byte sequence with the line it is on,
 * and drops one leading byte-order mark (U+FEFF), as spreadsheet programs write one.
 *
 * <p>Written by hand around {@link CharsetDecoder} (with {@link CodingErrorAction#REPORT}) rather
 * than using {@link java.io.InputStreamReader}: the latter decodes in chunks and, on a bad byte,
 * discards the characters already decoded in that chunk, so the line of the error is lost.
 * Here every delivered character is counted, so the line number is exact.
 */
final class StrictUtf8Reader extends Reader {
    private static final int BUFFER = 8192;

    private final Path file;
    private final InputStream in;
    private final Progress.Task progress;
    private final CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
            .onMalformedInput(CodingErrorAction.REPORT)
            .onUnmappableCharacter(CodingErrorAction.REPORT);
    private final ByteBuffer bytes = ByteBuffer.allocate(BUFFER);
    private final CharBuffer chars = CharBuffer.allocate(BUFFER);
    private boolean endOfInput;
    private boolean flushed;
    private boolean atStart = true;
    /** Newlines delivered to the caller or sitting decoded in {@link #chars}. */
    private long newlines;
    /** Characters decoded since the last newline: a line beyond {@link Limit#LINE_CHARS} stops the read. */
    private long lineChars;
    private final long maxLineChars = Limit.LINE_CHARS.value();

    private StrictUtf8Reader(Path file, InputStream in, Progress.Task progress) {
        this.file = file;
        this.in = in;
        this.progress = progress;
        bytes.flip();   // empty, ready for reading
        chars.flip();
    }

    /** Opens {@code file}; a missing or unreadable file is a {@link UserInputException}. */
    static StrictUtf8Reader open(Path file, String what) {
        return open(file, what, Progress.Task.NONE);
    }

    /** As {@link #open(Path, String)}, reporting the bytes read to {@code progress}. */
    static StrictUtf8Reader open(Path file, String what, Progress.Task progress) {
        if (!Files.exists(file)) {
            throw new UserInputException(file, null, what + " not found",
                    "check the path and the working directory");
        }
        if (Files.isDirectory(file)) {
            throw new UserInputException(file, null, what + " is a directory, not a file",
                    "give the path of the file itself");
        }
        try {
            long size = Files.size(file);
            if (Limit.FILE_BYTES.exceededBy(size)) {
                throw Limit.FILE_BYTES.exceeded(file, null, what + " has " + size + " bytes");
            }
            return new StrictUtf8Reader(file, Files.newInputStream(file), progress);
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read " + what + ": " + e.getMessage(),
                    "check that the file exists and is readable", e);
        }
    }

    @Override
    public int read(char[] target, int offset, int length) throws IOException {
        if (length == 0) return 0;
        if (!chars.hasRemaining() && !fill()) return -1;
        int n = Math.min(length, chars.remaining());
        chars.get(target, offset, n);
        return n;
    }

    /** Decodes more characters into {@link #chars}; false at the end of the file. */
    private boolean fill() throws IOException {
        chars.clear();
        while (chars.position() == 0 && !flushed) {
            if (!endOfInput && !bytes.hasRemaining()) readBytes();
            CoderResult result = decoder.decode(bytes, chars, endOfInput);
            if (result.isError()) {
                countNewlines(chars, 0, chars.position());
                throw malformed();
            }
            if (result.isUnderflow()) {
                if (endOfInput) {
                    decoder.flush(chars);
                    flushed = true;
                } else if (chars.position() == 0) {
                    readBytes();   // an incomplete sequence at the end of the buffer needs more bytes
                }
            }
        }
        chars.flip();
        if (atStart && chars.hasRemaining()) {
            atStart = false;
            if (chars.get(chars.position()) == '\uFEFF') chars.get();
        }
        countNewlines(chars, chars.position(), chars.limit());
        if (!chars.hasRemaining() && !flushed) return fill();   // the buffer held only the mark
        return chars.hasRemaining();
    }

    private void readBytes() throws IOException {
        bytes.compact();
        int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
        if (n < 0) {
            endOfInput = true;
        } else {
            bytes.position(bytes.position() + n);
            progress.advance(n);
        }
        bytes.flip();
    }

    private void countNewlines(CharBuffer buffer, int from, int to) {
        for (int i = from; i < to; i++) {
            if (buffer.get(i) == '\n') {
                newlines++;
                lineChars = 0;
            } else if (++lineChars > maxLineChars) {
                throw Limit.LINE_CHARS.exceeded(file, "line " + (newlines + 1),
                        "the line is longer than " + maxLineChars + " characters");
            }
        }
    }

    private UserInputException malformed() {
        return new UserInputException(file, "line " + (newlines + 1),
                "bytes that are not valid UTF-8",
                "save the file as UTF-8 (most editors and spreadsheet programs offer this under 'Save as')");
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
