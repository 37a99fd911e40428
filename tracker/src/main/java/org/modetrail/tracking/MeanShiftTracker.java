package org.modetrail.tracking;

import java.util.List;

import org.modetrail.model.Box;
import org.modetrail.video.Frame;

/**
 * Kernel mean-shift tracking of one object (Comaniciu, Ramesh and Meer, PAMI 2003) with the published improvements
 * that make it hold on real footage, each in its own class:
 * <ul>
 * <li>the corrected background-weighted target model ({@link BackgroundWeightedModel}, Ning et al. 2012);</li>
 * <li>localisation by mean shift with step halving ({@link MeanShiftLocalizer});</li>
 * <li>a constant-velocity Kalman filter for each frame's start and for coasting through occlusion
 * ({@link ConstantVelocityKalman});</li>
 * <li>a wide search over a back-projected colour likelihood with an integral image ({@link LikelihoodSearch}) when
 * the local result is weak, far from the prediction, or on another object, with candidates chosen by similarity
 * and distance from the prediction;</li>
 * <li>size from moments ({@link MomentScaleEstimator}) or the +-10% rule ({@link TenPercentScaleEstimator});</li>
 * <li>a guarded slow update of the target model, and loss declared when similarity stays low.</li>
 * </ul>
 * Per frame it bins only a region around the prediction once and works on primitive buffers made at start.
 */
public final class MeanShiftTracker implements Tracker {
    private static final int MAX_CANDIDATES = 4;
    private static final int BACKGROUND_REFRESH_EVERY = 5;
    /** A candidate may not be more background-like than the model by more than this, or it does not teach it. */
    private static final double UPDATE_BACKGROUND_GUARD = 0.05;

    private final TrackerConfig config;
    private final BinImage image;
    private final BackgroundWeightedModel model;
    private final MeanShiftLocalizer localizer;
    private final ColourLikelihood likelihood;
    private final LikelihoodSearch search;
    private final ConstantVelocityKalman kalman;
    private final MomentScaleEstimator moments;
    private final KernelHistogram observed;
    private Box box;
    private int coasting;
    private int tracked;
    private boolean started;
    private boolean lost;

    public MeanShiftTracker() {
        this(TrackerConfig.defaults());
    }

    public MeanShiftTracker(TrackerConfig config) {
        this.config = config;
        int bins = config.binning().binCount();
        image = new BinImage(config.binning());
        model = new BackgroundWeightedModel(bins, config.backgroundWeighting());
        localizer = new MeanShiftLocalizer(bins, config.maxIterations(), config.convergencePx());
        likelihood = new ColourLikelihood(bins);
        search = new LikelihoodSearch(MAX_CANDIDATES);
        kalman = new ConstantVelocityKalman(config.processNoise(), config.measurementNoise());
        moments = new MomentScaleEstimator(0.3, 0.08);
        observed = new KernelHistogram(bins);
    }

    public TrackerConfig config() {
        return config;
    }

    @Override
    public void start(Frame frame, Box start) {
        if (start.width() < 2 || start.height() < 2) {
            throw new IllegalArgumentException("a box to track must be at least 2x2 pixels, got " + start);
        }
        if (start.intersection(new Box(0, 0, frame.width(), frame.height())) <= 0) {
            throw new IllegalArgumentException("the box " + start + " lies outside the " + frame.width() + "x"
                    + frame.height() + " frame " + frame.index());
        }
        load(frame, start, Math.max(start.width(), start.height()));
        model.build(image, start);
        likelihood.update(model.target, model.background);
        moments.reset(image, likelihood, start);
        kalman.reset(start.centreX(), start.centreY());
        box = start;
        coasting = 0;
        tracked = 0;
        started = true;
        lost = false;
    }

    @Override
    public TrackStep track(Frame frame) {
        return track(frame, List.of());
    }

