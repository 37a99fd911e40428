package org.modetrail.picture;

/** Where a series' colour comes from. */
public enum ColourBy {
    /** The colour of the track's object class, as the project gives it; tracks of one class share it. */
    CLASS,
    /** One colour per track from the colour-blind-safe {@link Palette}, in the order of the tracks. */
    TRACK
}
