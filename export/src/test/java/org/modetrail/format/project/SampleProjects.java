package org.modetrail.format.project;

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

/** Projects for the tests, built from the model so they are valid by construction. */
final class SampleProjects {
    private SampleProjects() {
    }

    /** Every kind of annotation: keyframes, tracked, interpolated, hidden and absent marks, awkward notes. */
    static Project small() {
        VideoRef video = new VideoRef("clips/arena.mp4", 640, 480, 300, "sha256:0f1e2d");
        List<ObjectClass> classes = List.of(new ObjectClass("mouse", 0x1F77B4), new ObjectClass("käfer", 0xFF7F0E));
        Map<Integer, FrameAnnotation> a = new TreeMap<>();
        a.put(0, FrameAnnotation.keyframe(0, new Box(10, 20, 30, 40)));
        a.put(1, FrameAnnotation.tracked(1, new Box(11.25, 20.5, 30.125, 40.0625), 0.9137254901960784, 2.375));
        a.put(2, FrameAnnotation.interpolated(2, new Box(12.333333333333334, 21.1, 30.2, 40.1), 4.5));
        a.put(3, FrameAnnotation.markedBy(3, Presence.HIDDEN));
        a.put(4, FrameAnnotation.markedBy(4, Presence.ABSENT));
        a.put(5, new FrameAnnotation(5, Presence.HIDDEN, null, BoxSource.TRACKED, 0.125));
        a.put(299, FrameAnnotation.keyframe(299, new Box(-3.5, -0.0, 0, 1e-7)));
        Map<Integer, FrameAnnotation> b = new TreeMap<>();
        b.put(7, FrameAnnotation.keyframe(7, new Box(600, 400, 39.75, 79.5)));
        b.put(8, FrameAnnotation.tracked(8, new Box(601, 401, 39.75, 79.5), 0));
        List<Track> tracks = List.of(
                new Track(1, "mouse", "left cage \"A\" — ünïcödé 🐭\nline two\\tab\t", a),
                new Track(4, "käfer", "", b),
                new Track(2, "mouse", "no frames yet", Map.of()));
        return new Project(video, classes, tracks);
    }

    /**
     * {@code tracks} tracks over {@code frames} frames, tracked boxes with full-precision coordinates (as mean
     * shift gives them) and a keyframe every 100 frames; {@code version} goes into the first note so that versions
     * can be told apart.
     */
    static Project large(int tracks, int frames, int version) {
        VideoRef video = new VideoRef("long.mp4", 1920, 1080, frames, "v" + version);
        List<Track> list = new ArrayList<>();
        for (int t = 1; t <= tracks; t++) {
            Map<Integer, FrameAnnotation> m = new TreeMap<>();
            for (int f = 0; f < frames; f++) {
                double cx = 500 + 300 * Math.sin(f * 0.01 + t + version);
                double cy = 500 + 200 * Math.cos(f * 0.013 + t);
                if (f % 100 == 0) {
                    m.put(f, FrameAnnotation.keyframe(f, Box.centredAt(Math.rint(cx), Math.rint(cy), 40, 30)));
                } else {
                    m.put(f, FrameAnnotation.tracked(f, Box.centredAt(cx, cy, 40.5, 30.25),
                            0.5 + 0.5 * Math.abs(Math.sin(f))));
                }
            }
            list.add(new Track(t, "vehicle", t == 1 ? "version " + version : "", m));
        }
        return new Project(video, List.of(new ObjectClass("vehicle", 0x2CA02C)), list);
    }
}
