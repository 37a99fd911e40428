package org.modetrail.trackbench;

/**
 * The truth of one object over a whole clip, by frame.
 *
 * @param id     the object's id (the scenario's object index, or the truth file's track id)
 * @param frames its truth on every frame of the clip; a box of no area where it is out of view
 */
public record ObjectTruth(int id, TruthBox[] frames) {
    /** Truth less visible than this is neither scored nor judged (OTB's half-visible rule, as TrackMetrics). */
    public static final double MIN_VISIBLE = TrackMetrics.MIN_VISIBLE;

    public int frameCount() {
        return frames.length;
    }

    public TruthBox at(int frame) {
        return frames[frame];
    }

    /** In the frame at all (its box has an area). */
    public boolean inView(int frame) {
        return frames[frame].box().area() > 0;
    }

    /** Seen enough to be scored and judged: in view and at least half visible. */
    public boolean scored(int frame) {
        return inView(frame) && frames[frame].visible() >= MIN_VISIBLE;
    }

    /** The frame a user would draw its keyframe on: the first it is at least half visible; -1 if never. */
    public int start() {
        for (int f = 0; f < frames.length; f++) {
            if (scored(f)) {
                return f;
            }
        }
        return -1;
    }

    /** The last frame it is at least half visible on (after it, it has left for good); -1 if never. */
    public int lastScored() {
        for (int f = frames.length - 1; f >= 0; f--) {
            if (scored(f)) {
                return f;
            }
        }
        return -1;
    }
}
