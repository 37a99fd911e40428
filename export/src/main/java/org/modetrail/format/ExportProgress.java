package org.modetrail.format;

/** Told how far a long export has got; answers whether to go on. */
@FunctionalInterface
public interface ExportProgress {
    /** Never cancels and shows nothing. */
    ExportProgress NONE = (done, total) -> true;

    /**
     * @param done  steps finished (frames written, say)
     * @param total steps in all
     * @return true to go on, false to cancel the export
     */
    boolean update(int done, int total);
}
