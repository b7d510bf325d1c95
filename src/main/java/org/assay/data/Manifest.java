package org.assay.data;

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
 */
public final class Manifest {
    private final IdRegistry ids;
    private final List<String> comments;

    private Manifest(IdRegistry ids, List<String> comments) {
        this.ids = ids;
        this.comments = comments;
    }

    /** Reads and checks a manifest (distinct ids, at least one). */
    public static Manifest read(Path file) {
        IdRegistry ids = new IdRegistry(file);
        List<String> comments = new ArrayList<>();
        boolean anyLine = false;
        try (BufferedReader reader = new BufferedReader(StrictUtf8Reader.open(file, "manifest"))) {
            int line = 0;
            for (String text = reader.readLine(); text != null; text = reader.readLine()) {
                line++;
                anyLine = true;
                if (text.isBlank()) continue;
                if (text.startsWith("#")) comments.add(text);
                else ids.add(text, line);
            }
        } catch (IOException e) {
            throw RowErrors.unreadable(file, e);
        }
        if (!anyLine) throw RowErrors.empty(file, "manifest");
        if (ids.size() == 0) {
            throw new UserInputException(file, null, "the manifest lists no ids",
                    "write one sampled id per line");
        }
        return new Manifest(ids, List.copyOf(comments));
    }

    /** The registry of the listed ids, with their lines. */
    IdRegistry registry() { return ids; }

    /** The listed ids, in file order. */
    public java.util.List<String> ids() {
        java.util.List<String> out = new java.util.ArrayList<>(ids.size());
        for (int i = 0; i < ids.size(); i++) out.add(ids.id(i));
        return out;
    }

    /** Number of ids listed. */
    public int size() { return ids.size(); }

    /** The comment lines, with their leading '#'. */
    public List<String> comments() { return comments; }

    /**
     * The ids of another task's outputs (generation items, say) against the manifest, as
     * {@link #checkCovers(IdRegistry)} does for predictions; {@code ids.get(i)} is item i, reported as line i + 1.
     */
    public void checkCovers(Path outputs, java.util.List<String> itemIds) {
        IdRegistry registry = new IdRegistry(outputs);
        for (int i = 0; i < itemIds.size(); i++) registry.add(itemIds.get(i), i + 1);
        checkCovers(registry);
    }

    /**
     * Every prediction id must be in the manifest and every manifest id must have a prediction;
     * the error names the first offender and counts the rest.
     */
    void checkCovers(IdRegistry predictions) {
        int missing = 0;
        int first = -1;
        for (int i = 0; i < predictions.size(); i++) {
            if (ids.indexOf(predictions.id(i)) < 0 && missing++ == 0) first = i;
        }
        if (missing > 0) {
            String id = predictions.id(first);
            throw new UserInputException(predictions.file(), RowErrors.line(predictions.line(first)),
                    "id '" + id + "' is not in the manifest " + ids.file() + more(missing) + ids.similarHint(id),
                    "give the manifest the subsample was drawn with, or remove predictions for ids outside it");
        }
        for (int i = 0; i < ids.size(); i++) {
            if (predictions.indexOf(ids.id(i)) < 0 && missing++ == 0) first = i;
        }
        if (missing > 0) {
            String id = ids.id(first);
            throw new UserInputException(ids.file(), RowErrors.line(ids.line(first)),
                    "manifest id '" + id + "' has no row in the predictions file " + predictions.file()
                            + more(missing) + predictions.similarHint(id),
                    "add predictions for every sampled id, or give the manifest of the subsample you evaluated");
        }
    }

    private static String more(int missing) {
        return missing > 1 ? " (and " + (missing - 1) + " more)" : "";
    }
}
