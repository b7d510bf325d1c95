package org.assay.data;

import java.util.AbstractList;
import java.util.Arrays;
import java.util.List;
import java.util.RandomAccess;

/**
 * The text of many ids, appended in order and kept as bytes in fixed-size pages with one int
 * address per id: an ASCII id of length L costs L + 5 bytes, where a {@code String} costs about
 * 56 bytes plus its text, and a list of them a reference more.
 *
 * <p>Each UTF-16 code unit is written separately in the UTF-8 byte pattern (one byte below
 * U+0080, two below U+0800, three otherwise, lone surrogates included), preceded by the number of
 * code units as a varint. Unlike {@code String.getBytes(UTF_8)}, which turns an unpaired surrogate
 * (a JSON {@code "\ud800"}) into '?', this is one-to-one, so two ids are equal exactly when their
 * bytes are. Written by hand for that reason; no page ever splits an id, and an id longer than a
 * page gets a page of its own.
 */
final class IdText {
    /** 256 KiB pages: under half a G1 region, so they are ordinary allocations. */
    private static final int PAGE_BITS = 18;
    private static final int PAGE = 1 << PAGE_BITS;
    private static final int MAX_PAGES = 1 << (31 - PAGE_BITS);

    private byte[][] pages = new byte[1][];
    private int page = -1;     // the page being filled
    private int used;          // bytes used in it
    private final IntColumn address = new IntColumn();   // page << PAGE_BITS | offset
    private byte[] scratch = new byte[64];

    /** Appends {@code id}; returns its index. */
    int add(String id) {
        int length = encode(id);
        if (page < 0 || used + length > pages[page].length) makeRoom(length);
        System.arraycopy(scratch, 0, pages[page], used, length);
        address.add(page << PAGE_BITS | used);
        used += length;
        return address.size() - 1;
    }

    int size() { return address.size(); }

    String get(int index) {
        int at = address.get(index);
        byte[] bytes = pages[at >>> PAGE_BITS];
        int offset = at & (PAGE - 1);
        int units = 0;
        int shift = 0;
        byte b;
        do {
            b = bytes[offset++];
            units |= (b & 0x7F) << shift;
            shift += 7;
        } while (b < 0);
        char[] chars = new char[units];
        for (int i = 0; i < units; i++) {
            int c = bytes[offset++] & 0xFF;
            if (c >= 0xE0) {
                c = (c & 0x0F) << 12 | (bytes[offset] & 0x3F) << 6 | (bytes[offset + 1] & 0x3F);
                offset += 2;
            } else if (c >= 0xC0) {
                c = (c & 0x1F) << 6 | (bytes[offset++] & 0x3F);
            }
            chars[i] = (char) c;
        }
        return new String(chars);
    }

    /** Whether the id at {@code index} is exactly {@code id}. */
    boolean equalsAt(int index, String id) {
        int length = encode(id);
        int at = address.get(index);
        int offset = at & (PAGE - 1);
        byte[] bytes = pages[at >>> PAGE_BITS];
        return offset + length <= bytes.length && Arrays.equals(bytes, offset, offset + length, scratch, 0, length);
    }

    /** The ids in order, decoded on access; the view stays valid while ids are appended. */
    List<String> view() {
        return new View(this);
    }

    /** Writes the varint length and the code units of {@code id} into {@link #scratch}; returns the byte count. */
    private int encode(String id) {
        int units = id.length();
        int need = 5 + 3 * units;
        if (scratch.length < need) scratch = new byte[Math.max(need, scratch.length * 2)];
        int n = 0;
        for (int v = units; ; v >>>= 7) {
            if (v < 0x80) {
                scratch[n++] = (byte) v;
                break;
            }
            scratch[n++] = (byte) (v & 0x7F | 0x80);
        }
        for (int i = 0; i < units; i++) {
            char c = id.charAt(i);
            if (c < 0x80) {
                scratch[n++] = (byte) c;
            } else if (c < 0x800) {
                scratch[n++] = (byte) (0xC0 | c >> 6);
                scratch[n++] = (byte) (0x80 | c & 0x3F);
            } else {
                scratch[n++] = (byte) (0xE0 | c >> 12);
                scratch[n++] = (byte) (0x80 | c >> 6 & 0x3F);
                scratch[n++] = (byte) (0x80 | c & 0x3F);
            }
        }
        return n;
    }

    /** Grows the first page (small files stay small) or opens a new one for {@code length} more bytes. */
    private void makeRoom(int length) {
        if (page == 0 && used + length <= PAGE) {
            pages[0] = Arrays.copyOf(pages[0], Math.min(PAGE, Math.max(pages[0].length * 2, used + length)));
            return;
        }
        if (page + 1 >= MAX_PAGES) throw new IllegalStateException("more id text than " + MAX_PAGES + " pages hold");
        page++;
        if (page == pages.length) pages = Arrays.copyOf(pages, pages.length * 2);
        pages[page] = new byte[page == 0 ? Math.max(256, length) : Math.max(PAGE, length)];
        used = 0;
    }

    private static final class View extends AbstractList<String> implements RandomAccess {
        private final IdText text;

        View(IdText text) { this.text = text; }

        @Override public String get(int index) { return text.get(index); }

        @Override public int size() { return text.size(); }
    }
}
