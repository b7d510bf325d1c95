package org.assay.pdf;

import org.assay.common.Limit;

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
    public static final PdfLimits DEFAULT = new PdfLimits(Limit.PDF_BYTES.defaultValue(), 32L << 20,
            (int) Limit.PDF_PAGES.defaultValue(), Limit.PDF_OPERATORS.defaultValue(), Limit.PDF_PAGE_MILLIS.defaultValue());

    /** The limits in force for the running command (the defaults unless --limit changed them). */
    public static PdfLimits current() {
        return new PdfLimits(Limit.PDF_BYTES.value(), DEFAULT.inMemoryBytes(), Limit.PDF_PAGES.intValue(),
                Limit.PDF_OPERATORS.value(), Limit.PDF_PAGE_MILLIS.value());
    }
}
