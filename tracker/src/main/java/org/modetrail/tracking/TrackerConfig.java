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
 * @param reDetect             when the object is lost or leaves the frame, look for it again ({@link ReDetection})
 *                             instead of ending the track; default on
 * @param maxSearchFrames      frames the search goes on before the track ends, 0 for as long as there are frames;
 *                             default 0
 * @param requireContrast      a frame counts as the object only if the candidate stands out from the ring around
 *                             it about as the object usually does, and a re-acquisition only where it stands out
 *                             half as well; default on (the tuning seeds: boxes on a floor the object had left 506
 *                             to 0, mean AUC 0.749 to 0.751 raw, 0.655 to 0.656 H.264; see MeanShiftTracker)
 * @param adaptBinning         with RGB binning, take for each object the finest level per channel, from the
 *                             configured one down to 8, whose histogram of the object is reproducible
 *                             ({@link HistogramReliability}); default on (the tuning seeds through H.264: family
 *                             mean AUC 0.597 without, 0.655 with)
 */
public record TrackerConfig(ColourBinning binning, boolean backgroundWeighting, ScaleMethod scale,
                            int maxIterations, double convergencePx, double lostSimilarity,
                            double confidentSimilarity, int maxCoastFrames, double searchRadius,
                            double motionPenalty, double modelUpdateRate, double modelUpdateMinSimilarity,
                            double backgroundRefresh, double processNoise, double measurementNoise,
                            boolean compensateLighting, boolean reDetect, int maxSearchFrames,
                            boolean requireContrast, boolean adaptBinning) {

    public TrackerConfig {
        check(maxSearchFrames >= 0, "maxSearchFrames must not be negative, got " + maxSearchFrames);
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
        return new Builder().build();
    }

    /** A builder holding these settings, to change a few and build a new, validated config. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    public TrackerConfig withLightingCompensation(boolean on) {
        return toBuilder().compensateLighting(on).build();
    }

    public TrackerConfig withScale(ScaleMethod method) {
        return toBuilder().scale(method).build();
    }

    public TrackerConfig withBinning(ColourBinning b) {
        return toBuilder().binning(b).build();
    }

    public TrackerConfig withBackgroundWeighting(boolean on) {
        return toBuilder().backgroundWeighting(on).build();
    }

    public TrackerConfig withSearchRadius(double radius) {
        return toBuilder().searchRadius(radius).build();
    }

    public TrackerConfig withModelUpdateRate(double rate) {
        return toBuilder().modelUpdateRate(rate).build();
    }

    public TrackerConfig withSimilarityThresholds(double lost, double confident) {
        return toBuilder().lostSimilarity(lost).confidentSimilarity(confident).build();
    }

    /** Named settings with the defaults documented on {@link TrackerConfig}; {@link #build()} validates them. */
    public static final class Builder {
        private ColourBinning binning = RgbBinning.DEFAULT;
        private boolean backgroundWeighting = true;
        private ScaleMethod scale = ScaleMethod.MOMENTS;
        private int maxIterations = 20;
        private double convergencePx = 0.5;
        private double lostSimilarity = 0.6;
        private double confidentSimilarity = 0.8;
        private int maxCoastFrames = 25;
        private double searchRadius = 1.5;
        private double motionPenalty = 0.15;
        private double modelUpdateRate = 0;
        private double modelUpdateMinSimilarity = 0.85;
        private double backgroundRefresh = 0.8;
        private double processNoise = 4;
        private double measurementNoise = 4;
        private boolean compensateLighting = true;
        private boolean reDetect = true;
        private int maxSearchFrames = 0;
        private boolean requireContrast = true;
        private boolean adaptBinning = true;

        public Builder() {
        }

        private Builder(TrackerConfig c) {
            binning = c.binning;
            backgroundWeighting = c.backgroundWeighting;
            scale = c.scale;
            maxIterations = c.maxIterations;
            convergencePx = c.convergencePx;
            lostSimilarity = c.lostSimilarity;
            confidentSimilarity = c.confidentSimilarity;
            maxCoastFrames = c.maxCoastFrames;
            searchRadius = c.searchRadius;
            motionPenalty = c.motionPenalty;
            modelUpdateRate = c.modelUpdateRate;
            modelUpdateMinSimilarity = c.modelUpdateMinSimilarity;
            backgroundRefresh = c.backgroundRefresh;
            processNoise = c.processNoise;
            measurementNoise = c.measurementNoise;
            compensateLighting = c.compensateLighting;
            reDetect = c.reDetect;
            maxSearchFrames = c.maxSearchFrames;
            requireContrast = c.requireContrast;
            adaptBinning = c.adaptBinning;
        }

        public Builder binning(ColourBinning v) {
            binning = v;
            return this;
        }

        public Builder backgroundWeighting(boolean v) {
            backgroundWeighting = v;
            return this;
        }

        public Builder scale(ScaleMethod v) {
            scale = v;
            return this;
        }

        public Builder maxIterations(int v) {
            maxIterations = v;
            return this;
        }

        public Builder convergencePx(double v) {
            convergencePx = v;
            return this;
        }

        public Builder lostSimilarity(double v) {
            lostSimilarity = v;
            return this;
        }

        public Builder confidentSimilarity(double v) {
            confidentSimilarity = v;
            return this;
        }

        public Builder maxCoastFrames(int v) {
            maxCoastFrames = v;
            return this;
        }

        public Builder searchRadius(double v) {
            searchRadius = v;
            return this;
        }

        public Builder motionPenalty(double v) {
            motionPenalty = v;
            return this;
        }

        public Builder modelUpdateRate(double v) {
            modelUpdateRate = v;
            return this;
        }

        public Builder modelUpdateMinSimilarity(double v) {
            modelUpdateMinSimilarity = v;
            return this;
        }

        public Builder backgroundRefresh(double v) {
            backgroundRefresh = v;
            return this;
        }

        public Builder kalmanNoise(double process, double measurement) {
            processNoise = process;
            measurementNoise = measurement;
            return this;
        }

        public Builder compensateLighting(boolean v) {
            compensateLighting = v;
            return this;
        }

        public Builder reDetect(boolean v) {
            reDetect = v;
            return this;
        }

        public Builder maxSearchFrames(int v) {
            maxSearchFrames = v;
            return this;
        }

        public Builder adaptBinning(boolean v) {
            adaptBinning = v;
            return this;
        }

        public Builder requireContrast(boolean v) {
            requireContrast = v;
            return this;
        }

        public TrackerConfig build() {
            return new TrackerConfig(binning, backgroundWeighting, scale, maxIterations, convergencePx,
                    lostSimilarity, confidentSimilarity, maxCoastFrames, searchRadius, motionPenalty,
                    modelUpdateRate, modelUpdateMinSimilarity, backgroundRefresh, processNoise, measurementNoise,
                    compensateLighting, reDetect, maxSearchFrames, requireContrast, adaptBinning);
        }
    }
}
