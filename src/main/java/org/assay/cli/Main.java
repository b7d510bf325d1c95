package org.assay.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.util.Properties;
import java.util.function.LongSupplier;
import org.assay.common.Limits;
import org.assay.common.Progress;
import org.assay.common.UserInputException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The {@code assay} command. Exit codes (DESIGN.md): 0 done; 1 done and a --fail-on condition
 * met; 2 bad usage or bad input (one line on stderr); 3 internal error.
 */
@Command(name = "assay",
        mixinStandardHelpOptions = true,
        versionProvider = Main.Version.class,
        description = {
            "Audits reported machine-learning results: recomputes each claimed metric from your "
                + "per-example predictions with an interval, and says claim by claim whether your "
                + "reproduction is consistent with the printed value.",
            ""},
        subcommands = {AuditCommand.class, CheckCommand.class, ExtractCommand.class, MeasureCommand.class, PlanCommand.class, SampleCommand.class, InitCommand.class,
                DemoCommand.class,
                CommandLine.HelpCommand.class},
        footer = {"", "Run 'assay COMMAND --help' for a command's options and examples."})
public final class Main implements Runnable {
    public static final int DONE = 0;
    public static final int FAIL_ON_MET = 1;
    public static final int BAD_INPUT = 2;
    public static final int INTERNAL = 3;

    @Option(names = "--debug", scope = CommandLine.ScopeType.INHERIT,
            description = "Print stack traces for errors.")
    boolean debug;

    @Option(names = "--limit", scope = CommandLine.ScopeType.INHERIT, paramLabel = "NAME=VALUE",
            description = "Raise (or lower) one of the limits that protect against hostile files, for a "
                    + "genuinely larger input: file-bytes, line-chars, rows, columns, depth, claims-bytes, "
                    + "yaml-aliases, yaml-values, pdf-bytes, pdf-pages, pdf-operators, pdf-page-millis, "
                    + "template-bytes. Values take k, M, G suffixes. Repeatable.")
    java.util.Map<String, String> limits;

    @CommandLine.Spec CommandLine.Model.CommandSpec spec;

    /** Where long steps report progress: a terminal line, or nothing (see {@link #progressFor}). */
    private Progress progress = Progress.NONE;

    /** The progress display the commands pass down to the work. */
    Progress progress() { return progress; }

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "name a command (audit, check, extract, measure, plan, sample, init, demo)");
    }

    public static void main(String[] args) {
        PrintWriter err = new PrintWriter(System.err, true);
        System.exit(execute(args, new PrintWriter(System.out, true), err,
                progressFor(System.console() != null, err, System::nanoTime)));
    }

    /**
     * Progress lines only on a terminal: {@code System.console()} is non-null only when the process
     * talks to one (neither output redirected), so files, pipes and tests never get them.
     */
    static Progress progressFor(boolean terminal, PrintWriter err, LongSupplier clock) {
        return terminal ? new TerminalProgress(err, clock) : Progress.NONE;
    }

    /**
     * The limits the command line sets with {@code --limit}, wherever on the line it stands
     * (before or after the command name). A bad name or value is a usage error.
     */
    private static Limits limitsOf(CommandLine.ParseResult parsed) {
        java.util.Map<String, String> settings = new java.util.LinkedHashMap<>();
        for (CommandLine.ParseResult p = parsed; p != null; p = p.subcommand()) {
            if (p.hasMatchedOption("--limit")) settings.putAll(p.matchedOptionValue("--limit", java.util.Map.of()));
        }
        try {
            return Limits.parse(settings);
        } catch (UserInputException e) {
            throw new CommandLine.ParameterException(parsed.commandSpec().commandLine(), e.oneLine());
        }
    }

    /** Runs the command line and returns the exit code, with no progress display; used by the tests. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        return execute(args, out, err, Progress.NONE);
    }

    /** Runs the command line and returns the exit code; long steps report to {@code progress}. */
    static int execute(String[] args, PrintWriter out, PrintWriter err, Progress progress) {
        Main main = new Main();
        main.progress = progress;
        CommandLine cl = new CommandLine(main);
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, line, parsed) -> {
            boolean debug = java.util.Arrays.asList(args).contains("--debug");
            if (ex instanceof UserInputException u) {
                err.println("assay: " + u.oneLine());
                if (debug) ex.printStackTrace(err);
                err.flush();
                return BAD_INPUT;
            }
            err.println("assay: internal error: " + ex + (debug ? "" : " (run with --debug for details)"));
            if (debug) ex.printStackTrace(err);
            err.flush();
            return INTERNAL;
        });
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("assay: " + ex.getMessage() + " (see '" + ex.getCommandLine().getCommandName()
                    + " --help')");
            err.flush();
            return BAD_INPUT;
        });
        cl.setExecutionStrategy(parsed -> limitsOf(parsed).runWith(() -> new CommandLine.RunLast().execute(parsed)));
        int code = cl.execute(args);
        out.flush();
        return code;
    }

    static String version() {
        try (InputStream in = Main.class.getResourceAsStream("/assay.properties")) {
            Properties p = new Properties();
            if (in != null) p.load(in);
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            return "unknown";
        }
    }

    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"assay " + version(), "Java " + System.getProperty("java.version")};
        }
    }
}
