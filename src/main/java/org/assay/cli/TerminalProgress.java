package org.assay.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.LongSupplier;
import org.assay.common.Progress;

/**
 * Progress on a terminal: one line on stderr, rewritten in place after a carriage return
 * ("resampling macro_f1: 42%", or a count when the total is unknown) and blanked when the step ends. A step shows
 * only once it has run for {@link #SHOW_AFTER_NANOS}, so quick steps print nothing, and the line
 * is redrawn at most every {@link #REDRAW_NANOS}. Main uses it only when a console is attached.
 */
final class TerminalProgress implements Progress {
    static final long SHOW_AFTER_NANOS = 1_000_000_000L;
    static final long REDRAW_NANOS = 200_000_000L;

    private final PrintWriter err;
    private final LongSupplier clock;
    private int shownWidth;   // characters of the line now on screen, 0 when none

    /** @param clock nanoseconds, {@link System#nanoTime} outside tests */
    TerminalProgress(PrintWriter err, LongSupplier clock) {
        this.err = err;
        this.clock = clock;
    }

    @Override
    public Task start(String what, long total) {
        return new Step(what, total, clock.getAsLong());
    }

    private synchronized void draw(String line) {
        StringBuilder sb = new StringBuilder("\r").append(line);
        for (int i = line.length(); i < shownWidth; i++) sb.append(' ');   // cover a longer old line
        err.print(sb);
        err.flush();
        shownWidth = line.length();
    }

    private synchronized void clear() {
        if (shownWidth == 0) return;
        err.print("\r" + " ".repeat(shownWidth) + "\r");
        err.flush();
        shownWidth = 0;
    }

    private final class Step implements Task {
        private final String what;
        private final long total;
        private final long started;
        private final AtomicLong done = new AtomicLong();
        private volatile long lastDrawn = Long.MIN_VALUE;
        private volatile boolean shown;

        Step(String what, long total, long started) {
            this.what = what;
            this.total = total;
            this.started = started;
        }

        @Override
        public void advance(long units) {
            long now = done.addAndGet(units);
            long time = clock.getAsLong();
            if (time - started < SHOW_AFTER_NANOS || (shown && time - lastDrawn < REDRAW_NANOS)) return;
            synchronized (TerminalProgress.this) {
                if (shown && time - lastDrawn < REDRAW_NANOS) return;
                lastDrawn = time;
                shown = true;
                draw(line(now));
            }
        }

        private String line(long now) {
            if (total <= 0) return String.format(Locale.ROOT, "%s: %,d", what, now);
            return String.format(Locale.ROOT, "%s: %d%%", what, Math.min(100, now * 100 / total));
        }

        @Override
        public void close() {
            if (shown) clear();
        }
    }
}
