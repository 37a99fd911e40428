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
 * <li>size from moments ({@link MomentScaleEstimator}) or the +-10% rule ({@link TenPercentScaleEstimator}),
 * kept from shrinking while one side of the object is covered or after it was hidden
 * ({@link PartialOcclusion});</li>
 * <li>a guarded slow update of the target model, and loss declared when similarity stays low;</li>
 * <li>a local brightness gain on top of the frame-wide light compensation, searched when the object's colours stop
 * fitting where it should be and followed while it is not 1 (shadows and lamps that only part of the frame sees);
 * the re-detection cycles through gains as well.</li>
 * </ul>
 * Per frame it bins only a region around the prediction once and works on primitive buffers made at start.
 */
public final class MeanShiftTracker implements Tracker {
    private static final int MAX_CANDIDATES = 4;
    /** Bins around the prediction reach this many box sizes beyond the moment window. */
    private static final double LOCAL_MARGIN = 0.25;
    /** Rate of the running mean of accepted similarities. */
    private static final double TYPICAL_RATE = 0.1;
    /**
     * With {@link TrackerConfig#requireContrast()}, a frame counts as the object only if its contrast with the ring
     * around it is at least this share of the object's typical contrast. The typical contrast learns only from
     * frames with at least {@link #CONTRAST_LEARN} of it: learning from every accepted frame let it ratchet down
     * while a box lagged off an object leaving the frame, until bare asphalt (contrast 0.09-0.16 against a typical
     * 0.39) passed at 0.1 and the box stayed for 150 frames. A re-acquisition needs {@link #REACQUIRE_CONTRAST}: a
     * dark car that left by the bottom edge was found again on the dark asphalt at the vanishing point.
     * Chosen on the tuning seeds (5 per kind, through H.264 and the runner): with 0.25, 0.5 and 0.5, boxes while
     * the object is absent 6.4 per 1000 frames to 0, wrong re-acquisitions on lighting-occlusion 0.35 to 0, family
     * mean AUC 0.679 to 0.677 (one object of lighting-occlusion seed 3 that a first wrong re-acquisition had
     * helped); 0.35 or 0.5 for the first cost more (0.675, 0.674). On raw frames, seeds 1-3, the first alone: 0
     * boxes while absent from 0.1 up, mean AUC 0.751 at 0.1, 0.749 at 0.25, 0.747 at 0.5.
     */
    private static final double CONTRAST_FRACTION = 0.25;
    private static final double CONTRAST_LEARN = 0.5;
    private static final double REACQUIRE_CONTRAST = 0.5;
    /** A frame must reach this fraction of the typical similarity (or the configured threshold, if lower). */
    private static final double ACCEPT_FRACTION = 0.75;
    private static final double ACCEPT_FLOOR = 0.35;
    /** An observation this far above the acceptance threshold (or above the configured minimum) may update the model. */
    private static final double UPDATE_MARGIN = 0.1;
    /** The local result skips the wide search when this close to the typical similarity (or above confident). */
    private static final double CONFIDENT_MARGIN = 0.1;
    /** The model and the background are revisited every this many tracked frames. */
    private static final int LEARN_EVERY = 5;
    /** A candidate may not be more background-like than the model by more than this, or it does not teach it. */
    private static final double UPDATE_BACKGROUND_GUARD = 0.05;
    /** A new size may cost this much similarity (the coefficient varies that much with sub-pixel placement). */
    private static final double SIZE_TOLERANCE = 0.005;
    /** The box keeps between a sixteenth and sixteen times the area it started with. */
    private static final double MIN_AREA_RATIO = 1.0 / 16;
    private static final double MAX_AREA_RATIO = 16;
    /** A held size is released once the similarity is back within this of the typical one, */
    private static final double RECOVERED_MARGIN = 0.05;
    /** or after this many frames seen since the hold began. */
    private static final int MAX_HELD_FRAMES = 25;

