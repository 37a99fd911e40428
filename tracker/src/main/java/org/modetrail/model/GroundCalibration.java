package org.modetrail.model;

import java.util.List;

/**
 * The ground plane's calibration: the user's point pairs, the image-to-ground homography fitted to them, how well
 * each point fits, and the warnings the fit raised (points nearly collinear, large errors). Made by the calibration
 * code in export/; the model only keeps it.
 *
 * @param points     the user's correspondences, in the order given
 * @param imageToWorld the fitted map from image pixels to ground metres
 * @param errors     one per point, same order
 * @param rmsPixels  root mean square of the inliers' image errors
 * @param rmsMetres  root mean square of the inliers' ground errors
 * @param warnings   plain sentences for the user; empty when the fit looks sound
 */
public record GroundCalibration(List<GroundPoint> points, Homography imageToWorld, List<PointError> errors,
                                double rmsPixels, double rmsMetres, List<String> warnings) {
    public GroundCalibration {
        points = List.copyOf(points);
        errors = List.copyOf(errors);
        warnings = List.copyOf(warnings);
        if (points.size() < 4) {
            throw new IllegalArgumentException("a ground calibration needs at least 4 points, got " + points.size());
        }
        if (errors.size() != points.size()) {
            throw new IllegalArgumentException("one error per point: " + points.size() + " points, "
                    + errors.size() + " errors");
        }
        if (imageToWorld == null) {
            throw new IllegalArgumentException("a ground calibration needs its homography");
        }
        if (!(rmsPixels >= 0) || !(rmsMetres >= 0)) {
            throw new IllegalArgumentException("rms errors must be 0 or more");
        }
    }
}
