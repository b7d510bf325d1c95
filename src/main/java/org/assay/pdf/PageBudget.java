package org.assay.pdf;

import java.io.IOException;
import org.assay.common.Limit;

/**
 * Guards against hostile content streams: a page may run at most so many operators and so
 * many milliseconds, so a looping or bloated stream ends with a clear error instead of a hang.
 */
final class PageBudget {
    /** Thrown from inside PDFBox's stream processing; caught and reported by the document reader. */
    static final class Exceeded extends IOException {
        private final transient Limit limit;
        Exceeded(String what, Limit limit) {
            super(what);
            this.limit = limit;
        }
        /** The limit that ran out, for the option that raises it. */
        Limit limit() { return limit; }
    }

    private final long maxOperators;
    private final long deadlineNanos;
    private long operators;

    PageBudget(long maxOperators, long millis) {
        this.maxOperators = maxOperators;
        this.deadlineNanos = System.nanoTime() + millis * 1_000_000L;
    }

    /** Called once per content-stream operator. */
    void tick() throws Exceeded {
        operators++;
        if (operators > maxOperators) throw new Exceeded("more than " + maxOperators + " drawing operators", Limit.PDF_OPERATORS);
        // The clock is read every 1024 operators: cheap, and still stops a loop within milliseconds.
        if ((operators & 1023) == 0 && System.nanoTime() > deadlineNanos) throw new Exceeded("the page time budget", Limit.PDF_PAGE_MILLIS);
    }
}