    /**
     * Brightness gains, relative to the present one, tried where the object should be when its colours no longer
     * fit there (it walked into a shadow or under a lamp that the frame-wide compensation does not see).
     */
    private static final double[] RELIGHT_STEPS = {0.5, 0.6, 0.72, 0.85, 1.18, 1.4, 1.7, 2.0};
    /** Another brightness is believed only if it raises the similarity this much above the present one's. */
    private static final double RELIGHT_MARGIN = 0.15;
    /**
     * While the local brightness is not 1, or the similarity has sagged below the typical one (the object is
     * walking into a shadow), these neighbouring gains are tried each frame, so the gain follows the light. On the
     * tuning seeds a sag of 0.05 beat 0.1 (lighting kind 0.557 against 0.522, small erratic objects 0.735 against
     * 0.744, plaza 0.798 against 0.786, 8 seeds each).
     */
    private static final double RELIGHT_NUDGE = 1.1;
    private static final double NUDGE_BELOW_TYPICAL = 0.05;
    /**
     * ... and only when the light around it changed too: the mean brightness of the ring around the box is this
     * far (relative) from its running mean. A sag of the similarity alone also comes from a lagging size, and a
     * gain that moves then makes the likelihood wrong and freezes the size (perspective kind, 0.86 to 0.21 on one
     * object of the tuning seeds).
     */
    private static final double RING_CHANGE = 0.08;

    private final TrackerConfig config;
    private BinImage image;
    private BackgroundWeightedModel model;
    private MeanShiftLocalizer localizer;
    private ColourLikelihood likelihood;
    private final LikelihoodSearch search;
    private final ConstantVelocityKalman kalman;
    private final MomentScaleEstimator moments;
    private KernelHistogram observed;
    private final IlluminationCompensation light;
    private PartialOcclusion occlusion;
    private final CentreSurroundScale surround;
    private KernelHistogram surroundNow;
    private double coreW = 1;
    private double coreH = 1;
    private double startAspect;
    private Box box;
    /** The box of the last frame the object was found on. */
    private Box lastFound;
    private final ReDetection redetection = new ReDetection();
    private boolean searching;
    private double startArea;
    /** Running mean of the similarity of accepted frames: what "normal" looks like for this object now. */
    private double typicalSimilarity;
    private double typicalContrast;
    /** Running mean of the brightness of the ring around the box on accepted frames. */
    private double typicalRing;
    private int coasting;
    private int tracked;
    private boolean started;
    private boolean lost;
    /** The object is (or was lately) partly or wholly hidden: its size and typical similarity are held. */
    private boolean holding;
    private int heldFrames;
    /** The typical similarity when the hold began: what the whole object in view looks like. */
    private double similarityBeforeHold;

    public MeanShiftTracker() {
        this(TrackerConfig.defaults());
    }

    public MeanShiftTracker(TrackerConfig config) {
        this.config = config;
        allocate(config.binning());
        search = new LikelihoodSearch(MAX_CANDIDATES);
        kalman = new ConstantVelocityKalman(config.processNoise(), config.measurementNoise());
        moments = new MomentScaleEstimator(0.3, 0.08);
        light = config.compensateLighting() ? new IlluminationCompensation() : null;
        surround = new CentreSurroundScale(0.3, 0.1);
    }

    /** The buffers whose size follows the number of colour bins. */
    private void allocate(ColourBinning binning) {
        int bins = binning.binCount();
        image = new BinImage(binning);
        model = new BackgroundWeightedModel(bins, config.backgroundWeighting());
        localizer = new MeanShiftLocalizer(bins, config.maxIterations(), config.convergencePx());
        likelihood = new ColourLikelihood(bins);
        observed = new KernelHistogram(bins);
        occlusion = new PartialOcclusion(bins);
        surroundNow = new KernelHistogram(bins);
    }

