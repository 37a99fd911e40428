package org.modetrail.trackbench;

import org.modetrail.model.Box;

/**
 * One single-object tracker behind the benchmark's one interface: Modetrail's and the outside references (BoofCV,
 * OpenCV). Pixels arrive in Modetrail's layout, packed {@code 0xFFRRGGBB} row-major; each adapter converts them into
 * its own image type in {@link #load}, which the benchmark does not time, so {@link #start} and {@link #track} time
 * the trackers' own work and not our layout conversion.
 */
public interface BoxTracker extends AutoCloseable {
    String name();

    /** Converts one frame into the tracker's own image type, into buffers it reuses. Not timed. */
    void load(int[] rgb, int width, int height);

    /** Starts on the object inside {@code box} of the frame last loaded. */
    void start(Box box);

    /**
     * Tracks into the frame last loaded; returns the box it reports there, or null for "no box this frame" (a
     * tracker that reports failure on this frame, as OpenCV's {@code update} returning false or BoofCV's
     * {@code process} returning false). Modetrail's adapter and CamShift never return null: after a loss they
     * repeat their last box, and {@link #working} says so.
     */
    Box track();

    /**
     * False once the tracker has given up and {@link #track} only repeats its last box: such frames are not timed,
     * so a tracker that stopped is not credited with free frames.
     */
    default boolean working() {
        return true;
    }

    @Override
    default void close() {
    }
}
