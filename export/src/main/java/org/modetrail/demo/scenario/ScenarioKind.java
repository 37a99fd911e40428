package org.modetrail.demo.scenario;

/**
 * The difficulty a tracking scenario exercises. Each clip isolates one difficulty so that a tracker's score on it
 * says what the tracker copes with; the figures below are for the default 640 x 480 frame and scale with its size.
 */
public enum ScenarioKind {

    /** A textured reddish object of 60 x 40 px gliding at 2 to 5 px per frame over a textured floor. */
    TRANSLATION,

    /** The same object jumping 15 to 25 px per frame, changing direction abruptly every few frames. */
    FAST_MOTION,

    /** The object approaching and receding while it moves: 60 x 40 grows to 84 x 56, shrinks to 36 x 24, returns. */
    SCALE_CHANGE,

    /** A floor scattered with reddish and brownish blotches of the object's size that the object passes over. */
    CLUTTER,

    /** The object passes behind an opaque slate-grey post and is fully hidden for exactly 10 frames. */
    OCCLUSION,

    /**
     * Two objects of one colour family cross twice: first the target (object 0) passes under the other, later over
     * it. Truth is given for both.
     */
    CROSSING,

    /** A small dark object of 24 x 16 px on a pale floor. */
    SMALL_DARK,

    /** Illumination dims from 1.0 to 0.6 and shifts from warm to cool over the clip while the object moves. */
    LIGHTING_DRIFT;

    /** Lower-case name for file names and table rows, e.g. {@code fast-motion}. */
    public String slug() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
