package org.modetrail.tracking;

/**
 * Settings of the mean-shift tracker. Every default was chosen with the tracking benchmark over the project's
 * synthetic scenarios (see DEVELOPERS.md); change them there, not by feel.
 *
 * @param binning              colour feature space; default RGB 32x32x32 (the benchmark: clutter and crossing
 *                             gain 0.07 and 0.01 mean IoU over 16x16x16, no scenario loses more than 0.005)
 * @param backgroundWeighting  the corrected background-weighted model of Ning et al. 2012; default on
 * @param scale                how the box follows size changes; default {@link ScaleMethod#MOMENTS}
 * @param maxIterations        mean-shift iterations per localisation; default 20
 * @param convergencePx        stop when a step moves less than this many pixels; default 0.5
 * @param lostSimilarity       Bhattacharyya coefficient under which a frame is not accepted as the object; default
 *                             0.6, lowered to 0.75 of the object's running similarity when that drifts down slowly
 *                             (never under 0.35)
 * @param confidentSimilarity  a local mean-shift result at least this good, and near the prediction, skips the
 *                             wide search; default 0.8
 * @param maxCoastFrames       frames the motion model may carry a hidden object before the track is lost; default 25
 * @param searchRadius         the wide search looks this many box sizes around the prediction (growing while
 *                             coasting); default 1.5
 * @param motionPenalty        weight of the squared distance from the prediction, in box diagonals, against the
 *                             similarity when choosing among candidates; default 0.15
 * @param modelUpdateRate      blending rate per frame of the target model towards confident observations, 0 for
 *                             none; default 0 (the benchmark: mean AUC 0.905 without, 0.902 at 0.02, since the
 *                             lighting compensation already follows global light; raise it for objects whose own
 *                             appearance changes slowly)
 * @param modelUpdateMinSimilarity  observations this similar to the model update it, as do those 0.1 above the
 *                             (adaptive) acceptance threshold; default 0.85
 * @param backgroundRefresh    a background ring whose coefficient with the stored one is under this replaces it;
 *                             default 0.8
 * @param processNoise         Kalman process noise (pixels squared per frame^4 of acceleration); default 4
 * @param measurementNoise     Kalman measurement variance (pixels squared); default 4
 * @param compensateLighting   undo global lighting changes before binning ({@link IlluminationCompensation});
 *                             default on
 */
public record TrackerConfig(ColourBinning binning, boolean backgroundWeighting, ScaleMethod scale,
                            int maxIterations, double convergencePx, double lostSimilarity,
                            double confidentSimilarity, int maxCoastFrames, double searchRadius,
                            double motionPenalty, double modelUpdateRate, double modelUpdateMinSimilarity,
                            double backgroundRefresh, double processNoise, double measurementNoise,
                            boolean compensateLighting) {

    public TrackerConfig {
        if (binning == null || scale == null) {
            throw new IllegalArgumentException("binning and scale method are required");
        }
        check(maxIterations >= 1 && maxIterations <= 100, "maxIterations must be 1 to 100, got " + maxIterations);
        check(convergencePx > 0 && convergencePx <= 5, "convergencePx must be in (0, 5], got " + convergencePx);
        check(lostSimilarity >= 0 && lostSimilarity < 1, "lostSimilarity must be in [0, 1), got " + lostSimilarity);
        check(confidentSimilarity >= lostSimilarity && confidentSimilarity <= 1,
                "confidentSimilarity must be in [lostSimilarity, 1], got " + confidentSimilarity);
        check(maxCoastFrames >= 0 && maxCoastFrames <= 1000, "maxCoastFrames must be 0 to 1000, got " + maxCoastFrames);
        check(searchRadius >= 0 && searchRadius <= 10, "searchRadius must be 0 to 10 box sizes, got " + searchRadius);
        check(motionPenalty >= 0, "motionPenalty must not be negative, got " + motionPenalty);
        check(modelUpdateRate >= 0 && modelUpdateRate < 0.5, "modelUpdateRate must be in [0, 0.5), got "
                + modelUpdateRate);
        check(modelUpdateMinSimilarity > 0 && modelUpdateMinSimilarity <= 1,
                "modelUpdateMinSimilarity must be in (0, 1], got " + modelUpdateMinSimilarity);
        check(backgroundRefresh >= 0 && backgroundRefresh <= 1, "backgroundRefresh must be in [0, 1], got "
                + backgroundRefresh);
        check(processNoise > 0 && measurementNoise > 0, "Kalman noises must be positive");
    }

    private static void check(boolean ok, String message) {
        if (!ok) {
            throw new IllegalArgumentException(message);
        }
    }

    /** The benchmark's choice. */
    public static TrackerConfig defaults() {
        return new TrackerConfig(RgbBinning.DEFAULT, true, ScaleMethod.MOMENTS, 20, 0.5, 0.6, 0.8, 25, 1.5,
                0.15, 0, 0.85, 0.8, 4, 4, true);
    }

    public TrackerConfig withLightingCompensation(boolean on) {
        return new TrackerConfig(binning, backgroundWeighting, scale, maxIterations, convergencePx, lostSimilarity,
                confidentSimilarity, maxCoastFrames, searchRadius, motionPenalty, modelUpdateRate,
                modelUpdateMinSimilarity, backgroundRefresh, processNoise, measurementNoise, on);
    }

    public TrackerConfig withScale(ScaleMethod method) {
        return new TrackerConfig(binning, backgroundWeighting, method, maxIterations, convergencePx, lostSimilarity,
                confidentSimilarity, maxCoastFrames, searchRadius, motionPenalty, modelUpdateRate,
                modelUpdateMinSimilarity, backgroundRefresh, processNoise, measurementNoise, compensateLighting);
    }

    public TrackerConfig withBinning(ColourBinning b) {
        return new TrackerConfig(b, backgroundWeighting, scale, maxIterations, convergencePx, lostSimilarity,
                confidentSimilarity, maxCoastFrames, searchRadius, motionPenalty, modelUpdateRate,
                modelUpdateMinSimilarity, backgroundRefresh, processNoise, measurementNoise, compensateLighting);
    }

    public TrackerConfig withBackgroundWeighting(boolean on) {
        return new TrackerConfig(binning, on, scale, maxIterations, convergencePx, lostSimilarity,
                confidentSimilarity, maxCoastFrames, searchRadius, motionPenalty, modelUpdateRate,
                modelUpdateMinSimilarity, backgroundRefresh, processNoise, measurementNoise, compensateLighting);
    }

    public TrackerConfig withSearchRadius(double radius) {
        return new TrackerConfig(binning, backgroundWeighting, scale, maxIterations, convergencePx, lostSimilarity,
                confidentSimilarity, maxCoastFrames, radius, motionPenalty, modelUpdateRate,
                modelUpdateMinSimilarity, backgroundRefresh, processNoise, measurementNoise, compensateLighting);
    }

    public TrackerConfig withModelUpdateRate(double rate) {
        return new TrackerConfig(binning, backgroundWeighting, scale, maxIterations, convergencePx, lostSimilarity,
                confidentSimilarity, maxCoastFrames, searchRadius, motionPenalty, rate,
                modelUpdateMinSimilarity, backgroundRefresh, processNoise, measurementNoise, compensateLighting);
    }

    public TrackerConfig withSimilarityThresholds(double lost, double confident) {
        return new TrackerConfig(binning, backgroundWeighting, scale, maxIterations, convergencePx, lost,
                confident, maxCoastFrames, searchRadius, motionPenalty, modelUpdateRate,
                modelUpdateMinSimilarity, backgroundRefresh, processNoise, measurementNoise, compensateLighting);
    }
}
