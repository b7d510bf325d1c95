package org.assay.data;

import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * The paged columns behind the readers give back exactly what was stored, across page
 * boundaries (pages hold 2^15 values; id text pages 256 KiB), compared with plain arrays.
 */
class CompactColumnsTest {

    @Test
    void intAndDoubleColumnsKeepEveryValueAcrossPages() {
        Random random = new Random(3);
        int n = 3 * (1 << 15) + 17;
        int[] ints = new int[n];
        double[] doubles = new double[n];
        IntColumn intColumn = new IntColumn();
        DoubleColumn doubleColumn = new DoubleColumn();
        for (int i = 0; i < n; i++) {
            ints[i] = random.nextInt();
            doubles[i] = random.nextGaussian();
            intColumn.add(ints[i]);
            doubleColumn.add(doubles[i]);
        }
        assertThat(intColumn.toArray()).isEqualTo(ints);
        assertThat(doubleColumn.toArray()).isEqualTo(doubles);
        assertThat(intColumn.get(1 << 15)).isEqualTo(ints[1 << 15]);
        assertThat(doubleColumn.get(n - 1)).isEqualTo(doubles[n - 1]);
        intColumn.set(40_000, 7);
        assertThat(intColumn.get(40_000)).isEqualTo(7);
        assertThatThrownBy(() -> intColumn.get(n)).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> doubleColumn.get(-1)).isInstanceOf(IndexOutOfBoundsException.class);
    }

    @Test
    void probabilityTableReordersColumnsInPlace() {
        double[] rowMajor = {0.1, 0.2, 0.7, 0.5, 0.3, 0.2};
        ProbabilityTable table = ProbabilityTable.of(rowMajor, 3);
        table.reorder(new int[] {2, 0, 1});   // class 0 is file column 2, ...
        assertThat(table.toArray()).containsExactly(0.7, 0.1, 0.2, 0.2, 0.5, 0.3);
        assertThat(table.rows()).isEqualTo(2);
        assertThat(table.get(1, 0)).isEqualTo(0.2);
        assertThatThrownBy(() -> table.get(0, 3)).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> ProbabilityTable.of(new double[5], 3)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void lineNumbersStoredAsRunsGiveEveryRowsLine() {
        Random random = new Random(5);
        int[] lines = new int[100_000];
        LineNumbers numbers = new LineNumbers();
        int line = 1;
        for (int i = 0; i < lines.length; i++) {
            line += random.nextInt(50) == 0 ? 2 + random.nextInt(3) : 1;   // now and then a blank line
            lines[i] = line;
            numbers.add(line);
        }
        for (int i = 0; i < lines.length; i++) assertThat(numbers.line(i)).isEqualTo(lines[i]);
        assertThat(numbers.size()).isEqualTo(lines.length);
    }

    @Test
    void idTextGivesBackEveryStringExactlyEvenUnpairedSurrogates() {
        String longId = "x".repeat(300_000) + "\u00e9";   // longer than a page
        List<String> ids = List.of("clip-000001", "caf\u00e9", "\u4e2d\u6587", "bird \ud83d\udc26", "\ud800", "\ud801",
                "\udc00x", "", longId, "after the long one");
        IdText text = new IdText();
        for (String id : ids) text.add(id);
        assertThat(text.view()).containsExactlyElementsOf(ids);
        // String.getBytes(UTF_8) writes both lone surrogates as '?': this encoding keeps them apart
        assertThat(text.equalsAt(4, "\ud800")).isTrue();
        assertThat(text.equalsAt(4, "\ud801")).isFalse();
        assertThat(text.equalsAt(8, longId)).isTrue();
        assertThat(text.equalsAt(0, "clip-000002")).isFalse();
        assertThat(text.equalsAt(0, "clip-00000")).isFalse();
    }

    @Test
    void manyIdsFillSeveralPages() {
        IdText text = new IdText();
        int n = 50_000;   // about 20 bytes each: four pages
        for (int i = 0; i < n; i++) text.add("example/" + i + "/\u00fc");
        for (int i = 0; i < n; i += 997) assertThat(text.get(i)).isEqualTo("example/" + i + "/\u00fc");
        assertThat(text.get(n - 1)).isEqualTo("example/" + (n - 1) + "/\u00fc");
    }
}
