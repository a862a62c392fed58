package org.congener.trainer.evaluation;

import java.io.PrintStream;

/** A one-line text progress bar on a terminal stream (carriage return, no new lines until done). */
public final class Progress {
    private static final int WIDTH = 30;
    private final PrintStream out;
    private final int total;
    private int done;

    public Progress(PrintStream out, int total) {
        this.out = out;
        this.total = Math.max(1, total);
    }

    public static Progress silent() {
        return new Progress(new PrintStream(java.io.OutputStream.nullOutputStream()), 1);
    }

    /** Marks one more step done and redraws the bar with {@code label}. */
    public synchronized void step(String label) {
        done = Math.min(total, done + 1);
        int filled = done * WIDTH / total;
        out.print("\r[" + "#".repeat(filled) + ".".repeat(WIDTH - filled) + "] " + done + "/" + total + " "
                + String.format("%-40s", label));
        if (done == total) {
            out.println();
        }
        out.flush();
    }

    public synchronized void finish() {
        if (done < total) {
            done = total - 1;
            step("done");
        }
    }
}
