package org.assay.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Runs the assay command line in-process and captures what it prints. */
record CliRun(int exitCode, String out, String err) {
    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new CliRun(code, out.toString(), err.toString());
    }

    /** stderr lines, without empty ones. */
    java.util.List<String> errLines() {
        return err.lines().filter(l -> !l.isBlank()).toList();
    }
}
