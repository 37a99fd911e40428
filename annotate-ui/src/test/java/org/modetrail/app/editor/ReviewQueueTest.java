package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.modetrail.app.editor.ReviewQueue.Spot;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.quality.Concern.Kind;
import org.modetrail.quality.TrackQualitySummary;

/**
 * Worked by hand with the default summary (weak under 0.7, jump over 0.5 box diagonals, area ratio over 1.3).
 * Boxes are 30 x 40 (diagonal 50) unless said otherwise.
 */
class ReviewQueueTest {
    private static final int FRAMES = 20;
    private static final TrackQualitySummary SUMMARY = TrackQualitySummary.defaults();
    private static final ObjectClass ANIMAL = new ObjectClass("animal", 0xE69F00);

    private static Box at(double cx, double cy) {
        return Box.centredAt(cx, cy, 30, 40);
    }

    /**
     * Track 1: keyframe 0 at (100, 100), tracked 1-4 there (0.9); frame 5 and 6 at (150, 100): a jump of
     * 50 / 50 = 1.0 diagonals on frames 4-5; frames 7 and 8 tracked at 0.4 and 0.6: a weak span 7-8 of mean 0.5;
     * keyframe 9. With {@code jumpFixed} frames 5-8 stay at (100, 100) and there is no jump.
     */
    private static Track track1(boolean jumpFixed, int weakFrom) {
        TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
        m.put(0, FrameAnnotation.keyframe(0, at(100, 100)));
        double x = jumpFixed ? 100 : 150;
        for (int f = 1; f <= 8; f++) {
            Box b = f <= 4 ? at(100, 100) : at(x, 100);
            double score = f >= weakFrom && f <= 8 ? (f == 7 ? 0.4 : f == 8 ? 0.6 : 0.5) : 0.9;
            m.put(f, FrameAnnotation.tracked(f, b, score));
        }
        m.put(9, FrameAnnotation.keyframe(9, at(x, 100)));
        return new Track(1, "animal", "", m);
    }

    /**
     * Track 2: keyframe 0 and tracked 1 at (100, 100); tracked 2 and 3 at (200, 100): a jump of 100 / 50 = 2.0
     * diagonals on frames 1-2; tracked 4 grows to 36 x 48 about the same centre: area 1728 / 1200 = 1.44 on frames
     * 3-4; tracked 5 at 0.3: a weak span of one frame; keyframe 6. With {@code jumpFixed} frames 2-6 stay at
     * (100, 100).
     */
    private static Track track2(boolean jumpFixed) {
        double x = jumpFixed ? 100 : 200;
        TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
        m.put(0, FrameAnnotation.keyframe(0, at(100, 100)));
        m.put(1, FrameAnnotation.tracked(1, at(100, 100), 0.9));
        m.put(2, FrameAnnotation.tracked(2, at(x, 100), 0.9));
        m.put(3, FrameAnnotation.tracked(3, at(x, 100), 0.9));
        m.put(4, FrameAnnotation.tracked(4, Box.centredAt(x, 100, 36, 48), 0.9));
        m.put(5, FrameAnnotation.tracked(5, Box.centredAt(x, 100, 36, 48), 0.3));
        m.put(6, FrameAnnotation.keyframe(6, Box.centredAt(x, 100, 36, 48)));
        return new Track(2, "animal", "", m);
    }

    /** Track 3: four keyframes on the same box, nothing to check. */
    private static Track track3() {
        TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
        for (int f = 10; f < 14; f++) {
            m.put(f, FrameAnnotation.keyframe(f, at(300, 300)));
        }
        return new Track(3, "animal", "", m);
    }

    private static Project project(Track... tracks) {
        return new Project(new VideoRef("v.mp4", 640, 480, FRAMES, ""), List.of(ANIMAL), List.of(tracks));
    }

    private static Project original() {
        return project(track1(false, 7), track2(false), track3());
    }

    private static void assertSpot(Spot s, int track, int from, int to, Kind kind, String reason) {
        assertEquals(track, s.trackId(), "track of " + s);
        assertEquals(from, s.from(), "from of " + s);
        assertEquals(to, s.to(), "to of " + s);
        assertEquals(kind, s.kind(), "kind of " + s);
        assertEquals(reason, s.reason(), "reason of " + s);
    }

    @Test
    void allTracksWorstFirst() {
        List<Spot> spots = ReviewQueue.of(original(), FRAMES, SUMMARY).spots();
        assertEquals(5, spots.size(), spots.toString());
        assertSpot(spots.get(0), 2, 1, 2, Kind.JUMP, "jump of 2.0 box diagonals");
        assertSpot(spots.get(1), 1, 4, 5, Kind.JUMP, "jump of 1.0 box diagonals");
        assertSpot(spots.get(2), 2, 3, 4, Kind.SIZE_CHANGE, "size x1.44");
        assertSpot(spots.get(3), 2, 5, 5, Kind.WEAK_SPAN, "similarity 0.30");
        assertSpot(spots.get(4), 1, 7, 8, Kind.WEAK_SPAN, "similarity 0.50");
        assertEquals("track 1, frames 7-8: similarity 0.50", spots.get(4).describe());
        assertEquals("frame 5", spots.get(3).frames());
    }

