package org.modetrail.model;

/**
 * One track's annotation on one frame.
 *
 * @param frame    0-based frame index
 * @param presence visible (with a box), hidden or absent
 * @param box      the bounding box when visible, null otherwise
 * @param source   who set it: the user (keyframe), the tracker, or interpolation
 * @param score    the tracker's similarity (Bhattacharyya coefficient) 0..1; 1 for keyframes, 0 where unknown
 */
public record FrameAnnotation(int frame, Presence presence, Box box, BoxSource source, double score) {

    public FrameAnnotation {
        if (frame < 0) {
            throw new IllegalArgumentException("frame must be 0 or more, got " + frame);
        }
        if (presence == null || source == null) {
            throw new IllegalArgumentException("presence and source are required");
        }
        if ((presence == Presence.VISIBLE) != (box != null)) {
            throw new IllegalArgumentException("a box goes with VISIBLE and only with it (frame " + frame + ")");
        }
        if (!(score >= 0 && score <= 1)) {
            throw new IllegalArgumentException("score must be in [0, 1], got " + score);
        }
    }

    /** A user's box on a frame. */
    public static FrameAnnotation keyframe(int frame, Box box) {
        return new FrameAnnotation(frame, Presence.VISIBLE, box, BoxSource.KEYFRAME, 1);
    }

    /** A user's mark that the object is hidden (or absent) on a frame. */
    public static FrameAnnotation markedBy(int frame, Presence presence) {
        if (presence == Presence.VISIBLE) {
            throw new IllegalArgumentException("a mark without a box is for HIDDEN or ABSENT");
        }
        return new FrameAnnotation(frame, presence, null, BoxSource.KEYFRAME, 1);
    }

    public static FrameAnnotation tracked(int frame, Box box, double score) {
        return new FrameAnnotation(frame, Presence.VISIBLE, box, BoxSource.TRACKED, score);
    }

    public static FrameAnnotation interpolated(int frame, Box box) {
        return new FrameAnnotation(frame, Presence.VISIBLE, box, BoxSource.INTERPOLATED, 0);
    }

    /** Set by the user, so never replaced by tracking or interpolation. */
    public boolean isKeyframe() {
        return source == BoxSource.KEYFRAME;
    }

    public boolean isVisible() {
        return presence == Presence.VISIBLE;
    }

    public FrameAnnotation atFrame(int newFrame) {
        return new FrameAnnotation(newFrame, presence, box, source, score);
    }
}
