package org.assay.data;

import java.util.Arrays;

/**
 * A growable double column kept in fixed-size pages, the double counterpart of {@link IntColumn}:
 * growing never copies what is stored, so n values cost 8n bytes plus at most one partly filled
 * page, not the up to threefold peak of a doubling array. Indexed by long, so a row-major table
 * of rows x classes values may exceed 2^31 entries.
 */
public final class DoubleColumn {
    /** 2^15 doubles = 256 KiB per page: under half a G1 region, so pages are ordinary allocations. */
    private static final int PAGE_BITS = 15;
    private static final int PAGE = 1 << PAGE_BITS;
    private static final int MASK = PAGE - 1;

    private double[][] pages = new double[1][];
    private long size;

    public void add(double value) {
        int page = (int) (size >>> PAGE_BITS);
        if (page == pages.length) pages = Arrays.copyOf(pages, pages.length * 2);
        int at = (int) (size & MASK);
        if (pages[page] == null) pages[page] = new double[size == 0 ? 64 : PAGE];
        else if (at == pages[page].length) {
            pages[page] = Arrays.copyOf(pages[page], Math.min(PAGE, pages[page].length * 2));   // the first page starts small
        }
        pages[page][at] = value;
        size++;
    }

    public double get(long index) {
        if (index < 0 || index >= size) throw new IndexOutOfBoundsException(Long.toString(index));
        return pages[(int) (index >>> PAGE_BITS)][(int) (index & MASK)];
    }

    void set(long index, double value) {
        if (index < 0 || index >= size) throw new IndexOutOfBoundsException(Long.toString(index));
        pages[(int) (index >>> PAGE_BITS)][(int) (index & MASK)] = value;
    }

    public long size() {
        return size;
    }

    /** The values as one array; fails beyond 2^31 - 1 values, which no array can hold. */
    public double[] toArray() {
        if (size > Integer.MAX_VALUE - 8) throw new IllegalStateException(size + " values do not fit one array");
        double[] out = new double[(int) size];
        for (long from = 0; from < size; from += PAGE) {
            System.arraycopy(pages[(int) (from >>> PAGE_BITS)], 0, out, (int) from, (int) Math.min(PAGE, size - from));
        }
        return out;
    }
}