    @Test
    void equalSpotsGoByTrackThenFrame() {
        // Tracks 1 and 4 are the same track under two ids: their spots pair up, track 1's first.
        Project p = project(track1(false, 7), track1(false, 7).withId(4));
        List<Spot> spots = ReviewQueue.of(p, FRAMES, SUMMARY).spots();
        assertEquals(List.of(1, 4, 1, 4), spots.stream().map(Spot::trackId).toList());
        assertEquals(List.of(Kind.JUMP, Kind.JUMP, Kind.WEAK_SPAN, Kind.WEAK_SPAN),
                spots.stream().map(Spot::kind).toList());
    }

    @Test
    void nextAndPreviousWrapAround() {
        ReviewQueue q = ReviewQueue.of(original(), FRAMES, SUMMARY);
        assertTrue(q.current().isEmpty());
        assertEquals(-1, q.position());
        assertSpot(q.next().orElseThrow(), 2, 1, 2, Kind.JUMP, "jump of 2.0 box diagonals");
        assertSpot(q.next().orElseThrow(), 1, 4, 5, Kind.JUMP, "jump of 1.0 box diagonals");
        assertEquals(1, q.position());
        assertSpot(q.previous().orElseThrow(), 2, 1, 2, Kind.JUMP, "jump of 2.0 box diagonals");
        assertSpot(q.previous().orElseThrow(), 1, 7, 8, Kind.WEAK_SPAN, "similarity 0.50");
        assertSpot(q.next().orElseThrow(), 2, 1, 2, Kind.JUMP, "jump of 2.0 box diagonals");
        assertEquals(q.spots().get(0), q.current().orElseThrow());
    }

    @Test
    void previousFromTheStartGoesToTheLast() {
        ReviewQueue q = ReviewQueue.of(original(), FRAMES, SUMMARY);
        assertSpot(q.previous().orElseThrow(), 1, 7, 8, Kind.WEAK_SPAN, "similarity 0.50");
    }

    @Test
    void anEmptyQueueGivesNothing() {
        ReviewQueue q = ReviewQueue.of(project(track3()), FRAMES, SUMMARY);
        assertTrue(q.isEmpty());
        assertTrue(q.next().isEmpty());
        assertTrue(q.previous().isEmpty());
        assertThrows(IllegalArgumentException.class, () -> new ReviewQueue(null));
    }

    @Test
    void rebuildStaysOnTheSameSpotWhenOthersGo() {
        ReviewQueue q = ReviewQueue.of(original(), FRAMES, SUMMARY);
        q.next();
        q.next(); // track 1's jump, second
        q.rebuild(project(track1(false, 7), track2(true), track3()), FRAMES);
        // Track 2's jump is fixed: track 1's jump is now first, and the cursor is still on it.
        assertEquals(0, q.position());
        assertSpot(q.current().orElseThrow(), 1, 4, 5, Kind.JUMP, "jump of 1.0 box diagonals");
        assertSpot(q.next().orElseThrow(), 2, 3, 4, Kind.SIZE_CHANGE, "size x1.44");
    }

    @Test
    void rebuildAfterTheSpotIsFixedGoesOnToTheNext() {
        ReviewQueue q = ReviewQueue.of(original(), FRAMES, SUMMARY);
        q.next();
        q.next(); // track 1's jump
        q.rebuild(project(track1(true, 7), track2(false), track3()), FRAMES);
        assertTrue(q.current().isEmpty(), "the spot is gone");
        assertEquals(4, q.size());
        // The cursor sits between track 2's jump and its size change, where track 1's jump used to be.
        assertSpot(q.next().orElseThrow(), 2, 3, 4, Kind.SIZE_CHANGE, "size x1.44");
        assertSpot(q.previous().orElseThrow(), 2, 1, 2, Kind.JUMP, "jump of 2.0 box diagonals");
    }

    @Test
    void rebuildFollowsASpanThatMoved() {
        ReviewQueue q = ReviewQueue.of(original(), FRAMES, SUMMARY);
        q.previous(); // track 1's weak span 7-8
        // Retracked: the weak span now starts on frame 6 (0.5, 0.4, 0.6: mean 0.5).
        q.rebuild(project(track1(false, 6), track2(false), track3()), FRAMES);
        assertSpot(q.current().orElseThrow(), 1, 6, 8, Kind.WEAK_SPAN, "similarity 0.50");
        assertEquals(4, q.position());
    }

    @Test
    void rebuildBeforeTheFirstStepStaysBeforeTheFirst() {
        ReviewQueue q = ReviewQueue.of(original(), FRAMES, SUMMARY);
        q.rebuild(project(track1(false, 7), track2(true), track3()), FRAMES);
        assertTrue(q.current().isEmpty());
        assertFalse(q.isEmpty());
        assertSpot(q.next().orElseThrow(), 1, 4, 5, Kind.JUMP, "jump of 1.0 box diagonals");
    }
}
