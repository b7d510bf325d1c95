package org.assay.data;

import org.assay.common.Progress;
import org.assay.common.UserInputException;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A subsample manifest: one id per line, in the order drawn. Blank lines are ignored; lines that
 * start with {@code #} are comments (the sampler records its seed and method there), kept as
 * written. Ids are taken exactly as written, without trimming, like ids in the predictions.
 *
 * <p>Checking predictions against a manifest ({@link #checkCovers(Path, IdRegistry, Progress.Task)}) streams the
 * manifest against the predictions' ids instead of reading it into a registry of its own, so a
 * manifest of ten million ids costs four bytes per id on top of the predictions.
 */
public final class Manifest {
    private final IdRegistry ids;
    private final int size;
    private final List<String> comments;

    private Manifest(IdRegistry ids, int size, List<String> comments) {
        this.ids = ids;
        this.size = size;
        this.comments = comments;
    }

    /** Reads and checks a manifest (distinct ids, at least one). */
    public static Manifest read(Path file) {
        IdRegistry ids = new IdRegistry(file);
        List<String> comments = new ArrayList<>();
        eachId(file, comments, ids::add, Progress.Task.NONE);
        return new Manifest(ids, ids.size(), List.copyOf(comments));
    }

    /**
     * The number of ids and the comments of a manifest that was checked before (by an audit's
     * reading of its predictions), without holding its ids; {@link #ids()} is then unavailable.
     */
    public static Manifest describe(Path file) {
        List<String> comments = new ArrayList<>();
        int[] count = new int[1];
        eachId(file, comments, (id, line) -> count[0]++, Progress.Task.NONE);
        return new Manifest(null, count[0], List.copyOf(comments));
    }

    /** The registry of the listed ids, with their lines. */
    IdRegistry registry() {
        if (ids == null) throw new IllegalStateException("manifest read with describe() keeps no ids");
        return ids;
    }

    /** The listed ids, in file order. */
    public List<String> ids() {
        IdRegistry r = registry();
        List<String> out = new ArrayList<>(r.size());
        for (int i = 0; i < r.size(); i++) out.add(r.id(i));
        return out;
    }

    /** Number of ids listed. */
    public int size() { return size; }

    /** The comment lines, with their leading '#'. */
    public List<String> comments() { return comments; }

    /**
     * The ids of another task's outputs (generation items, say) against the manifest, as
     * {@link #checkCovers(Path, IdRegistry, Progress.Task)} does for predictions; {@code itemIds.get(i)} is item i,
     * reported as line i + 1.
     */
    public static void checkCovers(Path manifest, Path outputs, List<String> itemIds) {
        IdRegistry registry = new IdRegistry(outputs);
        for (int i = 0; i < itemIds.size(); i++) registry.add(itemIds.get(i), i + 1);
        checkCovers(manifest, registry, Progress.Task.NONE);
    }

    /**
     * Reads and checks the manifest (distinct ids, at least one), then requires every prediction
     * id to be in it and every id in it to have a prediction; the error names the first offender
     * and counts the rest. The errors are the ones {@link #read} followed by a comparison of the
     * two registries would give, in the same order.
     */
    static void checkCovers(Path manifest, IdRegistry predictions, Progress.Task progress) {
        JoinedIds listed = new JoinedIds(manifest, predictions);
        eachId(manifest, new ArrayList<>(), listed::add, progress);
        int missing = 0;
        int first = -1;
        for (int i = 0; i < predictions.size(); i++) {
            if (listed.lineOf(i) == 0 && missing++ == 0) first = i;
        }
        if (missing > 0) {
            String id = predictions.id(first);
            throw new UserInputException(predictions.file(), RowErrors.line(predictions.line(first)),
                    "id '" + id + "' is not in the manifest " + manifest + more(missing)
                            + listed.similarHint(id),
                    "give the manifest the subsample was drawn with, or remove predictions for ids outside it");
        }
        IdRegistry unlisted = listed.unmatched();
        if (unlisted.size() > 0) {
            String id = unlisted.id(0);
            throw new UserInputException(manifest, RowErrors.line(unlisted.line(0)),
                    "manifest id '" + id + "' has no row in the predictions file " + predictions.file()
                            + more(unlisted.size()) + predictions.similarHint(id),
                    "add predictions for every sampled id, or give the manifest of the subsample you evaluated");
        }
    }

    private interface IdSink { void accept(String id, int line); }

    /** Passes every id line to {@code sink} and collects the comments; fails on an empty manifest. */
    private static void eachId(Path file, List<String> comments, IdSink sink, Progress.Task progress) {
        boolean anyLine = false;
        int ids = 0;
        int lines = 0;
        try (BufferedReader reader = new BufferedReader(StrictUtf8Reader.open(file, "manifest", progress))) {
            int line = 0;
            for (String text = reader.readLine(); text != null; text = reader.readLine()) {
                line++;
                lines = line;
                anyLine = true;
                if (text.isBlank()) continue;
                if (text.startsWith("#")) {
                    comments.add(text);
                } else {
                    sink.accept(text, line);
                    ids++;
                }
            }
        } catch (IOException e) {
            throw RowErrors.unreadable(file, e);
        }
        if (!anyLine) throw RowErrors.empty(file, "manifest");
        if (ids == 0) {
            throw new UserInputException(file, lines == 1 ? "line 1" : "lines 1-" + lines,
                    "the manifest lists no ids, only comments (#) and blank lines",
                    "write one sampled id per line");
        }
    }

    private static String more(int missing) {
        return missing > 1 ? " (and " + (missing - 1) + " more)" : "";
    }
}
