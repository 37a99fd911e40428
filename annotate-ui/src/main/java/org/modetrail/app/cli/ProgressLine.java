package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.util.Locale;

import org.modetrail.run.RunProgress;

/**
 * One line on stderr, rewritten in place at most five times a second: what is being done, frames done of all,
 * frames per second and time left. Commands use it only when stderr is a terminal.
 */
final class ProgressLine implements RunProgress {
    private final PrintWriter err;
    private final String label;
    private final long startNanos = System.nanoTime();
    private long lastPrint;

    ProgressLine(PrintWriter err, String label) {
        this.err = err;
        this.label = label;
    }

    /** A progress line when stderr is a terminal, else nothing. */
    static RunProgress forTerminal(PrintWriter err, String label) {
        return System.console() != null ? new ProgressLine(err, label) : RunProgress.NONE;
    }

    @Override
    public void frames(long done, long total) {
        long now = System.nanoTime();
        if (now - lastPrint < 200_000_000L && done < total) {
            return;
        }
        lastPrint = now;
        double seconds = (now - startNanos) / 1e9;
        double fps = seconds > 0 ? done / seconds : 0;
        double left = fps > 0 ? (total - done) / fps : 0;
        err.printf(Locale.ROOT, "\r%s: %d/%d frames, %.0f frames/s, %.0f s left   ", label, done, total, fps, left);
        err.flush();
    }

    /** Ends the line, if one was printed. */
    static void finish(RunProgress p, PrintWriter err) {
        if (p != RunProgress.NONE) {
            err.println();
        }
    }
}
