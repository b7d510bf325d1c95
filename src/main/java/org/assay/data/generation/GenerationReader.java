package org.assay.data.generation;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.assay.common.UserInputException;

/**
 * Reads text-generation outputs with their references, in one of two layouts:
 * <ul>
 *   <li>JSON Lines ({@code .jsonl}, {@code .ndjson}): one object per line,
 *       {@code {"id": "s1", "hypothesis": "...", "references": ["...", "..."]}};</li>
 *   <li>parallel plain-text files: one hypothesis per line, and one file per reference set with
 *       the same number of lines; an item's id is its line number.</li>
 * </ul>
 * Texts are kept exactly as written. Every problem is a {@link UserInputException} naming the
 * file and line; empty hypotheses are kept (an empty output is a real output) and counted in a
 * warning.
 */
public final class GenerationReader {
    private GenerationReader() {}

    /** A JSON Lines file of items with their references. */
    public static GenerationData jsonl(Path file) {
        return JsonlGenerationReader.read(file);
    }

    /** A hypotheses file and one reference file per reference set, aligned line by line. */
    public static GenerationData parallel(Path hypotheses, List<Path> references) {
        return ParallelTextReader.read(hypotheses, references);
    }

    /**
     * Picks the layout by {@code file}'s extension: {@code .jsonl}/{@code .ndjson} hold their
     * references (then {@code references} must be empty); any other file is a hypotheses file
     * read in parallel with {@code references}.
     */
    public static GenerationData read(Path file, List<Path> references) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".jsonl") || name.endsWith(".ndjson")) {
            if (!references.isEmpty()) {
                throw new UserInputException(file, null, "a JSON Lines file carries its own references, but "
                        + references.size() + " reference file(s) were given too",
                        "drop the reference files, or give the hypotheses as a plain-text file");
            }
            return jsonl(file);
        }
        if (references.isEmpty()) {
            throw new UserInputException(file, null, "a plain-text hypotheses file needs reference files",
                    "give one reference file per reference set (one line per item), or a .jsonl file with references");
        }
        return parallel(file, references);
    }

    /** The warning for empty hypotheses at {@code lines} (1-based), or null when there are none. */
    static String emptyHypotheses(List<Integer> lines, int items) {
        if (lines.isEmpty()) return null;
        List<String> shown = lines.stream().limit(5).map(String::valueOf).toList();
        return lines.size() + " of " + items + " hypotheses are empty (line" + (lines.size() > 1 ? "s " : " ")
                + String.join(", ", shown) + (lines.size() > 5 ? ", ..." : "")
                + "); they are kept and count as outputs without words";
    }
}
