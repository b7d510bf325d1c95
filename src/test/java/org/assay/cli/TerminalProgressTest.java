package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.AtomicLong;
import org.assay.common.Progress;
import org.junit.jupiter.api.Test;

/** The terminal progress line, driven by a clock the test moves. */
class TerminalProgressTest {
    private final StringWriter screen = new StringWriter();
    private final AtomicLong now = new AtomicLong();
    private final TerminalProgress progress = new TerminalProgress(new PrintWriter(screen), now::get);

    @Test
    void aStepShorterThanASecondPrintsNothing() {
        try (Progress.Task task = progress.start("reading small.csv", 100)) {
            now.set(900_000_000L);
            task.advance(100);
        }
        assertThat(screen.toString()).isEmpty();
    }

    @Test
    void aLongStepRewritesOneLineAndClearsItAtTheEnd() {
        try (Progress.Task task = progress.start("resampling macro_f1", 10_000)) {
            now.set(500_000_000L);
            task.advance(1_000);                 // before a second: nothing yet
            assertThat(screen.toString()).isEmpty();
            now.set(1_100_000_000L);
            task.advance(3_200);                 // 42%
            assertThat(screen.toString()).isEqualTo("\rresampling macro_f1: 42%");
            now.set(1_150_000_000L);
            task.advance(100);                   // within 200 ms of the last redraw: not redrawn
            assertThat(screen.toString()).isEqualTo("\rresampling macro_f1: 42%");
            now.set(1_400_000_000L);
            task.advance(5_700);                 // 100%
        }
        String line = "resampling macro_f1: 100%";
        assertThat(screen.toString()).isEqualTo("\rresampling macro_f1: 42%" + "\r" + line
                + "\r" + " ".repeat(line.length()) + "\r");
        assertThat(screen.toString()).doesNotContain("\n");
    }

    @Test
    void aShorterLineCoversTheLongerOneBeforeIt() {
        String first = "reading a-rather-long-file-name.csv: 123,456";   // unknown total: a count
        try (Progress.Task outer = progress.start("reading a-rather-long-file-name.csv", 0)) {
            now.set(2_000_000_000L);
            outer.advance(123_456);
            try (Progress.Task inner = progress.start("pages", 4)) {
                now.set(4_000_000_000L);
                inner.advance(1);
            }
        }
        String second = "pages: 25%";
        assertThat(screen.toString()).isEqualTo("\r" + first
                + "\r" + second + " ".repeat(first.length() - second.length())
                + "\r" + " ".repeat(second.length()) + "\r");
    }
}
