package org.modetrail.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;

/**
 * Each measure on small examples worked by hand from its published definition; the sources are named in the
 * measures' classes and beside each case.
 */
class MeasuresTest {
    private static final Box A = new Box(0, 0, 10, 10);
    private static final Box B = new Box(100, 0, 10, 10);

    private static LabelledBox at(int id, int frame, Box box) {
        return new LabelledBox(id, frame, box);
    }

    private static Annotations of(LabelledBox... boxes) {
        return Annotations.of(List.of(boxes));
    }

    // ------------------------------------------------------------------ OTB (Wu, Lim and Yang 2013, section 4.1)

    @Test
    void singleObjectFiguresOfFourFramesWorkedByHand() {
        Annotations truth = of(at(1, 0, A), at(1, 1, A), at(1, 2, A), at(1, 3, A),
                new LabelledBox(1, 4, A, 0.3)); // under half visible: not scored
        Annotations track = of(at(1, 0, A), at(1, 1, new Box(5, 0, 10, 10)), at(1, 3, new Box(10, 0, 10, 10)),
                at(1, 4, new Box(500, 500, 10, 10)));
        SingleObjectScore s = SingleObjectEvaluation.scores(truth, track).get(0);
        // IoUs 1, 50/150, 0 (no box), 0 (touching); centre errors 0, 5, infinite, 10.
        assertEquals(4, s.framesScored());
        // Above t: 2/4 for t = 0 .. 0.30 (7 points), 1/4 for t = 0.35 .. 0.95 (13 points), 0 at t = 1.
        assertEquals((7 * 0.5 + 13 * 0.25) / 21, s.successAuc(), 1e-12);
        assertEquals(0.75, s.precisionAt20(), 1e-12);
        assertEquals(0.25, s.successAt50(), 1e-12);
        assertEquals(2, s.framesUntilFailure());
        assertEquals(0.5, s.precisionCurve()[5], 1e-12, "errors 0 and 5 are within 5 px");
    }

    @Test
    void aBoxOffsetByAKnownAmountGivesItsKnownIoUAndArea() {
        // Shifted 2 px along a 10 px width: IoU = 8 / 12 = 2/3 on every frame; above t for t = 0 .. 0.65 (14 of the
        // 21 points), so the area is 14/21 = 2/3; centre error 2 px, within 20.
        List<LabelledBox> t = new ArrayList<>();
        List<LabelledBox> k = new ArrayList<>();
        for (int f = 0; f < 100; f++) {
            t.add(at(7, f, new Box(f, 20, 10, 10)));
            k.add(at(7, f, new Box(f + 2, 20, 10, 10)));
        }
        SingleObjectScore s = SingleObjectEvaluation.scores(Annotations.of(t), Annotations.of(k)).get(0);
        assertEquals(14.0 / 21, s.successAuc(), 1e-12);
        assertEquals(1, s.precisionAt20(), 1e-12);
        assertEquals(1, s.successAt50(), 1e-12);
        assertEquals(100, s.framesUntilFailure());
    }

    @Test
    void aTrackEqualToTheTruthScoresTwentyOfTwentyOnePoints() {
        SingleObjectScore s = SingleObjectEvaluation.scores(of(at(1, 0, A)), of(at(1, 0, A))).get(0);
        assertEquals(20.0 / 21, s.successAuc(), 1e-12);
    }

    @Test
    void aTruthObjectWithoutATrackOfItsIdScoresNothing() {
        SingleObjectScore s = SingleObjectEvaluation.scores(of(at(1, 0, A), at(1, 1, A)), of(at(2, 0, A))).get(0);
        assertEquals(0, s.successAuc(), 1e-12);
        assertEquals(0, s.precisionAt20(), 1e-12);
        assertEquals(0, s.framesUntilFailure());
    }

    // ----------------------------------------------------------- CLEAR MOT (Bernardin and Stiefelhagen 2008)

    /** Truth A and B on frames 0-3; track 1 on A then B (from frame 2), track 2 on B then A, track 3 a stray. */
    private static Annotations swapTruth() {
        return of(at(1, 0, A), at(1, 1, A), at(1, 2, A), at(1, 3, A), at(2, 0, B), at(2, 1, B), at(2, 2, B),
                at(2, 3, B));
    }

    private static Annotations swapTracks() {
        return of(at(1, 0, A), at(1, 1, A), at(1, 2, B), at(1, 3, B), at(2, 0, B), at(2, 1, B), at(2, 2, A),
                at(3, 3, new Box(200, 200, 10, 10)));
    }

