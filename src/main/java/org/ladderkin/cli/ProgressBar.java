package org.ladderkin.cli;

import java.io.PrintWriter;
import org.ladderkin.plan.Planner;

/**
 * A one-line progress bar on standard error, shown only once a job has run for a second and only on a terminal,
 * so scripts and logs stay clean.
 */
final class ProgressBar implements Planner.Progress {

    private static final int WIDTH = 30;
    private final PrintWriter err;
    private final long startNanos = System.nanoTime();
    private final boolean terminal = System.console() != null;
    private boolean shown;

    ProgressBar(PrintWriter err) {
        this.err = err;
    }

    @Override
    public synchronized void step(int done, int total, String what) {
        if (!terminal || System.nanoTime() - startNanos < 1_000_000_000L) {
            return;
        }
        int filled = total == 0 ? WIDTH : WIDTH * done / total;
        err.print("\r[" + "#".repeat(filled) + " ".repeat(WIDTH - filled) + "] " + what + "          ");
        if (done >= total) {
            err.println();
        }
        err.flush();
        shown = true;
    }

    boolean shown() {
        return shown;
    }
}
