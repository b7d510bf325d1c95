package org.assay.data.retrieval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.ByteOrder;
import java.util.ArrayList;
import java.util.List;
import org.assay.common.UserInputException;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The .npy reader against files written by NumPy itself (numpy.save and
 * numpy.lib.format.write_array, in src/test/reference/retrieval_reference.py); the format is
 * NumPy's "A Simple File Format for NumPy Arrays" (numpy.lib.format).
 */
class NpyScoreMatrixTest {
    private static final JsonNode VALUES = RetrievalFixtures.REFERENCE.get("formats").get("values");

    private static List<double[]> rows(ScoreMatrix m) {
        List<double[]> out = new ArrayList<>();
        m.scan((r, s) -> {
            assertThat(r).isEqualTo(out.size());
            out.add(s.clone());
        });
        return out;
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "small_f4_le.npy, 32, LITTLE_ENDIAN",
            "small_f8_le.npy, 64, LITTLE_ENDIAN",
            "small_f4_be.npy, 32, BIG_ENDIAN",
            "small_f8_be.npy, 64, BIG_ENDIAN",
            "small_v2.npy, 64, LITTLE_ENDIAN",     // format version 2.0: 4-byte header length
            "small_v3.npy, 32, LITTLE_ENDIAN"})    // format version 3.0: UTF-8 header
    void readsTheValuesNumpyWrote(String file, int bits, String order) {
        NpyScoreMatrix m = NpyScoreMatrix.open(RetrievalFixtures.fixture(file));
        assertThat(m.rows()).isEqualTo(2);
        assertThat(m.columns()).isEqualTo(3);
        assertThat(m.bitsPerValue()).isEqualTo(bits);
        assertThat(m.byteOrder().toString()).isEqualTo(order);
        List<double[]> rows = rows(m);
        assertThat(rows).hasSize(2);
        for (int r = 0; r < 2; r++) {
            for (int c = 0; c < 3; c++) {
                // the values (0.5, -1.25, 3, 2, 0.125, -100) are exact in float32 and float64
                assertThat(rows.get(r)[c]).isEqualTo(VALUES.get(r).get(c).asDouble());
            }
        }
        assertThat(m.byteOrder()).isIn(ByteOrder.LITTLE_ENDIAN, ByteOrder.BIG_ENDIAN);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "bad_int64.npy | dtype '<i8'",
            "bad_float16.npy | dtype '<f2'",
            "bad_fortran.npy | Fortran (column-major) order",
            "bad_1d.npy | shape (6,)",
            "bad_3d.npy | shape (1, 2, 3)",
            "bad_truncated.npy | is truncated",
            "bad_trailing.npy | 8 bytes after the 2 x 3 matrix"})
    void rejectsWhatIsNotAFloatMatrixInCOrder(String file, String problem) {
        assertThatThrownBy(() -> NpyScoreMatrix.open(RetrievalFixtures.fixture(file)))
                .isInstanceOf(UserInputException.class)
                .hasMessageContaining(file)
                .hasMessageContaining(problem);
    }

    @Test
    void truncatedFileSaysHowManyBytesAreMissing() {
        // numpy.save of a 2 x 3 float64 array: 48 bytes of data; the script cut 12
        assertThatThrownBy(() -> NpyScoreMatrix.open(RetrievalFixtures.fixture("bad_truncated.npy")))
                .hasMessageContaining("needs 48 bytes of data, the file has 36")
                .hasMessageContaining("about 1 complete rows");
    }

    @Test
    void nanScoreNamesItsCell() {
        NpyScoreMatrix m = NpyScoreMatrix.open(RetrievalFixtures.fixture("bad_nan.npy"));
        assertThatThrownBy(() -> rows(m)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("row 1, column 1").hasMessageContaining("NaN");
    }

    @ParameterizedTest
    @ValueSource(strings = {"small_plain.csv", "untied_top8.jsonl"})
    void aFileWithoutTheMagicStringIsNotNpy(String file) {
        assertThatThrownBy(() -> NpyScoreMatrix.open(RetrievalFixtures.fixture(file)))
                .isInstanceOf(UserInputException.class).hasMessageContaining("\\x93NUMPY");
    }

    @Test
    void unknownFormatVersionIsNamed(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
        byte[] bytes = java.nio.file.Files.readAllBytes(RetrievalFixtures.fixture("small_f8_le.npy"));
        bytes[6] = 4;   // a major version NumPy has not defined
        java.nio.file.Path f = dir.resolve("v4.npy");
        java.nio.file.Files.write(f, bytes);
        assertThatThrownBy(() -> NpyScoreMatrix.open(f)).hasMessageContaining("version 4.0");
    }

    @Test
    void aShapeWhoseByteCountWrapsAroundIsRejectedWhenOpened(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        // Found reading the header code for NpyScoreMatrixFuzzTest (its input is committed there):
        // 1073807362 x 2147352580 = 2^61 + 8 values, times 8 bytes is 64 modulo 2^64, so a header with
        // 64 bytes of data after it looked complete and scan ran out of memory.
        String dict = "{'descr': '<f8', 'fortran_order': False, 'shape': (1073807362, 2147352580), }";
        String header = dict + " ".repeat((64 - (10 + dict.length() + 1) % 64) % 64) + "\n";
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        bytes.write(new byte[] {(byte) 0x93, 'N', 'U', 'M', 'P', 'Y', 1, 0, (byte) header.length(), 0});
        bytes.write(header.getBytes(java.nio.charset.StandardCharsets.ISO_8859_1));
        bytes.write(new byte[64]);
        java.nio.file.Path f = dir.resolve("wraps.npy");
        java.nio.file.Files.write(f, bytes.toByteArray());

        assertThatThrownBy(() -> NpyScoreMatrix.open(f)).isInstanceOf(UserInputException.class)
                .hasMessageContaining("wraps.npy, header").hasMessageContaining("more values than a file can hold");
    }

    @Test
    void largerMatricesAreReadRowByRowAcrossBufferBoundaries() {
        // groups_sentinel.npy: 14 x 70 float32; the reference ranks depend on every value
        NpyScoreMatrix m = NpyScoreMatrix.open(RetrievalFixtures.fixture("groups_sentinel.npy"));
        assertThat(m.rows()).isEqualTo(14);
        assertThat(m.columns()).isEqualTo(70);
        assertThat(rows(m)).hasSize(14).allSatisfy(r -> assertThat(r).contains(-100.0));
    }
}
