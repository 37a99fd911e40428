package org.modetrail.run;

/** Told how far a run has got; the command line prints a bar, the editor shows a strip. */
@FunctionalInterface
public interface RunProgress {
    RunProgress NONE = (done, total) -> { };

    /** {@code done} of {@code total} frame visits are finished (both passes count). */
    void frames(long done, long total);
}
