package org.assay.data;

import java.nio.file.Path;

/**
 * The ids of a second file (a manifest, a truth file) read after the predictions and matched
 * against their complete {@link IdRegistry}, with exactly the checks an {@code IdRegistry} of
 * that file would make (empty, repeated, differing only by case or whitespace, naming the same
 * earlier id and line), but without storing a second copy of the ids both files share: a shared
 * id costs one int (its line here), and only the ids the predictions lack are registered.
 *
 * <p>The check is equivalent because the predictions hold at most one id per normalized form, so
 * an id of this file can clash with an earlier one only through the same prediction id (matched
 * before) or through an id the predictions lack (registered in {@link #unmatched()}).
 */
final class JoinedIds {
    private final Path file;
    private final IdRegistry predictions;
    private final int[] lineHere;   // by prediction index: line of that id in this file, 0 when not listed
    private final IdRegistry unmatched;
    private int size;

    JoinedIds(Path file, IdRegistry predictions) {
        this.file = file;
        this.predictions = predictions;
        this.lineHere = new int[predictions.size()];
        this.unmatched = new IdRegistry(file);
    }

    /**
     * Accepts the id on {@code line} of this file, or fails as {@link IdRegistry#add} would;
     * returns the index of the same id among the predictions, or -1 when they lack it.
     */
    int add(String id, int line) {
        if (id.isBlank()) return unmatched.add(id, line);   // throws the usual error
        int at = predictions.indexOf(id);
        if (at >= 0) {
            if (lineHere[at] > 0) throw IdRegistry.duplicate(file, id, line, lineHere[at]);
            int near = unmatched.indexOfSimilar(id);
            if (near >= 0) throw IdRegistry.similar(file, id, line, unmatched.id(near), unmatched.line(near));
            lineHere[at] = line;
            size++;
            return at;
        }
        int near = predictions.indexOfSimilar(id);
        if (near >= 0 && lineHere[near] > 0) {
            throw IdRegistry.similar(file, id, line, predictions.id(near), lineHere[near]);
        }
        unmatched.add(id, line);
        size++;
        return -1;
    }

    /** Line in this file of prediction {@code index}'s id, or 0 when this file does not list it. */
    int lineOf(int index) { return lineHere[index]; }

    /** The ids of this file the predictions lack, in file order, with their lines. */
    IdRegistry unmatched() { return unmatched; }

    /** Ids accepted so far. */
    int size() { return size; }

    Path file() { return file; }
}
