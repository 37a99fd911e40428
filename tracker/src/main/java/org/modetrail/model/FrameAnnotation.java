package org.modetrail.model;

/**
 * One track's annotation on one frame.
 *
 * @param frame         0-based frame index
 * @param presence      visible (with a box), hidden or absent
 * @param box           the bounding box when visible, null otherwise
 * @param source        who set it: the user (keyframe), the tracker, or interpolation
 * @param score         the tracker's similarity (Bhattacharyya coefficient) 0..1; 1 for keyframes, 0 where unknown
 * @param uncertaintyPx one standard uncertainty, per image axis, of where the box's edges are, in pixels: the
 *                      uncertainty of its centre and half that of its size, combined in quadrature, so it covers
 *                      any ground contact point on the box (the bottom centre moves with the box's height error);
 *                      see org.modetrail.run.SpanFill for how tracked and interpolated frames get it. NaN where not
 *                      known (files and imports that do not say); only a box has one
 */
public record FrameAnnotation(int frame, Presence presence, Box box, BoxSource source, double score,
                              double uncertaintyPx) {

    /**
     * How far a user's box edge may be from where the object's edge is, one standard uncertainty per axis: 1 px.
     * Common practice, no source: a box dragged at a zoom where single pixels show is within about a pixel of the
     * edge the user means; whole-pixel rounding alone is 0.29 px (a uniform error over one pixel, 1 / sqrt 12).
     */
    public static final double KEYFRAME_UNCERTAINTY_PX = 1.0;

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
        if (!Double.isNaN(uncertaintyPx) && !(uncertaintyPx >= 0 && uncertaintyPx < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("the uncertainty must be 0 or more pixels (NaN where not known), got "
                    + uncertaintyPx + " (frame " + frame + ")");
        }
        if (box == null && !Double.isNaN(uncertaintyPx)) {
            throw new IllegalArgumentException("an uncertainty goes with a box; a hidden or absent mark has none"
                    + " (frame " + frame + ")");
        }
    }

    /** An annotation whose uncertainty is not known (NaN). */
    public FrameAnnotation(int frame, Presence presence, Box box, BoxSource source, double score) {
        this(frame, presence, box, source, score, Double.NaN);
    }

    /** A user's box on a frame, with the user's placement uncertainty {@link #KEYFRAME_UNCERTAINTY_PX}. */
    public static FrameAnnotation keyframe(int frame, Box box) {
        return new FrameAnnotation(frame, Presence.VISIBLE, box, BoxSource.KEYFRAME, 1, KEYFRAME_UNCERTAINTY_PX);
    }

    /** A user's mark that the object is hidden (or absent) on a frame. */
    public static FrameAnnotation markedBy(int frame, Presence presence) {
        if (presence == Presence.VISIBLE) {
            throw new IllegalArgumentException("a mark without a box is for HIDDEN or ABSENT");
        }
        return new FrameAnnotation(frame, presence, null, BoxSource.KEYFRAME, 1);
    }

    /** A tracker's box whose uncertainty is not known. */
    public static FrameAnnotation tracked(int frame, Box box, double score) {
        return tracked(frame, box, score, Double.NaN);
    }

    public static FrameAnnotation tracked(int frame, Box box, double score, double uncertaintyPx) {
        return new FrameAnnotation(frame, Presence.VISIBLE, box, BoxSource.TRACKED, score, uncertaintyPx);
    }

    /** An interpolated box whose uncertainty is not known. */
    public static FrameAnnotation interpolated(int frame, Box box) {
        return interpolated(frame, box, Double.NaN);
    }

    public static FrameAnnotation interpolated(int frame, Box box, double uncertaintyPx) {
        return new FrameAnnotation(frame, Presence.VISIBLE, box, BoxSource.INTERPOLATED, 0, uncertaintyPx);
    }

    /** Set by the user, so never replaced by tracking or interpolation. */
    public boolean isKeyframe() {
        return source == BoxSource.KEYFRAME;
    }

    public boolean isVisible() {
        return presence == Presence.VISIBLE;
    }

    /** Whether the box's uncertainty is known. */
    public boolean hasUncertainty() {
        return !Double.isNaN(uncertaintyPx);
    }

    public FrameAnnotation atFrame(int newFrame) {
        return new FrameAnnotation(newFrame, presence, box, source, score, uncertaintyPx);
    }
}
