package org.modetrail.calibration;

/**
 * Settings of {@link GroundTrajectory}.
 *
 * @param windowS smoothing window in seconds, the time span of the samples each Savitzky-Golay fit uses; default 0.5 s
 *                (13 frames at 25 fps), common practice for road users with no published source: long enough to
 *                average box jitter, short enough to follow braking and acceleration
 * @param order   polynomial order; default 2 (a quadratic follows constant acceleration without lag)
 */
public record TrajectoryConfig(double windowS, int order) {
    public static final double DEFAULT_WINDOW_S = 0.5;
    public static final int DEFAULT_ORDER = 2;

    public TrajectoryConfig {
        if (!(windowS > 0) || !Double.isFinite(windowS)) {
            throw new IllegalArgumentException("the smoothing window must be a positive number of seconds, got "
                    + windowS);
        }
        if (order < 1 || order > 6) {
            throw new IllegalArgumentException("the smoothing order must be 1 to 6 (1 or more to give a speed), got "
                    + order);
        }
    }

    public static TrajectoryConfig defaults() {
        return new TrajectoryConfig(DEFAULT_WINDOW_S, DEFAULT_ORDER);
    }

    /** Fewest samples in a window that still give a speed: order + 2, so the fit is over-determined. */
    public int minSamples() {
        return order + 2;
    }
}
