package org.assay.data.retrieval;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Rows wider than the reader's 64 KiB chunk (the reference fixtures are 70 columns wide): the values
 * come back exactly as written in every stored type and byte order, and ranking the rows as queries
 * (one pass, {@code observeRow}) gives the same ranks, depths and sentinel as ranking the transposed
 * matrix's columns as queries (two passes, value by value), an independent path through
 * {@link MatrixRanking}. Scores come from 41 levels, so ties are everywhere, and two rows end in a
 * sentinel tail that holds relevant candidates.
 */
class MatrixRankingWideRowsTest {
    private static final int QUERIES = 7;
    private static final int CANDIDATES = 40_000;   // 160 KB of float32 per row: three chunks and a bit
    @TempDir Path dir;

    @ParameterizedTest
    @ValueSource(strings = {"<f4", ">f4", "<f8", ">f8"})
    void wideRowsReadBackExactly(String descr) throws IOException {
        double[][] scores = scores();
        Path file = write(dir.resolve("m.npy"), descr, scores);
        NpyScoreMatrix m = NpyScoreMatrix.open(file);
        List<double[]> read = new ArrayList<>();
        m.scan((r, row) -> read.add(row.clone()));
        assertThat(read).hasSize(QUERIES);
        for (int q = 0; q < QUERIES; q++) assertThat(read.get(q)).as("row %d", q).containsExactly(scores[q]);
    }

    @ParameterizedTest
    @ValueSource(strings = {"OPTIMISTIC", "PESSIMISTIC", "AVERAGE"})
    void rowsAsQueriesRankLikeTheTransposedColumns(String policy) throws IOException {
        double[][] scores = scores();
        double[][] transposed = new double[CANDIDATES][QUERIES];
        for (int q = 0; q < QUERIES; q++) for (int c = 0; c < CANDIDATES; c++) transposed[c][q] = scores[q][c];
        ScoreMatrix wide = NpyScoreMatrix.open(write(dir.resolve("wide.npy"), "<f4", scores));
        ScoreMatrix tall = NpyScoreMatrix.open(write(dir.resolve("tall.npy"), "<f4", transposed));
        Relevance relevance = relevance();
        TiePolicy ties = TiePolicy.valueOf(policy);

        RetrievalData byRows = MatrixRanking.rank(wide, MatrixRanking.Side.ROWS, null, null, relevance, ties,
                SentinelRule.detect(), "d");
        RetrievalData byColumns = MatrixRanking.rank(tall, MatrixRanking.Side.COLUMNS, null, null, relevance, ties,
                SentinelRule.detect(), "d");

        assertThat(byRows.sentinel()).isEqualTo(-100.0);
        assertThat(byRows.relevantRanks()[1]).contains(Double.POSITIVE_INFINITY);   // a relevant one in the tail
        assertThat(byRows).isEqualTo(byColumns);
    }

    /** Whole scores 0..40 (exact in float32), rows 1 and 4 ending in 5,000 and 7 copies of -100. */
    private static double[][] scores() {
        SplittableRandom rng = new SplittableRandom(11);
        double[][] s = new double[QUERIES][CANDIDATES];
        for (int q = 0; q < QUERIES; q++) for (int c = 0; c < CANDIDATES; c++) s[q][c] = rng.nextInt(41);
        for (int c = CANDIDATES - 5000; c < CANDIDATES; c++) s[1][c] = -100;
        for (int c = CANDIDATES - 7; c < CANDIDATES; c++) s[4][c] = -100;
        return s;
    }

    /** Three to six relevant candidates per query, some past the first chunk, one of row 1's in its tail. */
    private static Relevance relevance() {
        SplittableRandom rng = new SplittableRandom(5);
        int[][] rel = new int[QUERIES][];
        for (int q = 0; q < QUERIES; q++) {
            java.util.TreeSet<Integer> picked = new java.util.TreeSet<>();
            int k = 3 + rng.nextInt(4);
            while (picked.size() < k) picked.add(rng.nextInt(CANDIDATES - 5000));
            if (q == 1) picked.add(CANDIDATES - 1);
            rel[q] = picked.stream().mapToInt(Integer::intValue).toArray();
        }
        return new Relevance(QUERIES, CANDIDATES, rel);
    }

    /**
     * A C-order .npy file as numpy.save writes it (format version 1.0: magic, version, little-endian
     * header length, the header dict padded with spaces to a multiple of 64 bytes and ended by a newline;
     * NumPy's "format.py" specification of the NPY format).
     */
    static Path write(Path file, String descr, double[][] values) throws IOException {
        int rows = values.length;
        int cols = values[0].length;
        String dict = "{'descr': '" + descr + "', 'fortran_order': False, 'shape': (" + rows + ", " + cols + "), }";
        int unpadded = 10 + dict.length() + 1;
        String header = dict + " ".repeat((64 - unpadded % 64) % 64) + "\n";
        boolean f4 = descr.endsWith("f4");
        ByteBuffer out = ByteBuffer.allocate(10 + header.length() + rows * cols * (f4 ? 4 : 8));
        out.put((byte) 0x93).put("NUMPY".getBytes(StandardCharsets.US_ASCII)).put((byte) 1).put((byte) 0);
        out.order(ByteOrder.LITTLE_ENDIAN).putShort((short) header.length());
        out.put(header.getBytes(StandardCharsets.US_ASCII));
        out.order(descr.startsWith("<") ? ByteOrder.LITTLE_ENDIAN : ByteOrder.BIG_ENDIAN);
        for (double[] row : values) for (double v : row) { if (f4) out.putFloat((float) v); else out.putDouble(v); }
        Files.write(file, out.array());
        return file;
    }
}
