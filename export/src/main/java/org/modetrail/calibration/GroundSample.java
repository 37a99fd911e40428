package org.modetrail.calibration;

import org.modetrail.model.WorldPoint;

/**
 * An object's place and motion on the ground at one frame ({@link GroundTrajectory}).
 *
 * @param frame          0-based frame index
 * @param timeS          the frame's time in seconds
 * @param raw            the contact point of the frame's box mapped to the ground, metres
 * @param smoothed       the Savitzky-Golay smoothed position; {@code raw} where the run is too short to smooth
 * @param speedMs        ground speed in m/s from the smoothing polynomial's first derivative; NaN where the run is too
 *                       short
 * @param headingDeg     direction of motion in degrees in [0, 360): 0 along +x of the ground frame, 90 along +y
 *                       (counter-clockwise seen from above, when +y is 90 degrees counter-clockwise of +x); NaN where the
 *                       speed is NaN or 0. Meaningless when the speed is within a few {@code speedSigmaMs} of 0.
 * @param positionSigmaM standard deviation per axis of {@code raw}, metres: the calibration's RMS image error and the
 *                       box's own uncertainty carried through the homography's local Jacobian, and the boxes' scatter
 *                       about the smoothed path (see {@link GroundTrajectory})
 * @param speedSigmaMs   standard deviation of the speed, m/s: each frame's image sigma carried through the Jacobian
 *                       along the direction of motion and through the derivative weights; it leaves out a
 *                       calibration error shared by neighbouring positions (see
 *                       {@link GroundTrajectory}); NaN where the speed is NaN. About 7 times larger on a run's first
 *                       and last frames, where the window is shifted and the slope is taken at its end.
 */
public record GroundSample(int frame, double timeS, WorldPoint raw, WorldPoint smoothed, double speedMs,
                           double headingDeg, double positionSigmaM, double speedSigmaMs) {
    public GroundSample {
        if (raw == null || smoothed == null) {
            throw new IllegalArgumentException("a ground sample needs its raw and smoothed positions");
        }
    }

    /** Whether the speed (and heading) could be computed here. */
    public boolean hasSpeed() {
        return !Double.isNaN(speedMs);
    }
}
