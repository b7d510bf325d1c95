package org.assay.data;

import java.nio.file.Path;

/**
 * The ids of a second file (a manifest, a truth file) read after the predictions and matched
 * against their complete {@link IdRegistry}, with exactly the checks an {@code IdRegistry} of
 * that file would make (empty, repeated, differing by surrounding whitespace, naming the same
 * earlier id and line), but without storing a second copy of the ids both files share: a shared
 * id costs one int (its line here), and only the ids the predictions lack are registered.
 *
 * <p>The check is equivalent because an earlier id of this file is either a prediction id (its
 * line here recorded) or one the predictions lack (registered in {@link #unmatched()}); both are
 * searched for ids of the same normalized form, and the worst relation found decides, as in the
 * registry. Ids of this file that differ only by case are accepted without a warning of their
 * own: the predictions' registry warns about the ids that are evaluated.
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
        IdRegistry.Kinship worst = null;
        String earlier = null;
        int earlierLine = 0;
        int at = -1;
        for (int pass = 0; pass < 2; pass++) {
            IdRegistry ids = pass == 0 ? predictions : unmatched;
            int n = ids.similar(id);
            for (int i = 0; i < n; i++) {
                int index = ids.similarAt(i);
                if (pass == 0 && predictions.id(index).equals(id)) at = index;
                int lineOfIt = pass == 0 ? lineHere[index] : ids.line(index);
                if (lineOfIt == 0) continue;   // a prediction id this file has not listed (yet)
                IdRegistry.Kinship kin = IdRegistry.Kinship.of(id, ids.id(index));
                if (worst == null || kin.compareTo(worst) < 0 || kin == worst && lineOfIt < earlierLine) {
                    worst = kin;
                    earlier = ids.id(index);
                    earlierLine = lineOfIt;
                }
            }
        }
        if (worst != null && !worst.allowed()) {
            throw IdRegistry.conflict(file, id, line, earlier, earlierLine, worst);
        }
        if (at >= 0) {
            lineHere[at] = line;
        } else {
            unmatched.add(id, line);
        }
        size++;
        return at;
    }

    /**
     * A hint for a prediction id this file lacks: the first id of this file (matched or not) that
     * equals it up to case and whitespace, as {@link IdRegistry#similarHint} on a registry of the
     * whole file would give.
     */
    String similarHint(String id) {
        String near = null;
        int nearLine = 0;
        for (int pass = 0; pass < 2; pass++) {
            IdRegistry ids = pass == 0 ? predictions : unmatched;
            int n = ids.similar(id);
            for (int i = 0; i < n; i++) {
                int index = ids.similarAt(i);
                int lineOfIt = pass == 0 ? lineHere[index] : ids.line(index);
                if (lineOfIt > 0 && (near == null || lineOfIt < nearLine)) {
                    near = ids.id(index);
                    nearLine = lineOfIt;
                }
            }
        }
        return near == null ? "" : IdRegistry.hint(near, nearLine);
    }

    /** Line in this file of prediction {@code index}'s id, or 0 when this file does not list it. */
    int lineOf(int index) { return lineHere[index]; }

    /** The ids of this file the predictions lack, in file order, with their lines. */
    IdRegistry unmatched() { return unmatched; }

    /** Ids accepted so far. */
    int size() { return size; }

    Path file() { return file; }
}
