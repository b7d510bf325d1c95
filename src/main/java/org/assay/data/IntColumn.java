package org.assay.data;

import java.util.Arrays;

/**
 * A growable int column kept in fixed-size pages. Growing never copies what is stored, so a
 * column of n values costs 4n bytes plus at most one partly filled page, where a doubling array
 * needs up to three times that while it grows. Commons Math offers a resizable array for doubles
 * only, and a boxed list would cost an object per row.
 */
final class IntColumn {
    /** 2^15 ints = 128 KiB per page: well under half a G1 region, so pages are ordinary allocations. */
    private static final int PAGE_BITS = 15;
    private static final int PAGE = 1 << PAGE_BITS;
    private static final int MASK = PAGE - 1;

    private int[][] pages = new int[1][];
    private int size;

    void add(int value) {
        int page = size >>> PAGE_BITS;
        if (page == pages.length) pages = Arrays.copyOf(pages, pages.length * 2);
        if (pages[page] == null) pages[page] = new int[size == 0 ? 64 : PAGE];
        else if ((size & MASK) == pages[page].length) {
            pages[page] = Arrays.copyOf(pages[page], Math.min(PAGE, pages[page].length * 2));   // the first page starts small
        }
        pages[page][size & MASK] = value;
        size++;
    }

    int get(int index) {
        if (index < 0 || index >= size) throw new IndexOutOfBoundsException(index);
        return pages[index >>> PAGE_BITS][index & MASK];
    }

    void set(int index, int value) {
        if (index < 0 || index >= size) throw new IndexOutOfBoundsException(index);
        pages[index >>> PAGE_BITS][index & MASK] = value;
    }

    int size() {
        return size;
    }

    int[] toArray() {
        int[] out = new int[size];
        for (int from = 0; from < size; from += PAGE) {
            System.arraycopy(pages[from >>> PAGE_BITS], 0, out, from, Math.min(PAGE, size - from));
        }
        return out;
    }
}
