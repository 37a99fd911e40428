package org.modetrail.model;

/** Where a frame's annotation came from. */
public enum BoxSource {
    /** Set by the user: the tracker never changes it. */
    KEYFRAME,
    /** Found by the tracker. */
    TRACKED,
    /** Filled in between two known boxes by linear interpolation. */
    INTERPOLATED
}
