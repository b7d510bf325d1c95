package org.assay.common;

/**
 * Where a long step (resampling, reading a large file, the pages of a PDF) reports how far it
 * has got. Passed down from the command to the code doing the work, never global. The command
 * line gives a terminal display only when one is attached; everywhere else it is {@link #NONE},
 * which does nothing, so progress can never reach a file, a test's output, or a result.
 */
public interface Progress {
    /** Reports nothing. */
    Progress NONE = (what, total) -> Task.NONE;

    /**
     * Starts a step named {@code what} (a few words: "reading preds.csv") of {@code total}
     * units, in whatever unit the step counts (bytes, resamples, pages); 0 when unknown.
     */
    Task start(String what, long total);

    /** One running step. Safe to advance from several threads. */
    interface Task extends AutoCloseable {
        /** Does nothing. */
        Task NONE = new Task() {
            @Override public void advance(long units) {}
            @Override public void close() {}
        };

        /** {@code units} more units are done. */
        void advance(long units);

        /** The step is over; a displayed line is cleared. */
        @Override void close();
    }
}
