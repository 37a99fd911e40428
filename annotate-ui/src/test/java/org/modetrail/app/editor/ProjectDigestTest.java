package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.quality.TrackQualitySummary;

/** The digest the window shows: the same figures the views would work out themselves, unchanged tracks reused. */
class ProjectDigestTest {
    private static final LaneModel.Config LANES = LaneModel.Config.defaults();
    private static final TrackQualitySummary QUALITY = TrackQualitySummary.defaults();

    /** A track keyed at frame 0 and tracked to frame 59 with a weak span (similarity 0.3) over frames 20-29. */
    private static Track track(int id, int shift) {
        TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
        m.put(0, FrameAnnotation.keyframe(0, new Box(10 + shift, 10, 20, 20)));
        for (int f = 1; f < 60; f++) {
            double score = f >= 20 && f < 30 ? 0.3 : 0.9;
            m.put(f, FrameAnnotation.tracked(f, new Box(10 + shift + f, 10, 20, 20), score));
        }
        return new Track(id, "animal", "", m);
    }

    private static Project project(Track... tracks) {
        return new Project(new VideoRef("clip.mp4", 640, 480, 100, ""), List.of(new ObjectClass("animal", 0xE69F00)),
                List.of(tracks));
    }

    @Test
    void theFiguresAreThoseTheViewsWorkOutThemselves() {
        Project p = project(track(1, 0), track(2, 100));
        ProjectDigest d = ProjectDigest.of(p, 100, LANES, QUALITY, null);
        for (Track t : p.tracks()) {
            LaneModel own = LaneModel.of(t, 100, LANES);
            for (int f = 0; f < 100; f++) {
                assertEquals(own.stateAt(f), d.lane(t).stateAt(f), "track " + t.id() + " frame " + f);
            }
            assertEquals(QUALITY.of(t, 100), d.quality(t));
        }
        assertEquals(ReviewQueue.collect(p, 100, QUALITY), d.spots());
        assertEquals(2, d.spots().size(), "one weak span a track");
    }

    @Test
    void anUnchangedTrackKeepsItsLaneAndQualityAChangedOneIsWorkedOutAgain() {
        Track one = track(1, 0);
        Track two = track(2, 100);
        ProjectDigest first = ProjectDigest.of(project(one, two), 100, LANES, QUALITY, null);
        Track twoMoved = two.with(FrameAnnotation.keyframe(25, new Box(150, 10, 20, 20)));
        ProjectDigest second = ProjectDigest.of(project(one, twoMoved), 100, LANES, QUALITY, first);
        assertSame(first.lane(one), second.lane(one));
        assertSame(first.quality(one), second.quality(one));
        assertEquals(LaneModel.State.KEYFRAME, second.lane(twoMoved).stateAt(25));
        assertEquals(LaneModel.State.WEAK, first.lane(two).stateAt(25));
    }

    @Test
    void anotherFrameCountOrOtherSettingsReuseNothing() {
        Track one = track(1, 0);
        ProjectDigest first = ProjectDigest.of(project(one), 100, LANES, QUALITY, null);
        assertNotSame(first.lane(one), ProjectDigest.of(project(one), 100, new LaneModel.Config(0.95), QUALITY,
                first).lane(one));
        ProjectDigest longer = ProjectDigest.of(new Project(new VideoRef("clip.mp4", 640, 480, 200, ""),
                List.of(new ObjectClass("animal", 0xE69F00)), List.of(one)), 200, LANES, QUALITY, first);
        assertEquals(200, longer.lane(one).frameCount());
    }
}
