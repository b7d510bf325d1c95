package org.assay.data.generation;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.common.UserInputException;

/**
 * A hypotheses file and one file per reference set, aligned line by line; item i's id is its line
 * number. Every file must have the same number of lines. In a reference file an empty line means
 * that set has no reference for the item (sets are often padded this way); it is skipped and
 * counted in a warning, and an item left with no reference at all is an error.
 */
final class ParallelTextReader {
    private ParallelTextReader() {}

    static GenerationData read(Path hypothesesFile, List<Path> referenceFiles) {
        if (referenceFiles.isEmpty()) {
            throw new UserInputException(hypothesesFile, null, "no reference files were given",
                    "give one reference file per reference set, each with one line per hypothesis");
        }
        List<String> hypotheses = TextLines.read(hypothesesFile, "hypotheses file");
        if (hypotheses.isEmpty()) {
            throw new UserInputException(hypothesesFile, null, "the hypotheses file is empty",
                    "check that this is the right file and that it was written completely");
        }
        List<List<String>> sets = new ArrayList<>();
        for (Path file : referenceFiles) {
            List<String> lines = TextLines.read(file, "reference file");
            if (lines.size() != hypotheses.size()) {
                throw new UserInputException(file, null, "the reference file has " + lines.size()
                        + " lines but the hypotheses file " + hypothesesFile + " has " + hypotheses.size(),
                        "give every file one line per item, in the same order; leave a line empty where a reference set has none");
            }
            sets.add(lines);
        }
        List<String> ids = new ArrayList<>();
        List<List<String>> references = new ArrayList<>();
        List<Integer> emptyAt = new ArrayList<>();
        int[] skipped = new int[sets.size()], firstSkipped = new int[sets.size()];
        for (int i = 0; i < hypotheses.size(); i++) {
            ids.add(Integer.toString(i + 1));
            if (Whitespace.isBlank(hypotheses.get(i))) emptyAt.add(i + 1);
            List<String> refs = new ArrayList<>();
            for (int s = 0; s < sets.size(); s++) {
                String ref = sets.get(s).get(i);
                if (!Whitespace.isBlank(ref)) {
                    refs.add(ref);
                } else if (skipped[s]++ == 0) {
                    firstSkipped[s] = i + 1;
                }
            }
            if (refs.isEmpty()) {
                throw new UserInputException(referenceFiles.get(0), "line " + (i + 1),
                        "the item on this line has an empty reference in every reference file ("
                                + referenceFiles.size() + ")",
                        "give the item a reference, or remove its line from every file");
            }
            references.add(refs);
        }
        List<String> warnings = new ArrayList<>();
        String empty = GenerationReader.emptyHypotheses(emptyAt, hypotheses.size());
        if (empty != null) warnings.add(hypothesesFile + ": " + empty);
        for (int s = 0; s < sets.size(); s++) {
            if (skipped[s] == 0) continue;
            warnings.add(referenceFiles.get(s) + ": " + skipped[s] + " empty line(s), the first on line " + firstSkipped[s]
                    + ", read as missing references; those items are scored against their other references");
        }
        return new GenerationData(hypothesesFile, ids, hypotheses, references, warnings);
    }
}