    @Test
    void clearMotOfTwoObjectsSwappingTracks() {
        ClearMotScore s = ClearMot.score(swapTruth(), swapTracks(), 0.5);
        // 8 truth boxes; matches 2 + 2 + 2 + 1; A missed on frame 3; track 3 false; both truth objects change
        // track on frame 2: 2 switches. MOTA = 1 - (1 + 1 + 2) / 8 = 0.5; every match exact: MOTP 1.
        assertEquals(8, s.truthBoxes());
        assertEquals(7, s.matches());
        assertEquals(1, s.misses());
        assertEquals(1, s.falsePositives());
        assertEquals(2, s.idSwitches());
        assertEquals(0.5, s.mota(), 1e-12);
        assertEquals(1, s.motp(), 1e-12);
        // A matched on 3 of 4 frames (75%: partly), B on 4 of 4 (mostly tracked).
        assertEquals(1, s.mostlyTracked());
        assertEquals(1, s.partiallyTracked());
        assertEquals(0, s.mostlyLost());
    }

    @Test
    void aCorrespondenceStillAllowedIsKeptOverABetterNewcomer() {
        // Section 2.1.1 of the paper: the previous frame's pair is kept while its IoU is over the threshold, even
        // if another track fits better now. Frame 1: track 1 at IoU 80/120, track 2 exact; no switch, 1 false.
        Annotations truth = of(at(1, 0, A), at(1, 1, A));
        Annotations tracks = of(at(1, 0, A), at(1, 1, new Box(2, 0, 10, 10)), at(2, 1, A));
        ClearMotScore s = ClearMot.score(truth, tracks, 0.5);
        assertEquals(0, s.idSwitches());
        assertEquals(1, s.falsePositives());
        assertEquals((1 + 80.0 / 120) / 2, s.motp(), 1e-12);
        assertEquals(1 - 1.0 / 2, s.mota(), 1e-12);
    }

    @Test
    void aSwitchIsCountedAgainstTheLastMatchEvenAcrossAGap() {
        // Frame 1 has no track box (a miss); frame 2 brings track 2: a switch from track 1, matched on frame 0.
        Annotations truth = of(at(1, 0, A), at(1, 1, A), at(1, 2, A));
        Annotations tracks = of(at(1, 0, A), at(2, 2, A));
        ClearMotScore s = ClearMot.score(truth, tracks, 0.5);
        assertEquals(1, s.idSwitches());
        assertEquals(1, s.misses());
        assertEquals(1 - 2.0 / 3, s.mota(), 1e-12);
    }

    @Test
    void noTruthNoTracksAndIdsThatNeverMatch() {
        ClearMotScore none = ClearMot.score(Annotations.empty(), of(at(1, 0, A)), 0.5);
        assertTrue(Double.isNaN(none.mota()), "MOTA needs truth boxes");
        assertEquals(1, none.falsePositives());
        ClearMotScore lost = ClearMot.score(of(at(1, 0, A), at(1, 5, A)), Annotations.empty(), 0.5);
        assertEquals(0, lost.mota(), 1e-12, "1 - 2/2");
        assertEquals(1, lost.mostlyLost());
        assertTrue(Double.isNaN(lost.motp()));
        // Boxes in the same frames that never overlap enough: every truth box missed, every track box false.
        ClearMotScore apart = ClearMot.score(of(at(1, 0, A), at(1, 1, A)),
                of(at(9, 0, new Box(6, 0, 10, 10)), at(9, 1, B)), 0.5);
        assertEquals(0, apart.matches());
        assertEquals(1 - 4.0 / 2, apart.mota(), 1e-12, "MOTA falls below 0 with more errors than truth");
    }

    // ----------------------------------------------------------------------- IDF1 (Ristani et al. 2016)

    @Test
    void idf1OfTheSwapPairsWholeTrajectories() {
        IdentityScore s = IdentityMeasures.score(swapTruth(), swapTracks(), 0.5);
        // Shared boxes: A-1 2, A-2 1, B-1 2, B-2 2; the best one-to-one pairing A-1, B-2 shares 4.
        assertEquals(4, s.idTruePositives());
        assertEquals(0.5, s.idf1(), 1e-12, "2 x 4 / (8 + 8)");
        assertEquals(0.5, s.idPrecision(), 1e-12);
        assertEquals(0.5, s.idRecall(), 1e-12);
        assertEquals(4, s.idFalseNegatives());
        assertEquals(4, s.idFalsePositives());
    }

    @Test
    void idf1MatchesTheBestPairingByEnumerationOnRandomScenes() {
        // The definition directly: IDTP is the most boxes any one-to-one pairing of trajectories and tracks shares.
        java.util.Random r = new java.util.Random(17);
        for (int trial = 0; trial < 100; trial++) {
            int ng = 1 + r.nextInt(5);
            int nt = 1 + r.nextInt(5);
            List<LabelledBox> g = new ArrayList<>();
            List<LabelledBox> t = new ArrayList<>();
            for (int f = 0; f < 12; f++) {
                for (int i = 0; i < ng; i++) {
                    if (r.nextInt(4) > 0) {
                        g.add(at(i + 1, f, new Box(30 * i + r.nextInt(3), 0, 20, 20)));
                    }
                }
                for (int j = 0; j < nt; j++) {
                    if (r.nextInt(4) > 0) {
                        t.add(at(j + 1, f, new Box(30 * r.nextInt(ng) + r.nextInt(6), 0, 20, 20)));
                    }
                }
            }
            Annotations truth = Annotations.of(g);
            Annotations tracks = Annotations.of(t);
            int[][] shared = new int[ng + 1][nt + 1];
            for (LabelledBox a : g) {
                for (LabelledBox b : tracks.onFrame(a.frame())) {
                    if (a.box().iou(b.box()) >= 0.5) {
                        shared[a.id()][b.id()]++;
                    }
                }
            }
            int best = bestPairing(shared, 1, new boolean[nt + 1]);
            assertEquals(best, IdentityMeasures.score(truth, tracks, 0.5).idTruePositives(), "trial " + trial);
        }
    }

