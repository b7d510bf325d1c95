package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * The ids of one file, in file order, with the line each came from. Rejects empty ids, repeated
 * ids, and ids that differ from an earlier one only by case or surrounding whitespace: such
 * pairs almost always come from two tools formatting the same id differently, and matching them
 * exactly would silently treat them as different examples.
 *
 * <p>Sized for tens of millions of rows: the text is kept compactly ({@link IdText}), lines as
 * runs ({@link LineNumbers}), and the lookup is one open-addressing table of longs, each holding
 * a 32-bit tag hashed from the id's normalized form (stripped, lower case) and the entry's
 * index. A hash match is only a candidate: it is confirmed by comparing the texts, so a hash
 * collision never raises an error or joins two different ids. One table serves both checks,
 * because an id that repeats an earlier one exactly also repeats it up to case, and the registry
 * never holds two ids with the same normalized form. About 19 bytes per entry for an id of 14
 * ASCII characters, plus 8 to 21 for the table (load between 0.375 and 0.75).
 */
final class IdRegistry {
    private static final double MAX_LOAD = 0.75;

    private final Path file;
    private final IdText text = new IdText();
    private final LineNumbers lines = new LineNumbers();
    private long[] slots = new long[16];   // 0 = empty, else tag << 32 | (index + 1)
    private boolean frozen;

    IdRegistry(Path file) {
        this.file = file;
    }

    /** Adds the id of the row on {@code line}; returns its index. */
    int add(String id, int line) {
        if (frozen) throw new IllegalStateException("the registry of " + file + " no longer accepts ids");
        if (id.isBlank()) {
            throw new UserInputException(file, RowErrors.line(line), "the id is empty",
                    "give every row an id");
        }
        String normalized = normalize(id);
        int tag = tag(normalized);
        int slot = probe(normalized, tag);
        long found = slots[slot];
        if (found != 0) {
            int earlier = (int) found - 1;
            if (text.equalsAt(earlier, id)) throw duplicate(file, id, line, lines.line(earlier));
            throw similar(file, id, line, text.get(earlier), lines.line(earlier));
        }
        int index = text.add(id);
        lines.add(line);
        slots[slot] = (long) tag << 32 | (index + 1L);
        if (index + 1 > MAX_LOAD * slots.length) grow();
        return index;
    }

    /** Index of {@code id}, or -1. */
    int indexOf(String id) {
        int at = indexOfSimilar(id);
        return at >= 0 && text.equalsAt(at, id) ? at : -1;
    }

    /** Index of an id that equals {@code id} up to case and surrounding whitespace, or -1. */
    int indexOfSimilar(String id) {
        if (frozen) throw new IllegalStateException("the registry of " + file + " has released its lookup table");
        String normalized = normalize(id);
        long found = slots[probe(normalized, tag(normalized))];
        return found == 0 ? -1 : (int) found - 1;
    }

    /** A hint for an id that was not found: the near match, if there is one. */
    String similarHint(String id) {
        int at = indexOfSimilar(id);
        return at < 0 ? "" : "; '" + text.get(at) + "' on line " + lines.line(at)
                + " differs only by case or whitespace, likely a formatting mismatch";
    }

    String id(int index) { return text.get(index); }

    int line(int index) { return lines.line(index); }

    int size() { return text.size(); }

    Path file() { return file; }

    /**
     * Releases the lookup table once every check is done (it is the larger part of the registry);
     * the ids and lines stay readable, lookups and additions fail from then on.
     */
    void releaseLookup() {
        frozen = true;
        slots = null;
    }

    /** The ids in file order, decoded on access. */
    List<String> ids() { return text.view(); }

    /** "duplicate id" as every id check words it. */
    static UserInputException duplicate(Path file, String id, int line, int earlierLine) {
        return new UserInputException(file, RowErrors.line(line),
                "duplicate id '" + id + "' (also on line " + earlierLine + ")",
                "give every example a distinct id, or remove the repeated row");
    }

    /** "differs only by case or whitespace" as every id check words it. */
    static UserInputException similar(Path file, String id, int line, String earlier, int earlierLine) {
        return new UserInputException(file, RowErrors.line(line),
                "id '" + id + "' differs from id '" + earlier + "' on line "
                        + earlierLine + " only by case or surrounding whitespace,"
                        + " likely a formatting mismatch",
                "write each id the same way everywhere; ids are compared exactly");
    }

    /**
     * The slot of the entry whose normalized form is {@code normalized}, or the empty slot where
     * it would go (linear probing from the slot the tag names). An entry with the same tag is
     * confirmed by its text: first directly (most ids are already in normalized form), else by
     * normalizing the stored id.
     */
    private int probe(String normalized, int tag) {
        int mask = slots.length - 1;
        for (int slot = tag & mask; ; slot = (slot + 1) & mask) {
            long entry = slots[slot];
            if (entry == 0) return slot;
            if ((int) (entry >>> 32) == tag) {
                int index = (int) entry - 1;
                if (text.equalsAt(index, normalized) || normalize(text.get(index)).equals(normalized)) return slot;
            }
        }
    }

    /** Doubles the table; the stored tag names each entry's slot, so no id is read again. */
    private void grow() {
        long[] old = slots;
        slots = new long[old.length * 2];
        int mask = slots.length - 1;
        for (long entry : old) {
            if (entry == 0) continue;
            int slot = (int) (entry >>> 32) & mask;
            while (slots[slot] != 0) slot = (slot + 1) & mask;
            slots[slot] = entry;
        }
    }

    /**
     * The tag of a normalized id: 32 bits of a 64-bit FNV-1a hash over its UTF-16 code units,
     * finished with the MurmurHash3 fmix64 mixer (common practice). Its low bits pick the slot, and
     * entries that share a slot are told apart by the rest before any text is compared.
     */
    static int tag(String s) {
        long h = 0xcbf29ce484222325L;
        for (int i = 0; i < s.length(); i++) h = (h ^ s.charAt(i)) * 0x100000001b3L;
        h ^= h >>> 33;
        h *= 0xff51afd7ed558ccdL;
        h ^= h >>> 33;
        h *= 0xc4ceb9fe1a85ec53L;
        return (int) ((h ^ (h >>> 33)) >>> 32);
    }

    static String normalize(String id) {
        return id.strip().toLowerCase(Locale.ROOT);
    }
}
