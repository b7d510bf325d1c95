package org.assay.pdf;

import java.nio.file.Path;
import java.util.List;
import java.util.TreeSet;
import org.assay.common.UserInputException;

/** Pages chosen with {@code --pages}, such as "3", "2-5" or "1,4-6", 1-based and inclusive. */
public record PageSelection(String text) {

    public static PageSelection parse(String text) {
        if (text == null || !text.strip().matches("\\d+(\\s*-\\s*\\d+)?(\\s*,\\s*\\d+(\\s*-\\s*\\d+)?)*")) {
            throw UserInputException.usage("--pages '" + text + "' is not a page list", "write pages like 3, 2-5 or 1,4-6");
        }
        return new PageSelection(text.strip());
    }

    static List<Integer> all(int count) {
        return java.util.stream.IntStream.rangeClosed(1, count).boxed().toList();
    }

    /** The selected pages in order, each checked against the document's page count. */
    List<Integer> resolve(int count, Path file) {
        TreeSet<Integer> pages = new TreeSet<>();
        for (String part : text.split(",")) {
            String[] ends = part.strip().split("\\s*-\\s*");
            int from = Integer.parseInt(ends[0]);
            int to = ends.length > 1 ? Integer.parseInt(ends[1]) : from;
            if (from < 1 || to < from || to > count) {
                throw new UserInputException(file, null, "--pages " + part.strip() + " is outside the document's "
                        + count + " pages", "choose pages between 1 and " + count);
            }
            for (int p = from; p <= to; p++) pages.add(p);
        }
        return List.copyOf(pages);
    }
}
