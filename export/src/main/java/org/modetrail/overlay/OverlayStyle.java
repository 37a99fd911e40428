package org.modetrail.overlay;

/**
 * How tracks are drawn over the video. Every box and trail is stroked twice, first a wider halo of the opposite
 * lightness (black under light class colours, white under dark ones), then the class colour on top, so it
 * stands out on light and on dark footage alike. A box's line says where it came from:
 * keyframes (the user's boxes) are drawn thickest, tracked boxes with a plain line, interpolated ones dashed.
 *
 * @param trailLength       how many earlier frames the trail reaches back, 0 (no trail) to 10000; default 25
 * @param lineWidth         width of tracked and interpolated boxes and of trails in pixels, 0.5 to 50; default 2
 * @param keyframeLineWidth width of keyframe boxes, at least {@code lineWidth}, up to 50; default 4
 * @param fontSize          label text size in pixels, 6 to 200; default 13
 * @param showLabels        whether each box carries its track id and class on a filled tag; default true
 * @param trailPoint        which point of the box the trail follows; default the class's ground contact point
 */
public record OverlayStyle(int trailLength, float lineWidth, float keyframeLineWidth, int fontSize,
                           boolean showLabels, TrailPoint trailPoint) {

    public static final int DEFAULT_TRAIL = 25;
    public static final float DEFAULT_LINE = 2f;
    public static final float DEFAULT_KEYFRAME_LINE = 4f;
    public static final int DEFAULT_FONT = 13;

    /** The point of the box a trail follows. */
    public enum TrailPoint {
        /** The ground contact point of the track's class (bottom centre unless the class says otherwise). */
        CONTACT,
        /** The centre of the box. */
        CENTRE
    }

    public OverlayStyle {
        if (trailLength < 0 || trailLength > 10_000) {
            throw new IllegalArgumentException("trail length must be 0 to 10000 frames, got " + trailLength);
        }
        if (!(lineWidth >= 0.5f && lineWidth <= 50f)) {
            throw new IllegalArgumentException("line width must be 0.5 to 50 pixels, got " + lineWidth);
        }
        if (!(keyframeLineWidth >= lineWidth && keyframeLineWidth <= 50f)) {
            throw new IllegalArgumentException("keyframe line width must be from the line width (" + lineWidth
                    + ") to 50 pixels, got " + keyframeLineWidth);
        }
        if (fontSize < 6 || fontSize > 200) {
            throw new IllegalArgumentException("font size must be 6 to 200 pixels, got " + fontSize);
        }
        if (trailPoint == null) {
            trailPoint = TrailPoint.CONTACT;
        }
    }

    public static OverlayStyle defaults() {
        return new OverlayStyle(DEFAULT_TRAIL, DEFAULT_LINE, DEFAULT_KEYFRAME_LINE, DEFAULT_FONT, true,
                TrailPoint.CONTACT);
    }

    /** The defaults scaled for a frame {@code height} pixels high (they suit 480 to 600): thicker lines on 1080p. */
    public static OverlayStyle forFrameHeight(int height) {
        double s = Math.max(1, height / 540.0);
        return new OverlayStyle(DEFAULT_TRAIL, (float) (DEFAULT_LINE * s), (float) (DEFAULT_KEYFRAME_LINE * s),
                (int) Math.round(DEFAULT_FONT * s), true, TrailPoint.CONTACT);
    }

    public OverlayStyle withTrailLength(int frames) {
        return new OverlayStyle(frames, lineWidth, keyframeLineWidth, fontSize, showLabels, trailPoint);
    }

    public OverlayStyle withLineWidths(float line, float keyframeLine) {
        return new OverlayStyle(trailLength, line, keyframeLine, fontSize, showLabels, trailPoint);
    }

    public OverlayStyle withFontSize(int size) {
        return new OverlayStyle(trailLength, lineWidth, keyframeLineWidth, size, showLabels, trailPoint);
    }

    public OverlayStyle withLabels(boolean show) {
        return new OverlayStyle(trailLength, lineWidth, keyframeLineWidth, fontSize, show, trailPoint);
    }

    public OverlayStyle withTrailPoint(TrailPoint point) {
        return new OverlayStyle(trailLength, lineWidth, keyframeLineWidth, fontSize, showLabels, point);
    }
}
