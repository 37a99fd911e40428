package org.modetrail.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/** The editing operations and their undo, on a 100-frame video. */
class EditsTest {
    private static final VideoRef VIDEO = new VideoRef("arena.mp4", 640, 480, 100, "sha256:0");
    private static final ObjectClass ANIMAL = new ObjectClass("animal", 0xE69F00);
    private static final Box A = new Box(10, 10, 40, 30);
    private static final Box B = new Box(50, 60, 40, 30);

    /** A track with keyframes on 10 and 50 and tracked frames 11..49 filled in. */
    private static Project trackedProject() {
        Edit e = Edits.newTrack(Project.of(VIDEO), ANIMAL, 10, A);
        e = Edits.setKeyframe(e.project(), 1, 50, B);
        Track t = e.project().track(1).orElseThrow();
        List<FrameAnnotation> filled = new ArrayList<>();
        for (int f = 11; f < 50; f++) {
            filled.add(FrameAnnotation.tracked(f, A.movedTo(A.centreX() + f, A.centreY()), 0.9));
        }
        return e.project().withTrack(t.withAll(filled));
    }

    @Test
    void aNewTrackNamesTheWholeVideoAroundItsOnlyKeyframeForTracking() {
        Edit e = Edits.newTrack(Project.of(VIDEO), ANIMAL, 10, A);
        assertEquals(1, e.trackId());
        assertEquals(0, e.from());
        assertEquals(99, e.to());
        assertTrue(e.retrack());
        assertEquals(List.of(ANIMAL), e.project().classes());
        assertEquals(FrameAnnotation.keyframe(10, A), e.project().track(1).orElseThrow().at(10).orElseThrow());
    }

    @Test
    void movingAKeyframeClearsOnlyTheStaleFramesBetweenItsNeighbours() {
        Project p = Edits.setKeyframe(trackedProject(), 1, 80, B.movedTo(300, 300)).project();
        Track t = p.track(1).orElseThrow();
        assertEquals(39, t.frames().subMap(11, 49 + 1).size(), "frames between 10 and 50 are untouched");
        Edit moved = Edits.setKeyframe(p, 1, 30, B);
        Track after = moved.project().track(1).orElseThrow();
        assertEquals(10, moved.from());
        assertEquals(50, moved.to());
        assertTrue(after.at(20).isEmpty(), "a stale tracked frame is cleared");
        assertTrue(after.at(30).orElseThrow().isKeyframe());
        assertTrue(after.at(80).orElseThrow().isKeyframe(), "keyframes elsewhere stay");
    }

    @Test
    void deletingTheLastKeyframeRemovesTheTrack() {
        Edit e = Edits.newTrack(Project.of(VIDEO), ANIMAL, 10, A);
        Edit d = Edits.deleteKeyframe(e.project(), 1, 10);
        assertTrue(d.project().tracks().isEmpty());
        assertFalse(d.retrack());
        assertThrows(IllegalArgumentException.class, () -> Edits.deleteKeyframe(trackedProject(), 1, 20),
                "frame 20 is tracked, not a keyframe");
    }

    @Test
    void aHiddenSpanIsTheUsersMarkAndNamesItsNeighbourhoodForTracking() {
        Edit e = Edits.markSpan(trackedProject(), 1, 20, 25, Presence.HIDDEN);
        Track t = e.project().track(1).orElseThrow();
        for (int f = 20; f <= 25; f++) {
            FrameAnnotation a = t.at(f).orElseThrow();
            assertEquals(Presence.HIDDEN, a.presence());
            assertTrue(a.isKeyframe());
        }
        assertEquals(10, e.from());
        assertEquals(50, e.to());
    }

    @Test
    void splittingGivesTheLaterFramesANewTrack() {
        Edit e = Edits.split(trackedProject(), 1, 30);
        Project p = e.project();
        assertEquals(2, e.trackId());
        assertEquals(29, p.track(1).orElseThrow().lastFrame());
        assertEquals(30, p.track(2).orElseThrow().firstFrame());
        assertEquals(50, p.track(2).orElseThrow().lastFrame());
        assertThrows(IllegalArgumentException.class, () -> Edits.split(trackedProject(), 1, 10));
    }

    @Test
    void mergingJoinsTwoTracksAndNamesTheGapBetweenThem() {
        Project p = trackedProject();
        p = Edits.newTrack(p, ANIMAL, 70, B).project();
        Edit m = Edits.merge(p, 1, 2);
        Track t = m.project().track(1).orElseThrow();
        assertTrue(m.project().track(2).isEmpty());
        assertTrue(t.at(70).orElseThrow().isKeyframe());
        assertEquals(50, m.from());
        assertEquals(70, m.to());
        Project clash = Edits.setKeyframe(p, 2, 50, A).project();
        assertThrows(IllegalArgumentException.class, () -> Edits.merge(clash, 1, 2));
    }

    @Test
    void aClassChangeNeedsAKnownClass() {
        Project p = trackedProject().withClass(new ObjectClass("car", 0x56B4E9));
        assertEquals("car", Edits.changeClass(p, 1, "car").project().track(1).orElseThrow().className());
        assertThrows(IllegalArgumentException.class, () -> Edits.changeClass(p, 1, "boat"));
    }

    @Test
    void framesOutsideTheVideoAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> Edits.newTrack(Project.of(VIDEO), ANIMAL, 100, A));
        assertThrows(IllegalArgumentException.class, () -> Edits.markSpan(trackedProject(), 1, 30, 20,
                Presence.ABSENT));
    }

    @Test
    void undoAndRedoWalkThroughTheEdits() {
        Project start = trackedProject();
        History h = new History(start, 10);
        Project moved = h.apply(Edits.setKeyframe(start, 1, 30, B));
        Project hidden = h.apply(Edits.markSpan(moved, 1, 60, 62, Presence.HIDDEN));
        assertEquals(moved, h.undo());
        assertEquals(start, h.undo());
        assertFalse(h.canUndo());
        assertEquals(moved, h.redo());
        assertEquals(hidden, h.redo());
        assertFalse(h.canRedo());
        h.undo();
        h.apply(Edits.changeClass(h.current(), 1, "animal"));
        assertFalse(h.canRedo(), "a new edit forgets what could be redone");
    }

    @Test
    void historyKeepsAtMostItsDepth() {
        History h = new History(trackedProject(), 3);
        for (int i = 0; i < 5; i++) {
            h.apply(Edits.setKeyframe(h.current(), 1, 60 + i, B));
        }
        int undone = 0;
        while (h.canUndo()) {
            h.undo();
            undone++;
        }
        assertEquals(3, undone);
    }

    @Test
    void aProjectRefusesTracksOfUnknownClassesAndFramesPastTheEnd() {
        Track t = Track.startingWith(1, "ghost", FrameAnnotation.keyframe(5, A));
        assertThrows(IllegalArgumentException.class, () -> new Project(VIDEO, List.of(ANIMAL), List.of(t)));
        Track late = Track.startingWith(1, "animal", FrameAnnotation.keyframe(100, A));
        assertThrows(IllegalArgumentException.class, () -> new Project(VIDEO, List.of(ANIMAL), List.of(late)));
    }
}