    private static int bestPairing(int[][] shared, int row, boolean[] used) {
        if (row == shared.length) {
            return 0;
        }
        int best = bestPairing(shared, row + 1, used);
        for (int c = 1; c < used.length; c++) {
            if (!used[c]) {
                used[c] = true;
                best = Math.max(best, shared[row][c] + bestPairing(shared, row + 1, used));
                used[c] = false;
            }
        }
        return best;
    }

    @Test
    void thousandsOfObjectsOnAnHourLongVideoAreMeasuredWhole() {
        // 3000 objects, each on screen for 30 frames, a few at a time, each followed exactly by a track of its own
        // under another id: every measure is perfect (the sparse pairing keeps this small).
        List<LabelledBox> g = new ArrayList<>();
        List<LabelledBox> t = new ArrayList<>();
        for (int k = 0; k < 3000; k++) {
            for (int f = 10 * k; f < 10 * k + 30; f++) {
                Box b = new Box(40 * (k % 3), 0, 30, 30);
                g.add(at(k + 1, f, b));
                t.add(at(k + 5001, f, b));
            }
        }
        Annotations truth = Annotations.of(g);
        Annotations tracks = Annotations.of(t);
        assertEquals(1, IdentityMeasures.score(truth, tracks, 0.5).idf1(), 1e-12);
        assertEquals(1, Hota.score(truth, tracks).hota(), 1e-12);
        ClearMotScore c = ClearMot.score(truth, tracks, 0.5);
        assertEquals(1, c.mota(), 1e-12);
        assertEquals(3000, c.mostlyTracked());
    }

    @Test
    void idf1WithoutTracksIsZeroAndWithNothingUndefined() {
        assertEquals(0, IdentityMeasures.score(swapTruth(), Annotations.empty(), 0.5).idf1(), 1e-12);
        assertTrue(Double.isNaN(IdentityMeasures.score(Annotations.empty(), Annotations.empty(), 0.5).idf1()));
    }

    // ------------------------------------------------------------------------ HOTA (Luiten et al. 2021)

    @Test
    void hotaOfOneObjectTrackedByTwoTracksInTurn() {
        // Every box exact: DetA = 1 at every alpha. A(c) = 2 / (4 + 2 - 2) = 0.5 for both pairs, so AssA = 0.5
        // and HOTA = sqrt(0.5) at every alpha (the paper's figure 2 makes the same point).
        Annotations truth = of(at(1, 0, A), at(1, 1, A), at(1, 2, A), at(1, 3, A));
        Annotations tracks = of(at(1, 0, A), at(1, 1, A), at(2, 2, A), at(2, 3, A));
        HotaScore s = Hota.score(truth, tracks);
        assertEquals(1, s.detA(), 1e-12);
        assertEquals(0.5, s.assA(), 1e-12);
        assertEquals(Math.sqrt(0.5), s.hota(), 1e-12);
        assertEquals(1, s.locA(), 1e-12);
    }

    @Test
    void hotaOfABoxAtIoU06CountsTheAlphasUpTo06() {
        // IoU exactly 60/100 on every frame: true positives for alpha = 0.05 .. 0.60 (12 of 19), then none.
        Annotations truth = of(at(1, 0, A), at(1, 1, A));
        Annotations tracks = of(at(4, 0, new Box(0, 0, 10, 6)), at(4, 1, new Box(0, 0, 10, 6)));
        HotaScore s = Hota.score(truth, tracks);
        assertEquals(12.0 / 19, s.hota(), 1e-12);
        assertEquals(12.0 / 19, s.detA(), 1e-12);
        assertEquals(1, s.hotaByAlpha()[11], 1e-12);
        assertEquals(0, s.hotaByAlpha()[12], 1e-12);
        assertEquals(0.6, s.locA(), 1e-12);
    }

    @Test
    void hotaWithoutTracksIsZero() {
        assertEquals(0, Hota.score(swapTruth(), Annotations.empty()).hota(), 1e-12);
        assertTrue(Double.isNaN(Hota.score(Annotations.empty(), Annotations.empty()).hota()));
    }

    @Test
    void twoBoxesOfOneIdOnOneFrameAreRefusedWithBoth() {
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> of(at(3, 7, A), at(3, 7, B)));
        assertTrue(e.getMessage().contains("id 3") && e.getMessage().contains("frame 7"), e.getMessage());
    }
}
