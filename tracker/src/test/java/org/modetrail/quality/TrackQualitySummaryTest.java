package org.modetrail.quality;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Presence;
import org.modetrail.model.Track;

class TrackQualitySummaryTest {
    @Test
    void countsFramesBySourceAndFindsJumpsSizeChangesAndWeakSpans() {
        Map<Integer, FrameAnnotation> frames = new TreeMap<>();
        frames.put(0, FrameAnnotation.keyframe(0, new Box(0, 0, 40, 30)));
        for (int f = 1; f < 20; f++) {
            double score = f >= 5 && f <= 8 ? 0.5 : 0.9; // frames 5..8 weak
            frames.put(f, FrameAnnotation.tracked(f, new Box(2 * f, 0, 40, 30), score));
        }
        frames.put(20, FrameAnnotation.tracked(20, new Box(200, 0, 40, 30), 0.9)); // a jump of 160 px: 3.2 diagonals
        frames.put(21, FrameAnnotation.tracked(21, new Box(200, 0, 60, 45), 0.9)); // area x2.25
        frames.put(22, FrameAnnotation.interpolated(22, new Box(200, 0, 60, 45)));
        frames.put(23, FrameAnnotation.markedBy(23, Presence.HIDDEN));
        TrackQuality q = TrackQualitySummary.defaults().of(new Track(1, "animal", "", frames), 30);
        assertEquals(1, q.keyframes());
        assertEquals(21, q.tracked());
        assertEquals(1, q.interpolated());
        assertEquals(1, q.marked());
        assertEquals(6, q.empty());
        assertEquals(List.of(
                new Concern(Concern.Kind.JUMP, 19, 20, 162 / 50.0),
                new Concern(Concern.Kind.SIZE_CHANGE, 20, 21, 2.25),
                new Concern(Concern.Kind.WEAK_SPAN, 5, 8, 0.5)), q.concerns());
        assertEquals((17 * 0.9 + 4 * 0.5) / 21, q.meanScore(), 1e-9);
    }

    @Test
    void aBoxThatGrowsStepByStepIsASizeDriftThoughNoStepIsAbrupt() {
        // 6% more width a frame: no step reaches the 1.3 area ratio of an abrupt change, but by frame 24 the box is
        // over 4 times the keyframe's area (1.06^48 = 16.4 at the end): the balloon of a box widening over a group.
        Map<Integer, FrameAnnotation> frames = new TreeMap<>();
        frames.put(0, FrameAnnotation.keyframe(0, new Box(100, 100, 20, 50)));
        for (int f = 1; f <= 48; f++) {
            frames.put(f, FrameAnnotation.tracked(f, new Box(100, 100, 20 * Math.pow(1.06, f), 50), 0.9));
        }
        TrackQuality q = TrackQualitySummary.defaults().of(new Track(1, "person", "", frames), 49);
        int first = (int) Math.ceil(Math.log(4) / Math.log(1.06)); // 24: the first frame over 4 times
        assertEquals(List.of(new Concern(Concern.Kind.SIZE_DRIFT, first, 48, Math.pow(1.06, 48))), q.concerns());
        // The same boxes once the user has confirmed the grown size with a keyframe at frame 40 (an object that came
        // nearer): every tracked frame is within 4 times of its nearest keyframe, so nothing drifts.
        frames.put(40, FrameAnnotation.keyframe(40, new Box(100, 100, 20 * Math.pow(1.06, 40), 50)));
        q = TrackQualitySummary.defaults().of(new Track(1, "person", "", frames), 49);
        assertEquals(List.of(), q.concerns());
    }
}
