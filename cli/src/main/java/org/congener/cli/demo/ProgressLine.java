package org.congener.cli.demo;

import java.io.PrintStream;

/** Prints "label: 40% (2,000/5,000)" each time another tenth of the work is done. */
public final class ProgressLine {

    private final PrintStream out;
    private final String label;
    private final long total;
    private int lastTenth = -1;

    public ProgressLine(PrintStream out, String label, long total) {
        this.out = out;
        this.label = label;
        this.total = total;
    }

    public synchronized void update(long done) {
        int tenth = total == 0 ? 10 : (int) Math.min(10, done * 10 / total);
        if (tenth > lastTenth) {
            lastTenth = tenth;
            out.printf("  %s: %3d%% (%,d/%,d)%n", label, tenth * 10, done, total);
            out.flush();
        }
    }
}
