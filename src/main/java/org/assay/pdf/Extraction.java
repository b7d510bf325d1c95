package org.assay.pdf;

import java.nio.file.Path;
import java.util.List;

/**
 * What {@code extract} found in one PDF.
 *
 * @param pagesRead pages whose text was read
 * @param notes     tables seen but not extracted, with the reason (nothing is dropped silently)
 */
public record Extraction(Path file, String title, int pagesRead, List<ExtractedTable> tables, List<String> notes) {
    public Extraction {
        tables = List.copyOf(tables);
        notes = List.copyOf(notes);
    }
}