    /**
     * Like {@link #track(Frame)}, but never settles inside one of {@code claimed} (boxes other tracks hold in this
     * frame), so two tracks cannot collapse onto one object when similar objects cross.
     */
    public TrackStep track(Frame frame, List<Box> claimed) {
        if (!started || lost) {
            throw new IllegalStateException(lost ? "the track was lost; start it again on a new box"
                    : "start the tracker on a box first");
        }
        kalman.predict();
        Box predicted = box.movedTo(kalman.x(), kalman.y());
        double size = Math.max(box.width(), box.height());
        double diagonal = Math.hypot(box.width(), box.height());
        double speed = Math.hypot(kalman.vx(), kalman.vy());

        load(frame, predicted, size);
        Box best = localizer.localize(image, predicted, model.weighted, model.target.values);
        double bestRho = localizer.similarity;
        boolean onClaimed = overlapsAny(best, claimed);
        double drift = best.centreDistance(predicted) / diagonal;
        double bestScore = onClaimed ? Double.NEGATIVE_INFINITY : bestRho - config.motionPenalty() * drift * drift;

        if (coasting > 0 || onClaimed || bestRho < config.confidentSimilarity() || drift > 0.75) {
            double radius = config.searchRadius() * size * (1 + 0.25 * coasting) + speed;
            load(frame, predicted, radius + size);
            int n = search.search(image, likelihood, box.width(), box.height(), claimed);
            for (int i = 0; i < n; i++) {
                Box candidate = localizer.localize(image, box.movedTo(search.x(i), search.y(i)), model.weighted,
                        model.target.values);
                if (overlapsAny(candidate, claimed)) {
                    continue;
                }
                double d = candidate.centreDistance(predicted) / diagonal;
                double score = localizer.similarity - config.motionPenalty() * d * d;
                if (score > bestScore) {
                    bestScore = score;
                    best = candidate;
                    bestRho = localizer.similarity;
                }
            }
            if (bestScore == Double.NEGATIVE_INFINITY) {
                bestRho = 0;
            }
        }

        if (bestRho >= config.lostSimilarity()) {
            best = adaptScale(best, bestRho);
            kalman.correct(best.centreX(), best.centreY());
            learn(best);
            box = best;
            coasting = 0;
            tracked++;
            return new TrackStep(frame.index(), best, bestRho, TrackStatus.TRACKED);
        }
        coasting++;
        box = predicted;
        if (coasting > config.maxCoastFrames()) {
            lost = true;
            return new TrackStep(frame.index(), predicted, bestRho, TrackStatus.LOST);
        }
        return new TrackStep(frame.index(), predicted, bestRho, TrackStatus.COASTING);
    }

    private Box adaptScale(Box located, double rho) {
        switch (config.scale()) {
            case TEN_PERCENT:
                return TenPercentScaleEstimator.adapt(localizer, image, located, located, rho, model.weighted,
                        model.target.values);
            case MOMENTS:
                return moments.adapt(image, likelihood, located);
            default:
                return located;
        }
    }

    /** The guarded model update and the background refresh of Ning et al. */
    private void learn(Box at) {
        boolean changed = false;
        if (config.modelUpdateRate() > 0) {
            observed.compute(image, at);
            double rho = observed.bhattacharyya(model.target.values);
            double backgroundLikeNow = BhattacharyyaCoefficient.overBins(model.target.values, model.background,
                    model.target.touched, model.target.touchedCount);
            double backgroundLikeSeen = observed.bhattacharyya(model.background);
            if (rho >= config.modelUpdateMinSimilarity()
                    && backgroundLikeSeen <= backgroundLikeNow + UPDATE_BACKGROUND_GUARD) {
                model.blend(observed, config.modelUpdateRate());
                changed = true;
            }
        }
        if (tracked % BACKGROUND_REFRESH_EVERY == 0 && model.refreshBackground(image, at, config.backgroundRefresh())) {
            changed = true;
        }
        if (changed) {
            likelihood.update(model.target, model.background);
        }
    }

    /** Bins the frame around {@code around}: the box, its background ring and {@code margin} more on each side. */
    private void load(Frame frame, Box around, double margin) {
        int x0 = (int) Math.floor(around.centreX() - around.width() - margin);
        int y0 = (int) Math.floor(around.centreY() - around.height() - margin);
        int x1 = (int) Math.ceil(around.centreX() + around.width() + margin);
        int y1 = (int) Math.ceil(around.centreY() + around.height() + margin);
        image.load(frame, x0, y0, x1, y1);
    }

    private static boolean overlapsAny(Box b, List<Box> boxes) {
        for (int i = 0; i < boxes.size(); i++) {
            if (b.iou(boxes.get(i)) > 0.3) {
                return true;
            }
        }
        return false;
    }

    /** The current box (the last output). */
    public Box box() {
        return box;
    }

    public boolean isLost() {
        return lost;
    }
}
