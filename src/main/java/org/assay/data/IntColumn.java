package org.assay.data;

import java.util.Arrays;

/**
 * A growable int array. Commons Math offers {@code ResizableDoubleArray} for doubles but nothing
 * for ints, and a boxed list would cost an object per row.
 */
final class IntColumn {
    private int[] values = new int[64];
    private int size;

    void add(int value) {
        if (size == values.length) values = Arrays.copyOf(values, size * 2);
        values[size++] = value;
    }

    int get(int index) {
        return values[index];
    }

    int size() {
        return size;
    }

    int[] toArray() {
        return Arrays.copyOf(values, size);
    }
}
