package org.modetrail.model;

/** A point on the image in pixels: x to the right, y down, from the top-left corner of the frame. */
public record PixelPoint(double x, double y) {
    public PixelPoint {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("a pixel point needs finite coordinates, got " + x + ", " + y);
        }
    }
}
