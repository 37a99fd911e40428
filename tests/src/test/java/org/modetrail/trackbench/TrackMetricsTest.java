package org.modetrail.trackbench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;

/**
 * The OTB figures (Wu, Lim and Yang, CVPR 2013) against worked examples computed by hand. Frame 0 is the start frame
 * in each and is never scored.
 */
class TrackMetricsTest {
    static final Box TRUTH = new Box(100, 100, 10, 10);

    static List<TruthBox> truth(int frames) {
        List<TruthBox> t = new ArrayList<>();
        for (int f = 0; f < frames; f++) {
            t.add(new TruthBox(TRUTH, 1));
        }
        return t;
    }

    static List<Box> same(int frames, Box box) {
        List<Box> b = new ArrayList<>();
        for (int f = 0; f < frames; f++) {
            b.add(box);
        }
        return b;
    }

    @Test
    void perfectTrackScoresTwentyOverTwentyOne() {
        // IoU 1 is above thresholds 0..0.95 (20 of them) and not above 1: 20/21 = 0.952, the figure.
        TrackScore s = TrackMetrics.score(same(11, TRUTH), truth(11), 0);
        assertEquals(20.0 / 21, s.successAuc(), 1e-12);
        assertEquals(0.952, s.successAuc(), 5e-4);
        assertEquals(1.0, s.precision20(), 0);
        assertEquals(10, s.framesUntilFailure());
        assertEquals(10, s.scoredFrames());
    }

    @Test
    void iouOfOneHalfOnEveryFrame() {
        // (100,100,20,10) against (100,100,10,10): intersection 100, union 200, IoU exactly 0.5. Above thresholds
        // 0, 0.05, ..., 0.45 (10 of 21), not above 0.5 (strict): AUC 10/21. Centres 5 px apart: precise.
        Box wide = new Box(100, 100, 20, 10);
        assertEquals(0.5, wide.iou(TRUTH), 0);
        TrackScore s = TrackMetrics.score(same(6, wide), truth(6), 0);
        assertEquals(10.0 / 21, s.successAuc(), 1e-12);
        assertEquals(1.0, s.precision20(), 0);
        assertEquals(5, s.framesUntilFailure());
    }

    @Test
    void failureHalfwayHalvesTheScoreAndIsCounted() {
        // Frames 1..4 perfect, 5..8 disjoint: AUC (4 * 20/21 + 4 * 0) / 8 = 10/21; first failure on frame 5, after
        // 4 tracked frames; the disjoint box is 50 px away, so precision is 4/8.
        List<Box> b = same(9, TRUTH);
        Box away = new Box(150, 100, 10, 10);
        for (int f = 5; f <= 8; f++) {
            b.set(f, away);
        }
        TrackScore s = TrackMetrics.score(b, truth(9), 0);
        assertEquals(10.0 / 21, s.successAuc(), 1e-12);
        assertEquals(0.5, s.precision20(), 0);
        assertEquals(4, s.framesUntilFailure());
        assertEquals(8, s.trackedFrames());
    }

    @Test
    void hiddenFramesAreNotScoredNorFailures() {
        // Frame 2 is 40% visible and its box is wrong: left out, so the rest (perfect) scores 20/21 and no failure.
        List<TruthBox> t = truth(5);
        t.set(2, new TruthBox(TRUTH, 0.4));
        List<Box> b = same(5, TRUTH);
        b.set(2, new Box(300, 300, 10, 10));
        TrackScore s = TrackMetrics.score(b, t, 0);
        assertEquals(20.0 / 21, s.successAuc(), 1e-12);
        assertEquals(4, s.framesUntilFailure());
        assertEquals(3, s.scoredFrames());
        // At exactly half visible it is scored (visible < 0.5 is what is left out), and then it fails on frame 2.
        t.set(2, new TruthBox(TRUTH, 0.5));
        TrackScore counted = TrackMetrics.score(b, t, 0);
        assertEquals(1, counted.framesUntilFailure());
        assertEquals(0.75 * 20 / 21, counted.successAuc(), 1e-12);
    }

    @Test
    void precisionCountsTwentyPixelsButNotMore() {
        // OTB counts centre error <= 20 px. Shift by 20 px along x (IoU 0) and by 21 px.
        List<Box> b = same(3, TRUTH);
        b.set(1, new Box(120, 100, 10, 10));
        b.set(2, new Box(121, 100, 10, 10));
        TrackScore s = TrackMetrics.score(b, truth(3), 0);
        assertEquals(0.5, s.precision20(), 0);
        assertEquals(0, s.successAuc(), 0);
        assertEquals(0, s.framesUntilFailure());
    }

    @Test
    void aGradedTrackByHand() {
        // Tracked IoUs 0.9, 0.3, 0.02 (boxes of height 10 shifted along x): count above t for t = 0..1 step 0.05:
        // 0.9 is above 18 thresholds (0..0.85), 0.3 above 6 (0..0.25), 0.02 above 1 (0): (18 + 6 + 1) / (3 * 21).
        List<Box> b = new ArrayList<>(List.of(TRUTH, shiftedTo(0.9), shiftedTo(0.3), shiftedTo(0.02)));
        assertEquals(0.9, b.get(1).iou(TRUTH), 1e-12);
        TrackScore s = TrackMetrics.score(b, truth(4), 0);
        assertEquals(25.0 / 63, s.successAuc(), 1e-12);
        assertEquals(3, s.framesUntilFailure());
    }

    /** A 10x10 box shifted along x so its IoU with TRUTH is {@code iou}: overlap w gives w / (20 - w) = iou. */
    static Box shiftedTo(double iou) {
        double w = 20 * iou / (1 + iou);
        return new Box(TRUTH.x() + 10 - w, TRUTH.y(), 10, 10);
    }
}
