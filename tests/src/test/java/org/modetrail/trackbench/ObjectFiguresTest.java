package org.modetrail.trackbench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;

/**
 * The report's per-object figures worked by hand on a ten-frame object: the OTB success AUC (Wu, Lim and Yang 2013,
 * strict "above" as {@link TrackMetricsTest} shows), the start frame, failures (no box, IoU 0, or a box of more than
 * 4 times the truth's area), and the two kinds of false re-acquisition.
 */
class ObjectFiguresTest {
    static final Box T = new Box(100, 100, 10, 10);
    static final TruthBox OUT = new TruthBox(new Box(0, 0, 0, 0), 0);

    /** Frames 0-1 out of view, 2 only 40% visible, 3-9 fully visible at T. */
    static ObjectTruth truth() {
        TruthBox[] t = new TruthBox[10];
        for (int f = 0; f < 10; f++) {
            t[f] = f < 2 ? OUT : new TruthBox(T, f == 2 ? 0.4 : 1);
        }
        return new ObjectTruth(7, t);
    }

    @Test
    void theRunStartsOnTheFirstHalfVisibleFrameAndAPerfectTrackScoresTwentyOverTwentyOne() {
        ObjectTruth o = truth();
        assertEquals(3, o.start());
        Box[] boxes = new Box[10];
        for (int f = 3; f < 10; f++) {
            boxes[f] = T;
        }
        ObjectFigures s = ObjectFigures.score("k", 1, "t", o, boxes, 0, 1, 1);
        assertEquals(6, s.scored()); // frames 4..9
        assertEquals(20.0 / 21, s.auc(), 1e-12);
        assertEquals(1, s.precision20(), 0);
        assertFalse(s.failed());
        assertEquals(6, s.framesToFailure()); // to the last scored frame, 9
        assertEquals(6, s.tracked());
        assertEquals(7, s.effortFrames());
    }

    @Test
    void aBalloonedBoxIsAFailureThoughItOverlaps() {
        // Frame 5: a 30x30 box around the 10x10 truth, 9 times its area, IoU 1/9 > 0 but ballooned.
        Box[] boxes = new Box[10];
        for (int f = 3; f < 10; f++) {
            boxes[f] = f == 5 ? new Box(90, 90, 30, 30) : T;
        }
        ObjectFigures s = ObjectFigures.score("k", 1, "t", truth(), boxes, 0, 1, 1);
        assertTrue(s.failed());
        assertEquals(2, s.framesToFailure());
    }

    @Test
    void falseReacquisitionsAreCountedApart() {
        // Frame 4 no box (a failure, IoU 0), frame 5 a box 50 px away after none (wrong re-acquisition), frame 6 a
        // right box after a box (not a re-acquisition). Frames 0-1 out of view lie before the start: not counted.
        Box[] boxes = new Box[10];
        for (int f = 3; f < 10; f++) {
            boxes[f] = T;
        }
        boxes[0] = T;
        boxes[4] = null;
        boxes[5] = new Box(150, 100, 10, 10);
        ObjectFigures s = ObjectFigures.score("k", 1, "t", truth(), boxes, 0, 1, 1);
        assertEquals(1, s.wrongReacquired());
        assertEquals(0, s.boxesWhileAbsent());
        assertEquals(1, s.framesToFailure());
        // Frames 4, 5 score IoU 0; 6..9 perfect: AUC (4 * 20/21) / 6.
        assertEquals(4 * 20.0 / 21 / 6, s.auc(), 1e-12);
    }

    @Test
    void aBoxOnAnObjectThatHasLeftTheFrameIsCounted() {
        // The object leaves after frame 6; the tracker goes on reporting boxes on frames 7-9.
        TruthBox[] t = new TruthBox[10];
        for (int f = 0; f < 10; f++) {
            t[f] = f <= 6 ? new TruthBox(T, 1) : OUT;
        }
        Box[] boxes = new Box[10];
        java.util.Arrays.fill(boxes, T);
        ObjectFigures s = ObjectFigures.score("k", 1, "t", new ObjectTruth(1, t), boxes, 0, 1, 1);
        assertEquals(3, s.boxesWhileAbsent());
        assertEquals(0, s.wrongReacquired());
        assertFalse(s.failed());
        assertEquals(6, s.framesToFailure());
    }

    @Test
    void linesRoundTrip() {
        Box[] boxes = new Box[10];
        boxes[6] = T;
        ObjectFigures s = ObjectFigures.score("kind-a", 12, "opencv-kcf", truth(), boxes, 3, 0.25, 1.5);
        ObjectFigures back = ObjectFigures.parse(s.csv());
        assertEquals(s.csv(), back.csv());
        assertEquals(3, back.keyframes());
    }
}
