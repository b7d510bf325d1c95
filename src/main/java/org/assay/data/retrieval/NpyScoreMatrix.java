package org.assay.data.retrieval;

import java.io.BufferedInputStream;
import java.io.DataInputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.assay.common.Limit;
import org.assay.common.UserInputException;

/**
 * A score matrix in NumPy's .npy format, read row by row through a buffer.
 *
 * <p>Written here rather than taken from a library: the Java .npy readers on Maven Central are
 * either early releases that load the whole array at once or bring a Kotlin runtime, and the
 * part of the format a float matrix needs is a short header (see {@link NpyHeader}).
 */
public final class NpyScoreMatrix implements ScoreMatrix {
    private static final int BUFFER = 1 << 16;

    private final Path file;
    private final NpyHeader header;

    private NpyScoreMatrix(Path file, NpyHeader header) {
        this.file = file;
        this.header = header;
    }

    /** Reads and checks the header and the file's length; the values are read by {@link #scan}. */
    public static NpyScoreMatrix open(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new UserInputException(file, null, "score matrix not found (or not a regular file)",
                    "check the path and the working directory");
        }
        NpyHeader header;
        long size;
        try (InputStream raw = Files.newInputStream(file)) {
            DataInputStream in = new DataInputStream(new BufferedInputStream(raw));
            byte[] prefix = new byte[12];
            int read = in.readNBytes(prefix, 0, 10);
            int lengthBytes = NpyHeader.headerLengthField(file, prefix, read);
            if (lengthBytes == 4 && in.readNBytes(prefix, 10, 2) != 2) {
                throw NpyHeader.error(file, "byte 8", "ends inside its header", "the file is truncated; save it again");
            }
            long length = lengthBytes == 2
                    ? (prefix[8] & 0xffL) | (prefix[9] & 0xffL) << 8
                    : (prefix[8] & 0xffL) | (prefix[9] & 0xffL) << 8 | (prefix[10] & 0xffL) << 16 | (prefix[11] & 0xffL) << 24;
            int headerLength = NpyHeader.checkedHeaderLength(file, length);
            byte[] dict = in.readNBytes(headerLength);
            if (dict.length != headerLength) {
                throw NpyHeader.error(file, "header", "ends inside its header (" + dict.length + " of "
                        + headerLength + " bytes)", "the file is truncated; save it again");
            }
            header = NpyHeader.parse(file, prefix[6] & 0xff, dict, 8L + lengthBytes + headerLength);
            size = Files.size(file);
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the score matrix: " + e.getMessage(),
                    "check the file's permissions", e);
        }
        long expected = header.dataOffset() + header.bodyBytes();
        if (size < expected) {
            long body = size - header.dataOffset();
            throw NpyHeader.error(file, "byte " + size, "is truncated: shape (" + header.rows() + ", "
                    + header.columns() + ") of " + header.itemSize() * 8 + "-bit floats needs " + header.bodyBytes()
                    + " bytes of data, the file has " + body + " (about " + body / ((long) header.columns() * header.itemSize())
                    + " complete rows)", "write the file again; it was cut short");
        }
        if (size > expected) {
            throw NpyHeader.error(file, "byte " + expected, "has " + (size - expected) + " bytes after the "
                    + header.rows() + " x " + header.columns() + " matrix its header declares",
                    "give a file written by numpy.save holding one array");
        }
        checkLimits(file, header, size);
        return new NpyScoreMatrix(file, header);
    }

    private static void checkLimits(Path file, NpyHeader header, long size) {
        if (Limit.FILE_BYTES.exceededBy(size)) throw Limit.FILE_BYTES.exceeded(file, null, "the file has " + size + " bytes");
        if (Limit.ROWS.exceededBy(header.rows())) {
            throw Limit.ROWS.exceeded(file, "header", "the matrix has " + header.rows() + " rows");
        }
        if (Limit.COLUMNS.exceededBy(header.columns())) {
            throw Limit.COLUMNS.exceeded(file, "header", "the matrix has " + header.columns() + " columns");
        }
    }

    @Override public Path file() { return file; }
    @Override public int rows() { return header.rows(); }
    @Override public int columns() { return header.columns(); }
    @Override public List<String> columnIds() { return null; }

    /** float32 or float64, as stored. */
    public int bitsPerValue() { return header.itemSize() * 8; }

    public ByteOrder byteOrder() { return header.order(); }

    @Override
    public void scan(RowVisitor visitor) {
        int cols = header.columns();
        int item = header.itemSize();
        double[] row = new double[cols];
        // Rows are decoded through one reusable buffer of whole values, never the whole matrix; each
        // chunk is converted in bulk through a float or double view (a per-value getFloat was a third
        // of the time of ranking a large matrix).
        int valuesPerChunk = Math.min(Math.max(1, BUFFER / item), cols);
        ByteBuffer buf = ByteBuffer.allocate(valuesPerChunk * item).order(header.order());
        float[] floats = item == 4 ? new float[valuesPerChunk] : null;
        try (InputStream raw = Files.newInputStream(file)) {
            InputStream in = new BufferedInputStream(raw, BUFFER);
            in.skipNBytes(header.dataOffset());
            for (int r = 0; r < header.rows(); r++) {
                int c = 0;
                while (c < cols) {
                    int n = Math.min(cols - c, valuesPerChunk);
                    int want = n * item;
                    if (in.readNBytes(buf.array(), 0, want) != want) throw new EOFException();
                    buf.position(0).limit(want);
                    if (item == 4) {
                        buf.asFloatBuffer().get(floats, 0, n);
                        for (int i = 0; i < n; i++) row[c + i] = floats[i];
                    } else {
                        buf.asDoubleBuffer().get(row, c, n);
                    }
                    for (int i = c; i < c + n; i++) {
                        if (Double.isNaN(row[i])) {
                            throw new UserInputException(file, "row " + r + ", column " + i,
                                    "the score is NaN", "replace missing scores by a sentinel below every real score");
                        }
                    }
                    c += n;
                }
                visitor.row(r, row);
            }
        } catch (EOFException e) {
            throw NpyHeader.error(file, null, "ended early while reading (it changed since it was opened?)",
                    "write the file again");
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the score matrix: " + e.getMessage(),
                    "check the file", e);
        }
    }
}
