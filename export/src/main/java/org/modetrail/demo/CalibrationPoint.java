package org.modetrail.demo;

/**
 * A ground point seen in the image: where it is in the world (on the ground, {@code z = 0}) and where the exact
 * camera model puts it in the image (continuous coordinates, pixel column {@code i} spanning {@code [i, i+1)}).
 */
public record CalibrationPoint(String name, double uPx, double vPx, double xM, double yM) {

    public CalibrationPoint {
        if (name == null || name.isBlank() || name.contains(",")) {
            throw new IllegalArgumentException("point name must be a non-blank word without commas");
        }
    }
}
