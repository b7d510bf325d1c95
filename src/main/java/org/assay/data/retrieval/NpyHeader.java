package org.assay.data.retrieval;

import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.assay.common.UserInputException;

/**
 * The header of a NumPy .npy file holding a 2-D float32 or float64 matrix in C order.
 *
 * <p>Format as specified in NumPy's {@code numpy.lib.format} documentation ("A Simple File
 * Format for NumPy Arrays"): the magic string {@code \x93NUMPY}, a major and minor version byte,
 * the header length (unsigned little-endian: 2 bytes in version 1.0, 4 bytes in 2.0 and 3.0),
 * then an ASCII (3.0: UTF-8) Python dict literal with keys {@code descr}, {@code fortran_order}
 * and {@code shape}, padded with spaces and ended by a newline so the data starts aligned.
 *
 * @param itemSize   4 (float32) or 8 (float64)
 * @param order      byte order of the values
 * @param rows       first dimension
 * @param columns    second dimension
 * @param dataOffset byte offset of the first value
 */
record NpyHeader(int itemSize, ByteOrder order, int rows, int columns, long dataOffset) {

    static final byte[] MAGIC = {(byte) 0x93, 'N', 'U', 'M', 'P', 'Y'};
    /** A header longer than this is not a score matrix (NumPy itself caps headers near 10 kB). */
    private static final int MAX_HEADER = 1 << 16;

    private static final Pattern DESCR = Pattern.compile("'descr'\\s*:\\s*'([^']*)'");
    private static final Pattern FORTRAN = Pattern.compile("'fortran_order'\\s*:\\s*(True|False)");
    private static final Pattern SHAPE = Pattern.compile("'shape'\\s*:\\s*\\(([^)]*)\\)");

    long bodyBytes() { return (long) rows * columns * itemSize; }

    /** Parses the header from the first bytes of the file ({@code prefix} holds at least 10). */
    static int headerLengthField(Path file, byte[] prefix, int read) {
        if (read < 10 || !startsWithMagic(prefix)) {
            throw error(file, "byte 0", "is not a NumPy .npy file (no \\x93NUMPY magic string)",
                    "save the matrix with numpy.save, or give a CSV matrix");
        }
        int major = prefix[6] & 0xff;
        if (major == 1) return 2;
        if (major == 2 || major == 3) return 4;
        throw error(file, "byte 6", "has .npy format version " + major + "." + (prefix[7] & 0xff)
                + ", but only versions 1.0, 2.0 and 3.0 are known", "re-save it with numpy.save");
    }

    private static boolean startsWithMagic(byte[] prefix) {
        for (int i = 0; i < MAGIC.length; i++) if (prefix[i] != MAGIC[i]) return false;
        return true;
    }

    static int checkedHeaderLength(Path file, long length) {
        if (length <= 0 || length > MAX_HEADER) {
            throw error(file, "byte 8", "declares a header of " + length + " bytes",
                    "the file is damaged or not a score matrix; re-save it with numpy.save");
        }
        return (int) length;
    }

    static NpyHeader parse(Path file, int major, byte[] headerBytes, long dataOffset) {
        String header = new String(headerBytes, major == 3 ? StandardCharsets.UTF_8 : StandardCharsets.ISO_8859_1).trim();
        if (!header.startsWith("{") || !header.endsWith("}")) {
            throw error(file, "header", "has a header that is not a Python dict: " + abbreviate(header),
                    "re-save it with numpy.save");
        }
        String descr = group(file, DESCR, header, "descr");
        String fortran = group(file, FORTRAN, header, "fortran_order");
        String shape = group(file, SHAPE, header, "shape");

        ByteOrder order;
        int itemSize;
        switch (descr) {
            case "<f4" -> { order = ByteOrder.LITTLE_ENDIAN; itemSize = 4; }
            case "<f8" -> { order = ByteOrder.LITTLE_ENDIAN; itemSize = 8; }
            case ">f4" -> { order = ByteOrder.BIG_ENDIAN; itemSize = 4; }
            case ">f8" -> { order = ByteOrder.BIG_ENDIAN; itemSize = 8; }
            default -> throw error(file, "header", "holds dtype '" + descr + "', but scores must be float32 or float64",
                    "convert with scores.astype(numpy.float32) before numpy.save");
        }
        if (fortran.equals("True")) {
            throw error(file, "header", "is stored in Fortran (column-major) order",
                    "save numpy.ascontiguousarray(scores) instead");
        }
        String[] dims = shape.split(",");
        int n = 0;
        long[] size = new long[3];
        for (String d : dims) {
            if (d.isBlank()) continue;
            if (n == 3) break;
            try {
                size[n++] = Long.parseLong(d.trim());
            } catch (NumberFormatException e) {
                throw error(file, "header", "has an unreadable shape (" + shape + ")", "re-save it with numpy.save");
            }
        }
        if (n != 2) {
            throw error(file, "header", "holds an array of shape (" + shape.trim() + "), but a score matrix has two"
                    + " dimensions (queries, candidates)", "reshape it to (queries, candidates) before saving");
        }
        if (size[0] < 1 || size[1] < 1 || size[0] > Integer.MAX_VALUE || size[1] > Integer.MAX_VALUE - 8) {
            throw error(file, "header", "has shape (" + size[0] + ", " + size[1] + "): each dimension must be"
                    + " between 1 and " + (Integer.MAX_VALUE - 8), "check the array before saving");
        }
        // Both dimensions fit an int, so their product fits a long, but times 8 bytes it can wrap around:
        // (1073807362 x 2147352580) float64 would declare 64 bytes of data and pass the file-size check.
        if (size[0] * size[1] > Long.MAX_VALUE / itemSize) {
            throw error(file, "header", "has shape (" + size[0] + ", " + size[1] + "), more values than a file can hold",
                    "check the array before saving");
        }
        return new NpyHeader(itemSize, order, (int) size[0], (int) size[1], dataOffset);
    }

    private static String group(Path file, Pattern p, String header, String key) {
        Matcher m = p.matcher(header);
        if (!m.find()) {
            throw error(file, "header", "has no readable '" + key + "' entry in its header " + abbreviate(header),
                    "re-save it with numpy.save");
        }
        return m.group(1);
    }

    private static String abbreviate(String s) {
        return s.length() <= 120 ? s : s.substring(0, 117) + "...";
    }

    static UserInputException error(Path file, String position, String problem, String fix) {
        return new UserInputException(file, position, "the score matrix " + problem, fix);
    }
}
