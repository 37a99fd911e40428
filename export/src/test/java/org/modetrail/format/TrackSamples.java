package org.modetrail.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/** Projects for the tracks-format tests, built from the model so they are valid by construction. */
public final class TrackSamples {
    public static final VideoRef VIDEO = new VideoRef("clips/arena.mp4", 640, 480, 300, "sha256:0f1e2d");

    private TrackSamples() {
    }

    /**
     * Keyframes, tracked and interpolated boxes, a hidden mark, a box touching the bottom-right corner, a class
     * with a non-ASCII name and a comma, ids not in order; every box inside the frame.
     */
    public static Project small() {
        List<ObjectClass> classes = List.of(new ObjectClass("mouse", 0x1F77B4),
                new ObjectClass("käfer, groß", 0xFF7F0E));
        Map<Integer, FrameAnnotation> a = new TreeMap<>();
        a.put(0, FrameAnnotation.keyframe(0, new Box(10, 20, 30, 40)));
        a.put(1, FrameAnnotation.tracked(1, new Box(11.25, 20.5, 30.125, 40.0625), 0.9137254901960784));
        a.put(2, FrameAnnotation.interpolated(2, new Box(12.333333333333334, 21.1, 30.2, 40.1)));
        a.put(3, FrameAnnotation.markedBy(3, Presence.HIDDEN));
        a.put(299, FrameAnnotation.keyframe(299, new Box(0, 0, 1, 1)));
        Map<Integer, FrameAnnotation> b = new TreeMap<>();
        b.put(1, FrameAnnotation.keyframe(1, new Box(600, 400, 40, 80)));
        b.put(2, FrameAnnotation.tracked(2, new Box(599.5, 399.25, 40.5, 80.75), 0));
        List<Track> tracks = List.of(new Track(4, "käfer, groß", "", b), new Track(1, "mouse", "", a));
        return new Project(VIDEO, classes, tracks);
    }

    /** The same project with every box a keyframe of score {@code score}, as a format without sources gives it. */
    public static Project asKeyframes(Project p) {
        List<Track> tracks = new ArrayList<>();
        for (Track t : p.tracks()) {
            Map<Integer, FrameAnnotation> m = new TreeMap<>();
            for (FrameAnnotation a : t.frames().values()) {
                if (a.isVisible()) {
                    m.put(a.frame(), new FrameAnnotation(a.frame(), Presence.VISIBLE, a.box(), BoxSource.KEYFRAME,
                            a.score()));
                }
            }
            tracks.add(new Track(t.id(), t.className(), "", m));
        }
        return new Project(p.video(), p.classes(), tracks);
    }

    /**
     * Asserts that {@code actual} has the tracks of {@code expected}: same ids, classes, frames with boxes (hidden
     * and absent marks have no place in these formats), sources, boxes to a thousandth of a pixel (the printed
     * precision, half a unit of rounding) and scores to the fourth decimal.
     */
    public static void assertSameTracks(Project expected, Project actual) {
        List<Integer> ids = new ArrayList<>();
        for (Track t : expected.tracks()) {
            ids.add(t.id());
        }
        List<Integer> got = new ArrayList<>();
        for (Track t : actual.tracks()) {
            got.add(t.id());
        }
        assertEquals(ids.stream().sorted().toList(), got.stream().sorted().toList(), "track ids");
        for (Track e : expected.tracks()) {
            Track a = actual.track(e.id()).orElseThrow();
            assertEquals(e.className(), a.className(), "class of track " + e.id());
            List<Integer> frames = new ArrayList<>();
            for (FrameAnnotation f : e.frames().values()) {
                if (f.isVisible()) {
                    frames.add(f.frame());
                }
            }
            assertEquals(frames, new ArrayList<>(a.frames().keySet()), "frames of track " + e.id());
            for (int frame : frames) {
                FrameAnnotation x = e.at(frame).orElseThrow();
                FrameAnnotation y = a.at(frame).orElseThrow();
                String where = "track " + e.id() + " frame " + frame;
                assertEquals(x.source(), y.source(), "source, " + where);
                assertTrue(y.isVisible(), where);
                assertEquals(x.box().x(), y.box().x(), 5.0001e-4, "x, " + where);
                assertEquals(x.box().y(), y.box().y(), 5.0001e-4, "y, " + where);
                assertEquals(x.box().width(), y.box().width(), 5.0001e-4, "width, " + where);
                assertEquals(x.box().height(), y.box().height(), 5.0001e-4, "height, " + where);
                assertEquals(x.score(), y.score(), 5.0001e-5, "score, " + where);
            }
        }
    }
}
