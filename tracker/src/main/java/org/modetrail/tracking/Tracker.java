package org.modetrail.tracking;

import org.modetrail.model.Box;
import org.modetrail.video.Frame;

/**
 * Follows one object frame by frame from a box on one frame. Frames are fed in order, forward or backward in time;
 * the tracker keeps no reference to them between calls.
 */
public interface Tracker {
    /** Starts (or restarts) on the object inside {@code box} of {@code frame}. */
    void start(Frame frame, Box box);

    /** Finds the object in the next frame fed. After {@link TrackStatus#LOST} the tracker must be started again. */
    TrackStep track(Frame frame);
}
