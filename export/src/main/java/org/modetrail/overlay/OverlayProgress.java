package org.modetrail.overlay;

/** Told after each frame written; called on the writing thread. */
@FunctionalInterface
public interface OverlayProgress {
    OverlayProgress NONE = (done, total) -> { };

    /**
     * @param framesDone frames encoded so far
     * @param total      frames the run will write
     */
    void update(int framesDone, int total);
}
