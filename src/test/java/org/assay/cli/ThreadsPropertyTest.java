package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code -Dassay.threads} sets the worker threads when {@code --threads} is not given. Results must not depend on
 * the thread count (DESIGN.md principle 5; common practice for seeded resampling), and a value that is not a
 * thread count stops the run with one line instead of being ignored.
 */
class ThreadsPropertyTest {
    @TempDir Path tmp;

    private Path regressionFile() throws Exception {
        StringBuilder csv = new StringBuilder("id,target,prediction\n");
        for (int i = 0; i < 300; i++) {
            csv.append("r").append(i).append(',').append(i % 17).append(',').append((i * 7) % 19).append('\n');
        }
        return Files.writeString(tmp.resolve("r.csv"), csv.toString());
    }

    private static CliRun withProperty(String value, String... args) {
        String before = System.getProperty("assay.threads");
        System.setProperty("assay.threads", value);
        try {
            return CliRun.of(args);
        } finally {
            if (before == null) System.clearProperty("assay.threads");
            else System.setProperty("assay.threads", before);
        }
    }

    @Test
    void thePropertyGivesTheSameIntervalsAsTheOption() throws Exception {
        Path file = regressionFile();
        String[] args = {"measure", file.toString(), "--task", "regression", "--metric", "mae,rmse",
                "--interval", "bca", "--resamples", "500", "--format", "json"};
        CliRun one = withProperty("1", args);
        assertThat(one.exitCode()).as(one.err()).isZero();
        String[] withOption = java.util.Arrays.copyOf(args, args.length + 2);
        withOption[args.length] = "--threads";
        withOption[args.length + 1] = "2";
        CliRun two = CliRun.of(withOption);
        assertThat(two.exitCode()).as(two.err()).isZero();
        // the JSON names the command line; compare the measured results only
        String oneResults = one.out().replaceAll("(?s)\"command\".*?\\n", "").replaceAll("(?s)\"arguments\"\\s*:\\s*\\[.*?\\]", "");
        String twoResults = two.out().replaceAll("(?s)\"command\".*?\\n", "").replaceAll("(?s)\"arguments\"\\s*:\\s*\\[.*?\\]", "");
        assertThat(oneResults).contains("\"mae\"").isEqualTo(twoResults);
    }

    @Test
    void aValueThatIsNotAThreadCountIsOneClearLine() throws Exception {
        Path file = regressionFile();
        for (String bad : new String[] {"four", "0", "-2", ""}) {
            CliRun run = withProperty(bad, "measure", file.toString(), "--task", "regression", "--metric", "mae",
                    "--resamples", "100");
            assertThat(run.exitCode()).as("assay.threads=" + bad).isEqualTo(2);
            assertThat(run.errLines()).hasSize(1);
            assertThat(run.err()).contains("assay.threads is \"" + bad + "\"").contains("--threads")
                    .doesNotContain("Exception");
        }
    }

    @Test
    void threadsBelowOneIsAUsageError() throws Exception {
        Path file = regressionFile();
        CliRun run = CliRun.of("measure", file.toString(), "--task", "regression", "--metric", "mae",
                "--resamples", "100", "--threads", "0");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("--threads 0 is not a number of threads");
    }
}
