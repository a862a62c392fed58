package org.congener.cli;

import org.congener.broker.BrokerStartException;
import org.congener.streams.config.ConfigLoadException;
import picocli.CommandLine;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/** Turns a bad command line or a failed command into one line on standard error and a non-zero exit code. */
final class CliErrors {

    /** Exit code of a command line that could not be understood (unknown flag, bad value). */
    static final int USAGE = 2;
    /** Exit code of a command that started and failed (taken port, missing file, bad setting). */
    static final int FAILED = 1;

    private CliErrors() {
    }

    static int badCommandLine(ParameterException e, String[] args) {
        CommandLine command = e.getCommandLine();
        command.getErr().println("congener: " + e.getMessage() + " (see: "
                + command.getCommandSpec().qualifiedName() + " --help)");
        return USAGE;
    }

    static int failed(Exception e, CommandLine command, ParseResult parseResult) {
        command.getErr().println("congener " + command.getCommandName() + ": " + oneLine(e));
        return FAILED;
    }

    /** The user-facing exceptions already carry one clear line; others get their type named. */
    private static String oneLine(Throwable e) {
        String message = e.getMessage();
        if (e instanceof ConfigLoadException || e instanceof BrokerStartException) {
            return message;
        }
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof ConfigLoadException || t instanceof BrokerStartException) {
                return t.getMessage();
            }
        }
        if (message == null || message.isBlank()) {
            return e.getClass().getSimpleName();
        }
        int newline = message.indexOf('\n');
        return newline < 0 ? message : message.substring(0, newline);
    }
}
