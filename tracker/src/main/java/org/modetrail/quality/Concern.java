package org.modetrail.quality;

/**
 * A place in a track a user should look at.
 *
 * @param kind  what is odd there
 * @param from  first frame
 * @param to    last frame (inclusive)
 * @param value the figure behind it: the mean similarity of a weak span, the jump in box diagonals, the area ratio (for a drift:
 *              the largest ratio, either way, to the nearest keyframe's area)
 */
public record Concern(Kind kind, int from, int to, double value) {
    /** Kinds of concern, most telling first. */
    public enum Kind {
        /** The box moves further between two frames than the object plausibly can. */
        JUMP,
        /** The box's area changes abruptly between two frames. */
        SIZE_CHANGE,
        /**
         * A run of tracked frames whose box is far larger or smaller than the box the user gave at the nearest
         * keyframe: a box that grew over neighbours step by step (each step too small to be abrupt), or an object
         * that really came much nearer or went much further away.
         */
        SIZE_DRIFT,
        /** A run of tracked frames with low similarity: the tracker was unsure. */
        WEAK_SPAN
    }
}
