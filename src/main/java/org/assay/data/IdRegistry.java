package org.assay.data;

import org.assay.common.UserInputException;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The ids of one file, in file order, with the line each came from. Rejects empty ids, repeated
 * ids, and ids that differ from an earlier one by surrounding whitespace (alone or together with
 * case): such pairs almost always come from two tools formatting the same id differently, and
 * matching them exactly would silently treat them as different examples. Ids that differ only by
 * case ({@code img_a1} and {@code IMG_A1}) are accepted, because case-sensitive ids exist in real
 * datasets; they stay different ids, and {@link #caseWarning()} says so, so the report shows it.
 *
 * <p>Sized for tens of millions of rows: the text is kept compactly ({@link IdText}), lines as
 * runs ({@link LineNumbers}), and the lookup is one open-addressing table of longs, each holding
 * a 32-bit tag hashed from the id's normalized form (stripped, lower case) and the entry's
 * index. A hash match is only a candidate: it is confirmed by comparing the texts, so a hash
 * collision never raises an error or joins two different ids. Every id of one normalized form
 * lies on the probe run from its tag's slot to the next empty slot, so one scan of that run finds
 * the exact id, a near one, and the case variants. About 19 bytes per entry for an id of 14
 * ASCII characters, plus 8 to 21 for the table (load between 0.375 and 0.75).
 */
final class IdRegistry {
    private static final double MAX_LOAD = 0.75;

    /** How an id relates to another with the same normalized form, worst first. */
    enum Kinship {
        SAME, WHITESPACE, CASE_AND_WHITESPACE, CASE;

        static Kinship of(String id, String other) {
            if (id.equals(other)) return SAME;
            if (id.strip().equals(other.strip())) return WHITESPACE;
            if (id.toLowerCase(Locale.ROOT).equals(other.toLowerCase(Locale.ROOT))) return CASE;
            return CASE_AND_WHITESPACE;
        }

        /** Whether two ids related this way may both be in one file. */
        boolean allowed() { return this == CASE; }
    }

    private final Path file;
    private final IdText text = new IdText();
    private final LineNumbers lines = new LineNumbers();
    private long[] slots = new long[16];   // 0 = empty, else tag << 32 | (index + 1)
    private boolean frozen;
    private int[] found = new int[4];      // indices of the last scan's ids of the same normalized form
    private int foundCount;
    private int caseVariants;              // ids accepted that differ from an earlier one only by case
    private String firstCaseVariant;       // the first such pair, in words

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
        int slot = scan(normalized, tag);
        int worst = -1;
        Kinship worstKin = null;
        for (int i = 0; i < foundCount; i++) {
            Kinship kin = Kinship.of(id, text.get(found[i]));
            if (worstKin == null || kin.compareTo(worstKin) < 0 || kin == worstKin && found[i] < worst) {
                worst = found[i];
                worstKin = kin;
            }
        }
        if (worstKin != null && !worstKin.allowed()) {
            throw conflict(file, id, line, text.get(worst), lines.line(worst), worstKin);
        }
        if (worstKin == Kinship.CASE && caseVariants++ == 0) {
            firstCaseVariant = "id '" + id + "' on line " + line + " differs from id '" + text.get(worst)
                    + "' on line " + lines.line(worst) + " only by case";
        }
        int index = text.add(id);
        lines.add(line);
        slots[slot] = (long) tag << 32 | (index + 1L);
        if (index + 1 > MAX_LOAD * slots.length) grow();
        return index;
    }

    /** Index of {@code id}, or -1. */
    int indexOf(String id) {
        similar(id);
        for (int i = 0; i < foundCount; i++) if (text.equalsAt(found[i], id)) return found[i];
        return -1;
    }

    /** Index of the first id that equals {@code id} up to case and surrounding whitespace, or -1. */
    int indexOfSimilar(String id) {
        int n = similar(id);
        int first = -1;
        for (int i = 0; i < n; i++) if (first < 0 || found[i] < first) first = found[i];
        return first;
    }

    /**
     * Finds every id equal to {@code id} up to case and surrounding whitespace, itself included;
     * returns how many, their indices then being {@link #similarAt}(0 ..) until the next call.
     */
    int similar(String id) {
        if (frozen) throw new IllegalStateException("the registry of " + file + " has released its lookup table");
        String normalized = normalize(id);
        scan(normalized, tag(normalized));
        return foundCount;
    }

    int similarAt(int i) { return found[i]; }

    /** A hint for an id that was not found: the near match, if there is one. */
    String similarHint(String id) {
        int at = indexOfSimilar(id);
        return at < 0 ? "" : hint(text.get(at), lines.line(at));
    }

    /** The words of {@link #similarHint} for a near match {@code near} on {@code line}. */
    static String hint(String near, int line) {
        return "; '" + near + "' on line " + line + " differs only by case or whitespace, likely a formatting mismatch";
    }

    /**
     * A warning when ids differ only by case (accepted, and compared exactly): the first pair and
     * how many ids are such variants of an earlier one.
     */
    Optional<String> caseWarning() {
        if (caseVariants == 0) return Optional.empty();
        return Optional.of("WARNING " + file + ": " + firstCaseVariant
                + (caseVariants > 1 ? " (" + caseVariants + " ids differ from an earlier one only by case)" : "")
                + "; ids are compared exactly, so these count as different examples"
                + " (if they are the same example written two ways, write it one way)");
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

    /** The error for an id that may not stand beside an earlier one ({@code kin} not allowed). */
    static UserInputException conflict(Path file, String id, int line, String earlier, int earlierLine, Kinship kin) {
        if (kin == Kinship.SAME) return duplicate(file, id, line, earlierLine);
        return new UserInputException(file, RowErrors.line(line),
                "id '" + id + "' differs from id '" + earlier + "' on line " + earlierLine + " only by "
                        + (kin == Kinship.WHITESPACE ? "surrounding whitespace" : "case and surrounding whitespace")
                        + ", likely a formatting mismatch",
                "write each id the same way everywhere; ids are compared exactly, spaces included");
    }

    /**
     * Collects into {@link #found} the entries whose normalized form is {@code normalized}, and
     * returns the empty slot that ends their probe run (where a new entry would go). Entries with
     * the same tag are confirmed by their text: first directly (most ids are already in normalized
     * form), else by normalizing the stored id.
     */
    private int scan(String normalized, int tag) {
        foundCount = 0;
        int mask = slots.length - 1;
        for (int slot = tag & mask; ; slot = (slot + 1) & mask) {
            long entry = slots[slot];
            if (entry == 0) return slot;
            if ((int) (entry >>> 32) == tag) {
                int index = (int) entry - 1;
                if (text.equalsAt(index, normalized) || normalize(text.get(index)).equals(normalized)) {
                    if (foundCount == found.length) found = java.util.Arrays.copyOf(found, foundCount * 2);
                    found[foundCount++] = index;
                }
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
