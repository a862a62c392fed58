package org.congener.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

import picocli.CommandLine;

/** Runs {@code congener} in-process and keeps what it printed. */
record CliRun(int exitCode, String out, String err) {

    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine commandLine = new CommandLine(new CongenerMain());
        commandLine.setOut(new PrintWriter(out, true));
        commandLine.setErr(new PrintWriter(err, true));
        int code = commandLine.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }
}
