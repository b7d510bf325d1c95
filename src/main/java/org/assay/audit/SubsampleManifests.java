package org.assay.audit;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.IdList;
import org.assay.data.Manifest;
import org.assay.stats.SubsampleDraw;

/**
 * Drawing a subsample manifest from a test set's id list ({@code assay sample}), and checking a
 * manifest an audit is given: redrawing it from its header when assay drew it, and looking for
 * signs of a non-random choice (a contiguous block of the test set, such as its first n ids).
 *
 * <p>The header is our own: {@code # key: value} lines after {@code # assay subsample manifest},
 * recording the method, seed, n, N, the id list (path relative to the manifest, its SHA-256 and
 * column) and, for a stratified draw, the stratum column and allocation. The ids follow, one per
 * line, in the id list's order.
 */
public final class SubsampleManifests {
    static final String MAGIC = "# assay subsample manifest";
    private static final String SIMPLE = "simple random sample without replacement";
    private static final String STRATIFIED = "stratified random sample, proportional allocation (largest remainder)";

    private SubsampleManifests() {}

    /** A drawn subsample: the manifest text, and what to tell the user. */
    public record Drawn(String text, int n, int populationSize, Map<String, int[]> allocation) {}

    /**
     * Draws n of the list's ids with {@code seed}; stratified when the list has strata.
     *
     * @param listAsNamed the id list's path as the manifest should record it (relative to the manifest)
     */
    public static Drawn draw(IdList list, int n, long seed, String listAsNamed, String idColumn, String stratumColumn) {
        int[] positions;
        Map<String, int[]> allocation = null;
        if (list.strata() == null) {
            positions = SubsampleDraw.simple(list.size(), n, seed);
        } else {
            Strata s = Strata.of(list.strata());
            int[] alloc = SubsampleDraw.proportional(s.sizes, n);
            positions = SubsampleDraw.stratified(s.stratumOf, alloc, seed);
            allocation = new LinkedHashMap<>();
            for (int h = 0; h < s.labels.size(); h++) allocation.put(s.labels.get(h), new int[] {alloc[h], s.sizes[h]});
        }
        StringBuilder sb = new StringBuilder(MAGIC).append('\n');
        sb.append("# method: ").append(allocation == null ? SIMPLE : STRATIFIED).append('\n');
        sb.append("# seed: ").append(seed).append('\n');
        sb.append("# n: ").append(n).append('\n');
        sb.append("# N: ").append(list.size()).append('\n');
        sb.append("# id list: ").append(listAsNamed).append('\n');
        if (idColumn != null) sb.append("# id column: ").append(idColumn).append('\n');
        sb.append("# id list sha256: ").append(list.sha256()).append(" (the ids in file order joined by newlines, UTF-8)\n");
        if (allocation != null) {
            sb.append("# stratify by: ").append(stratumColumn).append('\n');
            List<String> parts = new ArrayList<>();
            allocation.forEach((k, v) -> parts.add(k + " " + v[0] + " of " + v[1]));
            sb.append("# allocation: ").append(String.join("; ", parts)).append('\n');
        }
        for (int p : positions) sb.append(list.ids().get(p)).append('\n');
        return new Drawn(sb.toString(), n, list.size(), allocation);
    }

    /** What a check of a manifest found: warnings, and lines saying how it was drawn. */
    public record Check(List<String> warnings, List<String> description, boolean stratified) {}

    /** Checks a manifest: redraws it when assay drew it, and flags contiguous blocks. */
    public static Check check(Path manifestFile) {
        Manifest m = Manifest.read(manifestFile);
        Map<String, String> header = header(m.comments());
        List<String> warnings = new ArrayList<>();
        List<String> description = new ArrayList<>();
        String name = manifestFile.getFileName().toString();
        boolean stratified = false;
        if (header != null) {
            stratified = header.getOrDefault("method", "").startsWith("stratified");
            description.add(name + ": " + header.getOrDefault("method", "?") + " of " + header.getOrDefault("n", "?")
                    + " from " + header.getOrDefault("N", "?") + " ids, seed " + header.getOrDefault("seed", "?")
                    + (stratified ? ", by " + header.getOrDefault("stratify by", "?") + " (" + header.getOrDefault("allocation", "") + ")" : ""));
            if (stratified) {
                description.add("Bootstrap intervals resample within these strata; the exact intervals of count metrics "
                        + "and DeLong's for ROC AUC treat the draw as simple random, which with proportional allocation "
                        + "makes them somewhat wider than a stratified analysis would");
            }
            String redraw = redraw(manifestFile, header, m.ids());
            if (redraw != null) warnings.add(redraw);
            else description.add("Redrawn from its header (seed and id list): the same ids");
        } else {
            description.add(name + ": " + m.size() + " ids");
            m.comments().forEach(c -> description.add(c.replaceFirst("^#\\s*", "")));
        }
        String block = contiguous(m.ids(), header == null ? null : idList(manifestFile, header));
        if (block != null) warnings.add(name + ": " + block);
        return new Check(warnings, description, stratified);
    }

