package org.modetrail.video;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class FrameIndexTest {

    private static FrameIndex constant(int frames, long step, int keyEvery) {
        long[] pts = new long[frames];
        boolean[] key = new boolean[frames];
        for (int i = 0; i < frames; i++) {
            pts[i] = 1000 + i * step;
            key[i] = i % keyEvery == 0;
        }
        return new FrameIndex(pts, key, 1, 12800);
    }

    @Test
    void timesCountFromTheFirstFrameWhileRawTimestampsStayAsStored() {
        FrameIndex index = constant(10, 512, 5); // 25 fps in a 1/12800 time base, as ffmpeg's mp4 muxer writes
        assertEquals(0.0, index.timeSeconds(0));
        assertEquals(0.04, index.timeSeconds(1), 1e-12);
        assertEquals(1000 / 12800.0, index.ptsSeconds(0), 1e-12);
    }

    @Test
    void meanRateAndDurationFollowTheTimestamps() {
        FrameIndex index = constant(251, 512, 250);
        assertEquals(25.0, index.meanFrameRate(), 1e-9);
        assertEquals(251 / 25.0, index.durationSeconds(), 1e-9); // the last frame lasts one interval
        assertEquals(2, index.keyframeCount());
    }

    @Test
    void keyframeAtOrBeforeFindsTheDecoderStart() {
        FrameIndex index = constant(30, 512, 10);
        assertEquals(0, index.keyframeAtOrBefore(9));
        assertEquals(10, index.keyframeAtOrBefore(10));
        assertEquals(20, index.keyframeAtOrBefore(29));
    }

    @Test
    void frameWithPtsIsExactAndFrameAtTimeRoundsDown() {
        FrameIndex index = constant(10, 512, 5);
        assertEquals(3, index.frameWithPts(1000 + 3 * 512));
        assertEquals(-1, index.frameWithPts(1001));
        assertEquals(3, index.frameAtTime(0.125)); // 0.12 s starts frame 3, 0.16 s frame 4
        assertEquals(0, index.frameAtTime(-1));
        assertEquals(9, index.frameAtTime(100));
    }

    @Test
    void ntscRateInAMillisecondTimeBaseIsConstant() {
        // 30000/1001 fps stored in milliseconds (as Matroska does) alternates 33 and 34 ms: still constant rate.
        long[] pts = new long[100];
        boolean[] key = new boolean[100];
        for (int i = 0; i < pts.length; i++) {
            pts[i] = Math.round(i * 1001 / 30.0);
        }
        FrameIndex index = new FrameIndex(pts, key, 1, 1000);
        assertFalse(index.isVariableFrameRate());
        assertEquals(29.97, index.meanFrameRate(), 0.01);
    }

    @Test
    void unevenIntervalsAreVariable() {
        long[] pts = {0, 40, 80, 160, 200, 210, 250};
        FrameIndex index = new FrameIndex(pts, new boolean[pts.length], 1, 1000);
        assertTrue(index.isVariableFrameRate());
    }

    @Test
    void rejectsTimestampsOutOfOrder() {
        assertThrows(IllegalArgumentException.class,
                () -> new FrameIndex(new long[] {0, 40, 40}, new boolean[3], 1, 1000));
    }

    @Test
    void packetsInDecodeOrderAreSortedIntoPresentationOrder() {
        // I P B B as an encoder with B-frames emits them: the P frame is shown after the two B frames.
        long[] decodeOrder = {0, 3, 1, 2};
        boolean[] key = {true, false, false, false};
        FrameIndex index = FrameIndexer.presentationOrder(decodeOrder, key, 4, 1, 25);
        assertEquals(4, index.frameCount());
        for (int i = 0; i < 4; i++) {
            assertEquals(i, index.pts(i));
        }
        assertTrue(index.isKeyframe(0));
        assertFalse(index.isKeyframe(3));
    }

    @Test
    void aRepeatedTimestampKeepsOneFrame() {
        FrameIndex index = FrameIndexer.presentationOrder(new long[] {0, 1, 1, 2}, new boolean[4], 4, 1, 25);
        assertEquals(3, index.frameCount());
    }
}