    /** The colour binning in use for the present object (see {@link TrackerConfig#adaptBinning()}). */
    public ColourBinning binning() {
        return image.binning();
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
        if (config.adaptBinning() && config.binning() instanceof RgbBinning rgb) {
            int bits = HistogramReliability.bitsFor(frame, start, rgb.bitsPerChannel());
            if (!(image.binning() instanceof RgbBinning now && now.bitsPerChannel() == bits)) {
                allocate(new RgbBinning(bits));
            }
        }
        image.invalidate();
        if (light != null) {
            light.reset(frame, start);
        }
        load(frame, start, 1, 2);
        model.build(image, start);
        occlusion.build(image, start);
        likelihood.update(model.target, model.background.values);
        moments.reset(image, likelihood, start);
        if (config.scale() == ScaleMethod.CENTRE_SURROUND || config.scale() == ScaleMethod.CHECKED_MOMENTS) {
            load(frame, start, 1.3 * CentreSurroundScale.SURROUND / 2 + 0.05, 2);
            surround.calibrate(image, likelihood, start);
            coreW = surround.coreWidth;
            coreH = surround.coreHeight;
        }
        kalman.reset(start.centreX(), start.centreY());
        box = start;
        lastFound = start;
        searching = false;
        startArea = start.area();
        startAspect = start.width() / start.height();
        typicalSimilarity = 1;
        typicalContrast = config.requireContrast() ? contrast(frame, start) : 0;
        typicalRing = ringBrightness(frame, start);
        coasting = 0;
        tracked = 0;
        started = true;
        lost = false;
        holding = false;
        heldFrames = 0;
    }

    @Override
    public TrackStep track(Frame frame) {
        return track(frame, List.of());
    }