    /**
     * Each listed id's stratum, read from the id list the header names, when the manifest is an
     * assay stratified draw; null for any other manifest. Fails when the id list cannot be read.
     */
    public static Map<String, String> strata(Path manifestFile) {
        Manifest m = Manifest.describe(manifestFile);
        Map<String, String> header = header(m.comments());
        if (header == null || !header.getOrDefault("method", "").startsWith("stratified")) return null;
        IdList list = idList(manifestFile, header);
        if (list == null || list.strata() == null) {
            throw new UserInputException(manifestFile, null, "its id list " + header.get("id list") + " is not found",
                    "keep the id list next to the manifest, where its header says");
        }
        Map<String, String> out = new HashMap<>();
        for (int i = 0; i < list.size(); i++) out.put(list.ids().get(i), list.strata().get(i));
        return out;
    }

    /** Null when the header redraws to exactly these ids; otherwise why not. */
    private static String redraw(Path manifestFile, Map<String, String> header, List<String> ids) {
        String where = manifestFile + ": ";
        IdList list;
        try {
            list = idList(manifestFile, header);
        } catch (UserInputException e) {
            return where + "cannot redraw the subsample to verify it (" + e.problem() + ")";
        }
        if (list == null) return where + "cannot redraw the subsample to verify it: its id list is not found";
        String sha = header.getOrDefault("id list sha256", "").split(" ")[0];
        if (!sha.equals(list.sha256())) {
            return where + "the id list " + list.file() + " has changed since the subsample was drawn (its SHA-256 differs), "
                    + "so the draw cannot be verified";
        }
        try {
            long seed = Long.parseLong(header.get("seed"));
            int n = Integer.parseInt(header.get("n"));
            String stratumColumn = header.get("stratify by");
            Drawn again = draw(list, n, seed, header.get("id list"), header.get("id column"), stratumColumn);
            List<String> redrawn = again.text().lines().filter(l -> !l.startsWith("#") && !l.isBlank()).toList();
            if (!redrawn.equals(ids)) {
                return where + "a redraw with its recorded seed and method gives different ids: the manifest was "
                        + "edited, or the subsample was not drawn as its header says";
            }
        } catch (RuntimeException e) {
            return where + "its header cannot be read back (" + e.getMessage() + ")";
        }
        return null;
    }

    private static IdList idList(Path manifestFile, Map<String, String> header) {
        String listed = header.get("id list");
        if (listed == null) return null;
        Path p = manifestFile.toAbsolutePath().getParent().resolve(listed).normalize();
        if (!Files.isRegularFile(p)) return null;
        return IdList.read(p, header.get("id column"), header.get("stratify by"));
    }

    /**
     * Why the ids look like a contiguous block rather than a random draw, or null. With the full id
     * list: the ids occupy consecutive positions of it (the first n, the last n, any run). Without it:
     * the ids share a prefix and their numeric parts are consecutive integers.
     */
    static String contiguous(List<String> ids, IdList full) {
        if (ids.size() < 10) return null;   // too few to tell
        if (full != null) {
            Map<String, Integer> position = new HashMap<>();
            for (int i = 0; i < full.size(); i++) position.put(full.ids().get(i), i);
            int[] pos = ids.stream().mapToInt(id -> position.getOrDefault(id, -1)).sorted().toArray();
            if (pos[0] >= 0 && pos[pos.length - 1] - pos[0] == pos.length - 1 && pos.length < full.size()) {
                return "the " + ids.size() + " ids are positions " + (pos[0] + 1) + " to " + (pos[pos.length - 1] + 1)
                        + " of the test set's id list, one contiguous block (the first n?), not a random draw; "
                        + "the intervals assume a random subsample";
            }
            return null;
        }
        String prefix = null;
        long[] numbers = new long[ids.size()];
        for (int i = 0; i < ids.size(); i++) {
            String id = ids.get(i);
            int j = id.length();
            while (j > 0 && Character.isDigit(id.charAt(j - 1))) j--;
            if (j == id.length() || id.length() - j > 18) return null;
            String p = id.substring(0, j);
            if (prefix == null) prefix = p; else if (!prefix.equals(p)) return null;
            numbers[i] = Long.parseLong(id.substring(j));
        }
        Arrays.sort(numbers);
        if (numbers[numbers.length - 1] - numbers[0] == numbers.length - 1) {
            return String.format(Locale.ROOT, "the %d ids run without a gap from %s to %s: that looks like a block of "
                    + "the test set (its first n?), not a random draw; the intervals assume a random subsample",
                    ids.size(), ids.stream().min(java.util.Comparator.naturalOrder()).orElse(""),
                    ids.stream().max(java.util.Comparator.naturalOrder()).orElse(""));
        }
        return null;
    }

    /** The key: value lines of an assay header, or null when the manifest has none. */
    static Map<String, String> header(List<String> comments) {
        if (comments.isEmpty() || !comments.get(0).strip().equals(MAGIC)) return null;
        Map<String, String> out = new LinkedHashMap<>();
        for (String c : comments.subList(1, comments.size())) {
            String t = c.replaceFirst("^#\\s*", "");
            int colon = t.indexOf(':');
            if (colon > 0) out.put(t.substring(0, colon).strip(), t.substring(colon + 1).strip());
        }
        return out;
    }

    /** Strata labels in order of first appearance, and each position's stratum index. */
    private record Strata(List<String> labels, int[] sizes, int[] stratumOf) {
        static Strata of(List<String> strata) {
            Map<String, Integer> index = new LinkedHashMap<>();
            int[] of = new int[strata.size()];
            for (int i = 0; i < of.length; i++) of[i] = index.computeIfAbsent(strata.get(i), k -> index.size());
            int[] sizes = new int[index.size()];
            for (int s : of) sizes[s]++;
            return new Strata(List.copyOf(index.keySet()), sizes, of);
        }
    }
}
