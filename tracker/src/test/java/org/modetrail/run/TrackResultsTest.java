package org.modetrail.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/** Folding a background tracking result into a project that changed while it ran. */
class TrackResultsTest {
    private static Project with(Map<Integer, FrameAnnotation> a, Map<Integer, FrameAnnotation> b) {
        return new Project(new VideoRef("v.mp4", 100, 100, 20, ""), List.of(new ObjectClass("c", 0)),
                List.of(new Track(1, "c", "", a), new Track(2, "c", "", b)));
    }

    private static Map<Integer, FrameAnnotation> keys(int... frames) {
        Map<Integer, FrameAnnotation> m = new TreeMap<>();
        for (int f : frames) {
            m.put(f, FrameAnnotation.keyframe(f, new Box(f, 0, 10, 10)));
        }
        return m;
    }

    @Test
    void resultsApplyOnlyToTracksWhoseKeyframesHeld() {
        Project snapshot = with(keys(0), keys(0));
        Map<Integer, FrameAnnotation> tracked1 = keys(0);
        Map<Integer, FrameAnnotation> tracked2 = keys(0);
        for (int f = 1; f < 20; f++) {
            tracked1.put(f, FrameAnnotation.tracked(f, new Box(f + 0.5, 0, 10, 10), 0.9));
            tracked2.put(f, FrameAnnotation.tracked(f, new Box(f + 0.5, 0, 10, 10), 0.9));
        }
        Project tracked = with(tracked1, tracked2);
        // Meanwhile the user added a keyframe to track 2 (and its own tracking is queued).
        Project current = with(keys(0), keys(0, 10));
        List<Span> spans = List.of(new Span(1, 0, 19), new Span(2, 0, 19));
        Project out = TrackResults.foldIn(current, snapshot, tracked, spans);
        assertEquals(20, out.track(1).orElseThrow().frames().size(), "track 1 takes the result");
        assertEquals(BoxSource.TRACKED, out.track(1).orElseThrow().at(7).orElseThrow().source());
        assertSame(current.track(2).orElseThrow(), out.track(2).orElseThrow(), "track 2 changed: left alone");
    }
}
