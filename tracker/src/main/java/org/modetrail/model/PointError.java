package org.modetrail.model;

/**
 * How well the calibration fits one of its points.
 *
 * @param pixels distance in the image between the point the user clicked and where its ground point maps to
 * @param metres distance on the ground between the ground point the user gave and where its image point maps to
 * @param inlier whether the robust fit kept the point (outliers are reported, not used)
 */
public record PointError(double pixels, double metres, boolean inlier) {
    public PointError {
        if (!(pixels >= 0) || !(metres >= 0)) {
            throw new IllegalArgumentException("errors are distances, 0 or more: " + pixels + " px, " + metres + " m");
        }
    }
}