    /**
     * Like {@link #track(Frame)}, but never settles on one of {@code claimed} (boxes other tracks hold) where that
     * box overlaps the result more than this track's prediction does ({@link ReDetection#claimedByOther}), so two
     * tracks cannot collapse onto one object when similar objects cross, and a track whose object has gone cannot
     * take another track's.
     */
    public TrackStep track(Frame frame, List<Box> claimed) {
        if (!started || lost) {
            throw new IllegalStateException(lost ? "the track was lost; start it again on a new box"
                    : "start the tracker on a box first");
        }
        image.invalidate();
        if (searching) {
            return search(frame, claimed);
        }
        if (light != null) {
            light.update(frame, box);
        }
        kalman.predict();
        Box predicted = box.movedTo(kalman.x(), kalman.y());
        double size = Math.max(box.width(), box.height());
        double diagonal = Math.hypot(box.width(), box.height());
        double speed = Math.hypot(kalman.vx(), kalman.vy());

        // Enough for mean shift to move a third of a box and for the moment window (1.6 boxes) around the result.
        load(frame, predicted, 0.8, LOCAL_MARGIN * size);
        Box best = localizer.localize(image, predicted, model.weighted, model.target.values);
        double bestRho = localizer.similarity;
        boolean onClaimed = ReDetection.claimedByOther(best, predicted, claimed);
        double drift = best.centreDistance(predicted) / diagonal;
        double bestScore = onClaimed ? Double.NEGATIVE_INFINITY : bestRho - config.motionPenalty() * drift * drift;

        if (coasting > 0 || onClaimed || bestRho < confidentThreshold() || drift > 0.75) {
            double radius = config.searchRadius() * size * (1 + 0.25 * coasting) + speed;
            load(frame, predicted, 1, radius);
            int n = search.search(image, likelihood, box.width(), box.height(), claimed);
            for (int i = 0; i < n; i++) {
                Box candidate = localizer.localize(image, box.movedTo(search.x(i), search.y(i)), model.weighted,
                        model.target.values);
                if (ReDetection.claimedByOther(candidate, predicted, claimed)) {
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

        if (light != null && bestRho < acceptThreshold() && bestScore != Double.NEGATIVE_INFINITY
                && relight(frame, predicted, size, bestRho, claimed)) {
            best = relitBox;
            bestRho = relitSimilarity;
        }

        if (bestRho >= acceptThreshold() && (!config.requireContrast() || standsOut(frame, best))) {
            if (light != null) {
                double ring = ringBrightness(frame, best);
                boolean lightChanged = Math.abs(ring - typicalRing) > RING_CHANGE * typicalRing;
                if (light.localGain() != 1 || bestRho < typicalSimilarity - NUDGE_BELOW_TYPICAL && lightChanged) {
                    bestRho = nudgeBrightness(frame, best, bestRho);
                }
                typicalRing += TYPICAL_RATE * (ring - typicalRing);
            }
            typicalSimilarity += TYPICAL_RATE * (bestRho - typicalSimilarity);
            Box sized = adaptScale(frame, best, bestRho);
            // The halves are judged only when it matters: the box would shrink, or a hold may end.
            if (holding || sized.width() < best.width() || sized.height() < best.height()) {
                updateHolding(best, bestRho);
                if (holding) {
                    sized = noSmallerThan(sized, best);
                }
            }
            best = sized;
            kalman.correct(best.centreX(), best.centreY());
            learn(frame, best);
            box = best;
            lastFound = best;
            coasting = 0;
            tracked++;
            return new TrackStep(frame.index(), inFrame(best, frame), bestRho, TrackStatus.TRACKED);
        }
        coasting++;
        if (!holding) {
            holding = true;
            similarityBeforeHold = typicalSimilarity;
        }
        heldFrames = 0;
        box = predicted;
        boolean leftTheFrame = predicted.intersection(new Box(0, 0, frame.width(), frame.height()))
                < 0.5 * predicted.area();
        if (coasting > config.maxCoastFrames() || leftTheFrame) {
            if (!config.reDetect()) {
                lost = true;
                return new TrackStep(frame.index(), predicted, bestRho, TrackStatus.LOST);
            }
            searching = true;
            redetection.begin(lastFound, kalman.vx(), kalman.vy(), light);
            return new TrackStep(frame.index(), lastFound, bestRho, TrackStatus.SEARCHING);
        }
        return new TrackStep(frame.index(), predicted, bestRho, TrackStatus.COASTING);
    }

    private Box relitBox;
    private double relitSimilarity;

    /**
     * The object's colours no longer fit where it should be: localise again from the prediction under other
     * brightness gains of the local light ({@link IlluminationCompensation#setLocalGain}) and keep the gain whose
     * result is most like the model, if it is clearly better than the present light's. This is the diagonal model
     * of illuminant change (von Kries) with one gain for all channels, estimated locally by maximising the
     * Bhattacharyya coefficient: a departure of this project, for shadows and lamps that only part of the frame sees.
     * Only the neighbourhood of the prediction is tried, so a differently lit look-alike elsewhere is not taken.
     */
    private boolean relight(Frame frame, Box predicted, double size, double rhoNow, List<Box> claimed) {
        double present = light.localGain();
        double bestGain = present;
        double bestRho = rhoNow + RELIGHT_MARGIN;
        Box bestBox = null;
        for (double step : RELIGHT_STEPS) {
            light.setLocalGain(present * step);
            if (light.localGain() == present) {
                continue;
            }
            image.invalidate();
            load(frame, predicted, 0.8, LOCAL_MARGIN * size);
            Box at = localizer.localize(image, predicted, model.weighted, model.target.values);
            if (localizer.similarity > bestRho && !ReDetection.claimedByOther(at, predicted, claimed)) {
                bestRho = localizer.similarity;
                bestBox = at;
                bestGain = light.localGain();
            }
        }
        // A gain that helps but does not make the frame acceptable is not kept: the object is more likely hidden
        // than relit, and a wrong gain would spoil the search that finds it again.
        boolean relit = bestBox != null && bestRho >= acceptThreshold();
        light.setLocalGain(relit ? bestGain : present);
        image.invalidate();
        relitBox = bestBox;
        relitSimilarity = bestRho;
        return relit;
    }

    /**
     * The similarity at {@code at} under the best of the present local gain and its two neighbours, which it keeps.
     * (Choosing the gain by the box's contrast with its ring instead was tried: it scored lower on the tuning seeds.)
     */
    private double nudgeBrightness(Frame frame, Box at, double rho) {
        double present = light.localGain();
        double bestGain = present;
        double bestRho = rho;
        for (double g : new double[] {present / RELIGHT_NUDGE, present * RELIGHT_NUDGE}) {
            // Back to no local gain when near it, so the frame-wide compensation alone holds in ordinary light.
            light.setLocalGain(Math.abs(g - 1) < 0.06 ? 1 : g);
            image.invalidate();
            load(frame, at, 1, 1);
            observed.compute(image, at);
            double r = observed.bhattacharyya(model.target.values);
            if (r > bestRho + SIZE_TOLERANCE) {
                bestRho = r;
                bestGain = light.localGain();
            }
        }
        light.setLocalGain(bestGain);
        image.invalidate();
        return bestRho;
    }

    /**
     * Mean brightness (sum of the channels over 3) of the ring half a box wide around {@code at}, from every second
     * pixel of every second row of the frame as it is (the light compensation left out).
     */
    private static double ringBrightness(Frame frame, Box at) {
        int[] rgb = frame.rgb();
        int w = frame.width();
        int ix0 = (int) Math.floor(at.x());
        int iy0 = (int) Math.floor(at.y());
        int ix1 = (int) Math.ceil(at.right());
        int iy1 = (int) Math.ceil(at.bottom());
        int ox0 = Math.max(0, (int) Math.floor(at.centreX() - at.width()));
        int oy0 = Math.max(0, (int) Math.floor(at.centreY() - at.height()));
        int ox1 = Math.min(w, (int) Math.ceil(at.centreX() + at.width()));
        int oy1 = Math.min(frame.height(), (int) Math.ceil(at.centreY() + at.height()));
        long sum = 0;
        int n = 0;
        for (int y = oy0; y < oy1; y += 2) {
            int row = y * w;
            boolean insideRows = y >= iy0 && y < iy1;
            for (int x = ox0; x < ox1; x += 2) {
                if (insideRows && x >= ix0 && x < ix1) {
                    continue;
                }
                int p = rgb[row + x];
                sum += (p >>> 16 & 0xFF) + (p >>> 8 & 0xFF) + (p & 0xFF);
                n++;
            }
        }
        return n == 0 ? 0 : sum / (3.0 * n);
    }

    /** One frame of the search for a lost object ({@link ReDetection}); the object comes back re-acquired. */
    private TrackStep search(Frame frame, List<Box> claimed) {
        double required = Math.max(acceptThreshold(), typicalSimilarity - ReDetection.MARGIN);
        if (redetection.step(frame, image, likelihood, search, localizer, model, required, config.searchRadius(),
                claimed, light) && (!config.requireContrast()
                        || contrast(frame, redetection.found) >= REACQUIRE_CONTRAST * typicalContrast)) {
            Box at = redetection.found;
            searching = false;
            coasting = 0;
            holding = false;
            heldFrames = 0;
            kalman.reset(at.centreX(), at.centreY());
            box = at;
            lastFound = at;
            return new TrackStep(frame.index(), inFrame(at, frame), redetection.foundSimilarity,
                    TrackStatus.REACQUIRED);
        }
        if (config.maxSearchFrames() > 0 && redetection.framesLost() > config.maxSearchFrames()) {
            lost = true;
            return new TrackStep(frame.index(), lastFound, redetection.foundSimilarity, TrackStatus.LOST);
        }
        return new TrackStep(frame.index(), lastFound, redetection.foundSimilarity, TrackStatus.SEARCHING);
    }

    /**
     * Whether what lies in {@code at} stands out from its own surroundings in this frame as the object usually does:
     * the Bhattacharyya coefficient of the candidate with the background-weighted model q' (which keeps what sets
     * the object apart from its surroundings) less that of the ring around it, at least {@link #CONTRAST_FRACTION}
     * of its running typical value. A box that has slid off its object onto plain floor (the object left the frame,
     * or the model took in floor from a loose first box: a thin rod in a 68x46 box kept a plain-model similarity of
     * 0.79 on the bare floor it had left, but 0.075 against the weighted model beside 0.056 for the ring) is as like
     * the floor around it as anything, and is not taken as the object. The comparison of object and surround
     * histograms is that of the discriminative colour trackers (Collins, Liu and Leordeanu, "Online selection of
     * discriminative tracking features", PAMI 2005); using it as a test of a frame is this project's own.
     */
    private boolean standsOut(Frame frame, Box at) {
        double c = contrast(frame, at);
        if (c < CONTRAST_FRACTION * typicalContrast) {
            return false;
        }
        if (c >= CONTRAST_LEARN * typicalContrast) {
            typicalContrast += TYPICAL_RATE * (c - typicalContrast);
        }
        return true;
    }

    /** How much more like the background-weighted model the box is than the ring around it. */
    private double contrast(Frame frame, Box at) {
        load(frame, at, 1, 1);
        observed.compute(image, at);
        BackgroundWeightedModel.ring(image, at, surroundNow);
        return BhattacharyyaCoefficient.overBins(observed.values, model.weighted, observed.touched,
                observed.touchedCount)
                - BhattacharyyaCoefficient.overBins(surroundNow.values, model.weighted, surroundNow.touched,
                surroundNow.touchedCount);
    }

    /** The part of {@code b} inside the frame (the box itself when wholly inside or wholly out). */
    private static Box inFrame(Box b, Frame frame) {
        double x0 = Math.max(0, b.x());
        double y0 = Math.max(0, b.y());
        double x1 = Math.min(frame.width(), b.right());
        double y1 = Math.min(frame.height(), b.bottom());
        if (x1 - x0 < 1 || y1 - y0 < 1 || x0 == b.x() && y0 == b.y() && x1 == b.right() && y1 == b.bottom()) {
            return b;
        }
        return new Box(x0, y0, x1 - x0, y1 - y0);
    }

    /**
     * While one side of the object looks covered, and after it was hidden, its box may grow but not shrink (the
     * scale estimate would shrink it onto the visible part), until the similarity is back near what it was before with no side covered, or {@link #MAX_HELD_FRAMES} seen frames have passed
     * (the object may really have changed size while it was covered).
     */
    private void updateHolding(Box at, double rho) {
        boolean covered = occlusion.oneSideCovered(image, at);
        if (!holding) {
            holding = covered;
            heldFrames = 0;
            similarityBeforeHold = typicalSimilarity;
        } else if (++heldFrames > MAX_HELD_FRAMES || !covered && rho >= similarityBeforeHold - RECOVERED_MARGIN) {
            holding = false;
        }
        if (!holding) {
            occlusion.learnUsual();
        }
    }

    /**
     * The similarity a frame needs to count as the object: the configured threshold, lowered when the object's
     * typical similarity has drifted down slowly (lighting, pose), but never under {@link #ACCEPT_FLOOR}. A hidden
     * object drops the similarity abruptly and still falls below it. Adapting the threshold to the running mean is
     * common practice with no single source.
     */
    private double acceptThreshold() {
        return Math.max(ACCEPT_FLOOR, Math.min(config.lostSimilarity(), ACCEPT_FRACTION * typicalSimilarity));
    }

    private double confidentThreshold() {
        return Math.min(config.confidentSimilarity(), typicalSimilarity - CONFIDENT_MARGIN);
    }

    /** {@code sized}, but at least as wide and as high as {@code held}: a covered object only grows back. */
    private static Box noSmallerThan(Box sized, Box held) {
        if (sized.width() >= held.width() && sized.height() >= held.height()) {
            return sized;
        }
        return Box.centredAt(sized.centreX(), sized.centreY(), Math.max(sized.width(), held.width()),
                Math.max(sized.height(), held.height()));
    }

    private Box adaptScale(Frame frame, Box located, double rho) {
        switch (config.scale()) {
            case TEN_PERCENT:
                return TenPercentScaleEstimator.adapt(localizer, image, located, located, rho, model.weighted,
                        model.target.values);
            case MOMENTS:
            case CHECKED_MOMENTS:
                return validatedMomentSize(frame, located, rho);
            case CENTRE_SURROUND:
                return centreSurroundSize(frame, located);
            default:
                return located;
        }
    }

    /** The centre-surround size, kept within the area bounds of the start box. */
    private Box centreSurroundSize(Frame frame, Box located) {
        double reach = 1.1 * CentreSurroundScale.SURROUND / 2 + 0.05;
        load(frame, located, reach, 2);
        Box proposed = surround.adapt(image, likelihood, located, startAspect);
        double grow = proposed.area() / startArea;
        if (grow < MIN_AREA_RATIO || grow > MAX_AREA_RATIO) {
            return located;
        }
        return proposed;
    }

    /**
     * The moment estimate proposes a size; it is taken only if the target candidate at that size is at least as
     * similar to the model as at the old size (less a small tolerance), so clutter of the target's colours next to
     * it cannot inflate the box step by step, and if the centre-surround response does not fall. A departure from
     * SOAMST, which takes the moment size as it is.
     */
    private Box validatedMomentSize(Frame frame, Box located, double rho) {
        Box proposed = moments.adapt(image, likelihood, located);
        if (proposed == located) {
            return located;
        }
        double grow = proposed.area() / startArea;
        if (grow < MIN_AREA_RATIO || grow > MAX_AREA_RATIO) {
            return located;
        }
        observed.compute(image, proposed);
        if (observed.bhattacharyya(model.target.values) < rho - SIZE_TOLERANCE) {
            return located;
        }
        if (config.scale() != ScaleMethod.CHECKED_MOMENTS) {
            return proposed;
        }
        // And only if the centre-surround response of the likelihood (CentreSurroundScale) does not fall: a box
        // that widens over a look-alike neighbour keeps its colours, but its surround loses the contrast.
        load(frame, located, Math.max(proposed.width() / located.width(), proposed.height() / located.height())
                * CentreSurroundScale.SURROUND / 2 + 0.05, 2);
        double before = surround.respondAt(image, likelihood, located.centreX(), located.centreY(),
                located.width() * coreW, located.height() * coreH);
        double after = surround.respondAt(image, likelihood, proposed.centreX(), proposed.centreY(),
                proposed.width() * coreW, proposed.height() * coreH);
        if (after < before) {
            return located;
        }
        return proposed;
    }

    /**
     * Every few tracked frames: the guarded model update, then the background refresh of Ning et al. The guard
     * compares the observation and the model with the background around the object now: an observation more like
     * the background than the model is does not teach the model (so it cannot learn the floor it drifts onto).
     * The blending rate per visit compounds the configured per-frame rate over the frames between visits.
     */
    private void learn(Frame frame, Box at) {
        if (tracked % LEARN_EVERY != 0) {
            return;
        }
        load(frame, at, 1, 1);
        float[] around = model.sampleBackground(image, at);
        boolean changed = false;
        if (config.modelUpdateRate() > 0) {
            observed.compute(image, at);
            double rho = observed.bhattacharyya(model.target.values);
            double modelLikeBackground = BhattacharyyaCoefficient.overBins(model.target.values, around,
                    model.target.touched, model.target.touchedCount);
            double seenLikeBackground = observed.bhattacharyya(around);
            if (rho >= Math.min(config.modelUpdateMinSimilarity(), acceptThreshold() + UPDATE_MARGIN)
                    && seenLikeBackground <= modelLikeBackground + UPDATE_BACKGROUND_GUARD) {
                model.blend(observed, 1 - Math.pow(1 - config.modelUpdateRate(), LEARN_EVERY));
                changed = true;
            }
        }
        if (model.adoptSampledBackground(config.backgroundRefresh())) {
            changed = true;
        }
        if (changed) {
            likelihood.update(model.target, model.background.values);
        }
    }

    /**
     * Bins the frame around {@code around}: {@code boxes} times the box's width and height, plus {@code margin}
     * pixels on each side (1 box takes in the background ring, which reaches half a box beyond the box itself).
     */
    private void load(Frame frame, Box around, double boxes, double margin) {
        int x0 = (int) Math.floor(around.centreX() - boxes * around.width() - margin);
        int y0 = (int) Math.floor(around.centreY() - boxes * around.height() - margin);
        int x1 = (int) Math.ceil(around.centreX() + boxes * around.width() + margin);
        int y1 = (int) Math.ceil(around.centreY() + boxes * around.height() + margin);
        if (!image.covers(frame, x0, y0, x1, y1)) {
            image.load(frame, x0, y0, x1, y1, light);
        }
    }

    /** The current box (the last output). */
    public Box box() {
        return box;
    }

    public boolean isLost() {
        return lost;
    }

    /** Whether the object is lost from view and being looked for. */
    public boolean isSearching() {
        return searching;
    }
}
