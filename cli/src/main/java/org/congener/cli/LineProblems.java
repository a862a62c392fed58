package org.congener.cli;

import java.io.PrintWriter;
import java.nio.file.Path;

/** Reports skipped input lines on stderr as {@code command: file:line: problem} and counts them. */
final class LineProblems {
    private final PrintWriter err;
    private final String command;
    private int count;

    LineProblems(PrintWriter err, String command) {
        this.err = err;
        this.command = command;
    }

    void report(Path file, int line, String problem) {
        count++;
        err.println(command + ": " + file + ":" + line + ": " + problem);
        err.flush();
    }

    void reportFile(Path file, String problem) {
        count++;
        err.println(command + ": " + file + ": " + problem);
        err.flush();
    }

    int count() {
        return count;
    }
}
