package org.modetrail.calibration;

/**
 * Settings of the ground-plane fit ({@link HomographyFit}). The defaults are common practice, with no published
 * source: a 3 px reprojection threshold is what hand-clicked points on video usually meet.
 *
 * @param thresholdPx      RANSAC inlier threshold: largest distance in the image, in pixels, between a clicked point
 *                         and its ground point mapped into the image; default 3
 * @param iterations       RANSAC trials; default 2000 (with 4-point samples and 50 % outliers, the chance of never
 *                         drawing an all-inlier sample in 2000 trials is (1 - 0.5^4)^2000, about 1e-56)
 * @param seed             seed of RANSAC's random draws, so the same points always give the same fit; default 1
 * @param collinearWarnRatio warn when the smallest over the largest singular value of the centred image points (or
 *                         of the centred ground points) is below this: the points lie nearly on one line and the
 *                         fit is poorly constrained across it; default 0.1
 * @param warnRmsPx        warn when the inliers' RMS image error exceeds this many pixels; default 2
 * @param warnRmsM         warn when the inliers' RMS ground error exceeds this many metres; default 0.5
 * @param minInlierShare   refuse the fit unless the inliers are more than this share of the points; default 0.5 (a
 *                         majority). Any 4 points fit some homography exactly, so RANSAC always finds 4 "inliers";
 *                         when most points disagree with the fit, the input is more likely wrong as a whole (columns
 *                         swapped, wrong units, points of another view) than a few clicks astray. Common practice,
 *                         no published source.
 */
public record CalibrationConfig(double thresholdPx, int iterations, long seed, double collinearWarnRatio,
                                double warnRmsPx, double warnRmsM, double minInlierShare) {
    public static final double DEFAULT_THRESHOLD_PX = 3;
    public static final int DEFAULT_ITERATIONS = 2000;
    public static final long DEFAULT_SEED = 1;
    public static final double DEFAULT_COLLINEAR_WARN_RATIO = 0.1;
    public static final double DEFAULT_WARN_RMS_PX = 2;
    public static final double DEFAULT_WARN_RMS_M = 0.5;
    public static final double DEFAULT_MIN_INLIER_SHARE = 0.5;

    public CalibrationConfig {
        if (!(thresholdPx > 0) || !Double.isFinite(thresholdPx)) {
            throw new IllegalArgumentException("the inlier threshold must be a positive number of pixels, got "
                    + thresholdPx);
        }
        if (iterations < 1 || iterations > 10_000_000) {
            throw new IllegalArgumentException("RANSAC iterations must be 1 to 10000000, got " + iterations);
        }
        if (!(collinearWarnRatio >= 0 && collinearWarnRatio < 1)) {
            throw new IllegalArgumentException("the collinearity warning ratio must be in [0, 1), got "
                    + collinearWarnRatio);
        }
        if (!(warnRmsPx > 0) || !(warnRmsM > 0)) {
            throw new IllegalArgumentException("the RMS warning levels must be positive, got " + warnRmsPx + " px, "
                    + warnRmsM + " m");
        }
        if (!(minInlierShare >= 0 && minInlierShare < 1)) {
            throw new IllegalArgumentException("the least share of inliers must be in [0, 1), got " + minInlierShare);
        }
    }

    public static CalibrationConfig defaults() {
        return new CalibrationConfig(DEFAULT_THRESHOLD_PX, DEFAULT_ITERATIONS, DEFAULT_SEED,
                DEFAULT_COLLINEAR_WARN_RATIO, DEFAULT_WARN_RMS_PX, DEFAULT_WARN_RMS_M, DEFAULT_MIN_INLIER_SHARE);
    }

    public CalibrationConfig withThresholdPx(double px) {
        return new CalibrationConfig(px, iterations, seed, collinearWarnRatio, warnRmsPx, warnRmsM, minInlierShare);
    }

    public CalibrationConfig withSeed(long newSeed) {
        return new CalibrationConfig(thresholdPx, iterations, newSeed, collinearWarnRatio, warnRmsPx, warnRmsM, minInlierShare);
    }
}
