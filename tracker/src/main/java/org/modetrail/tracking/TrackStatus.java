package org.modetrail.tracking;

/** How sure the tracker is of a frame's box. */
public enum TrackStatus {
    /** Similarity above the confidence threshold. */
    TRACKED,
    /** Similarity low: the box is the prediction while the tracker searches around it (the object may be hidden). */
    COASTING,
    /**
     * The object was not seen for longer than the motion model can carry it, or it left the frame: no box is
     * trusted, and the tracker looks for it over a region that grows with the time lost ({@link ReDetection}).
     */
    SEARCHING,
    /**
     * Found again by the search after it was lost, on consistent evidence over several frames: the box is given, but
     * the frame should be checked by a person (an object that looks like this one may have been taken for it).
     */
    REACQUIRED,
    /** Similarity stayed low for too long (or the search gave up): the track ends at this frame. */
    LOST;

    /** Whether the step's box is the tracker's finding (tracked or re-acquired), not a prediction. */
    public boolean found() {
        return this == TRACKED || this == REACQUIRED;
    }
}
