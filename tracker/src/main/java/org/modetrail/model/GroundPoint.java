package org.modetrail.model;

/** One correspondence the user gave for calibration: a point on the image and where it lies on the ground. */
public record GroundPoint(PixelPoint image, WorldPoint world) {
    public GroundPoint {
        if (image == null || world == null) {
            throw new IllegalArgumentException("a calibration point needs an image point and a ground point");
        }
    }
}
