package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicLong;
import org.assay.common.Progress;
import org.junit.jupiter.api.Test;

/**
 * Progress reaches stderr only through a terminal display, never changes stdout, and is absent
 * when no terminal is attached. The terminal is injected with a clock that moves 1.1 s per
 * reading, so every step looks long enough to show.
 */
class ProgressCommandTest {
    private static final String[] MEASURE = {"measure", file(), "--metric", "macro_f1,roc_auc", "--interval", "bca",
        "--resamples", "2000", "--seed", "5", "--threads", "2", "--format", "json"};

    private static String file() {
        try {
            return Path.of(ProgressCommandTest.class.getResource("/reference/measure_binary.csv").toURI()).toString();
        } catch (java.net.URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private static CliRun run(Progress progress, StringWriter err, String... args) {
        StringWriter out = new StringWriter();
        int code = Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true), progress);
        return new CliRun(code, out.toString(), err.toString());
    }

    @Test
    void withoutATerminalNothingIsShown() {
        StringWriter err = new StringWriter();
        AtomicLong clock = new AtomicLong();
        Progress none = Main.progressFor(false, new PrintWriter(err, true), () -> clock.addAndGet(1_100_000_000L));
        assertThat(none).isSameAs(Progress.NONE);
        CliRun run = run(none, err, MEASURE);
        assertThat(run.exitCode()).isZero();
        assertThat(run.err()).isEmpty();
    }

    @Test
    void onATerminalStepsShowAndClearWithoutChangingStdout() {
        CliRun plain = CliRun.of(MEASURE);
        StringWriter err = new StringWriter();
        AtomicLong clock = new AtomicLong();
        Progress terminal = Main.progressFor(true, new PrintWriter(err, true), () -> clock.addAndGet(1_100_000_000L));
        assertThat(terminal).isInstanceOf(TerminalProgress.class);
        CliRun shown = run(terminal, err, MEASURE);

        assertThat(shown.exitCode()).isZero();
        assertThat(shown.out()).isEqualTo(plain.out());   // same results, same bytes
        assertThat(shown.err())
                .contains("\rreading measure_binary.csv: ")
                .contains("\rresampling macro_f1: ")
                .contains("\rresampling roc_auc: 100%")
                .doesNotContain("\n")
                .endsWith("\r");
        // every line drawn is blanked before the command ends: the last write is the clearing one
        String last = shown.err().substring(shown.err().lastIndexOf('\r', shown.err().length() - 2));
        assertThat(last.strip()).isEmpty();
    }

    @Test
    void extractShowsItsPages() throws Exception {
        Path pdf = Path.of(ProgressCommandTest.class.getResource("/pdf/long-20pages.pdf").toURI());
        StringWriter err = new StringWriter();
        AtomicLong clock = new AtomicLong();
        Progress terminal = Main.progressFor(true, new PrintWriter(err, true), () -> clock.addAndGet(1_100_000_000L));
        Path out = java.nio.file.Files.createTempDirectory("assay-progress").resolve("claims.yaml");
        CliRun run = run(terminal, err, "extract", pdf.toString(), "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isIn(0, 1);
        assertThat(run.err()).contains("\rreading pages of " + pdf.getFileName() + ": ");
    }
}
