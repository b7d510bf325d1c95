package org.assay.pdf;

/**
 * Limits against hostile or broken PDFs. The defaults let any real paper through (a long thesis
 * has a few hundred pages) and stop files built to exhaust memory or time.
 *
 * @param maxBytes          largest file read at all
 * @param inMemoryBytes     files larger than this are parsed with PDFBox's temp-file cache
 * @param maxPages          most pages a document may have
 * @param maxOperatorsPage  most content-stream operators on one page
 * @param millisPerPage     time budget for reading one page
 */
public record PdfLimits(long maxBytes, long inMemoryBytes, int maxPages, long maxOperatorsPage, long millisPerPage) {
    public static final PdfLimits DEFAULT = new PdfLimits(500L << 20, 32L << 20, 2_000, 5_000_000, 10_000);
}
