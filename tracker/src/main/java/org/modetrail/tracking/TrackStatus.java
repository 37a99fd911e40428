package org.modetrail.tracking;

/** How sure the tracker is of a frame's box. */
public enum TrackStatus {
    /** Similarity above the confidence threshold. */
    TRACKED,
    /** Similarity low: the box is the prediction while the tracker searches around it (the object may be hidden). */
    COASTING,
    /** Similarity stayed low for too long: the track ends at this frame. */
    LOST
}
