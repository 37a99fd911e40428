package org.modetrail.trackbench;

import java.util.List;

import org.modetrail.evaluation.SingleObjectEvaluation;
import org.modetrail.model.Box;

/**
 * The one-pass evaluation of Wu, Lim and Yang, "Online object tracking: a benchmark" (CVPR 2013, OTB), section 4:
 * the success plot (fraction of frames whose overlap IoU is above each threshold t = 0, 0.05, ..., 1, and its area
 * taken as the mean over those 21 thresholds) and the precision plot at 20 px centre error.
 *
 * <p>The comparisons are as in the OTB toolkit's code (from memory: {@code errCoverage > threshold} for success,
 * {@code errCenter <= threshold} for precision). With the strict "above", threshold 0 counts frames with IoU > 0 and
 * threshold 1 counts none, so a perfect track scores 20/21 = 0.952, the figure the tracking issue quotes.
 *
 * <p>Our choices, not the paper's: the start frame is not scored (its box is given, not tracked), and frames where
 * the object is less than half visible are left out of every figure (there is no right box to compare with).
 */
public final class TrackMetrics {
    /** Thresholds 0, 0.05, ..., 1. */
    public static final int SUCCESS_THRESHOLDS = 21;
    /** OTB's representative precision threshold (Wu et al. 2013, section 4.1). */
    public static final double PRECISION_PX = 20;
    /** Truth less visible than this is not scored. */
    public static final double MIN_VISIBLE = 0.5;

    private TrackMetrics() {
    }

    /**
     * @param tracked    the tracker's box on each frame, indexed by frame, null where it reported none; entries at
     *                   and before {@code start} are ignored
     * @param truth      the truth on each frame, same indexing
     * @param startFrame the frame the tracker was started on
     */
    public static TrackScore score(List<Box> tracked, List<TruthBox> truth, int startFrame) {
        if (tracked.size() != truth.size()) {
            throw new IllegalArgumentException(tracked.size() + " tracked boxes for " + truth.size() + " truth boxes");
        }
        int frames = truth.size();
        double[] ious = new double[frames];
        int scored = 0;
        int precise = 0;
        int untilFailure = -1;
        for (int f = startFrame + 1; f < frames; f++) {
            TruthBox t = truth.get(f);
            if (t.visible() < MIN_VISIBLE) {
                continue;
            }
            Box b = tracked.get(f);
            double iou = b == null ? 0 : b.iou(t.box()); // no box this frame: IoU 0, never precise
            ious[scored++] = iou;
            if (b != null && b.centreDistance(t.box()) <= PRECISION_PX) {
                precise++;
            }
            if (iou == 0 && untilFailure < 0) {
                untilFailure = f - startFrame - 1;
            }
        }
        int trackedFrames = Math.max(0, frames - startFrame - 1);
        return new TrackScore(successAuc(ious, scored), scored == 0 ? 0 : (double) precise / scored,
                untilFailure < 0 ? trackedFrames : untilFailure, trackedFrames, scored);
    }

    /** Mean over the 21 thresholds of the fraction of {@code ious[0..count)} strictly above the threshold. */
    public static double successAuc(double[] ious, int count) {
        return count == 0 ? 0 : SingleObjectEvaluation.successAuc(ious, count);
    }
}
