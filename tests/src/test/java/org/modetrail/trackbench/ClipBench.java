package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Supplier;

import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.run.RunProgress;
import org.modetrail.run.TrackRunner;
import org.modetrail.video.VideoException;

/**
 * Every chosen tracker on every object of one decoded clip, each object started from its true box on its first
 * half-visible frame and tracked to the clip's end; then the simulated annotator's keyframes ({@link BenchEffort}).
 *
 * <ul>
 *   <li>Modetrail runs as the product runs: one {@code TrackRunner.trackAll} over a project with one keyframe per
 *   object, all objects together. Frames it leaves empty or marks hidden or absent have no box. Its time is the
 *   runner's wall time over the clip's frames times its objects (it also tracks backward from each keyframe to the
 *   clip's start, which that time includes).</li>
 *   <li>Each peer runs per object, independently; its time is the median of its {@code track()} calls over the
 *   clip's objects (frame conversion into its own image type not included).</li>
 *   <li>"interpolation" is the annotator's baseline without a tracker: its run holds the start box.</li>
 * </ul>
 */
final class ClipBench {
    /** The row key of plain linear interpolation. */
    static final String INTERPOLATION = "interpolation";

    private ClipBench() {
    }

    /** Objects a run can start on: at least half visible on some frame before the last. */
    static List<ObjectTruth> startable(List<ObjectTruth> objects) {
        return objects.stream().filter(o -> o.start() >= 0 && o.start() < o.frameCount() - 1).toList();
    }

    static List<ObjectFigures> run(String kind, long seed, DecodedVideo video, List<ObjectTruth> all,
                                   List<String> trackers) throws VideoException {
        List<ObjectTruth> objects = startable(all);
        List<ObjectFigures> out = new ArrayList<>();
        if (objects.isEmpty()) {
            return out;
        }
        double decode = video.decodeMillis();
        for (String key : trackers) {
            if (key.equals(PeerTrackers.MODETRAIL)) {
                out.addAll(modetrail(kind, seed, video, objects));
            } else {
                out.addAll(peer(kind, seed, video, objects, key, PeerTrackers.peer(key).make()));
            }
        }
        for (ObjectTruth o : objects) {
            TreeMap<Integer, Box> one = new TreeMap<>(Map.of(o.start(), o.at(o.start()).box()));
            out.add(ObjectFigures.score(kind, seed, INTERPOLATION, o, BenchEffort.interpolated(one, o.frameCount()),
                    BenchEffort.interpolation(o), Double.NaN, decode));
        }
        return out;
    }

    /** The project a user makes: one track per object (id = index + 1), one keyframe on its start frame. */
    static Project project(DecodedVideo video, List<ObjectTruth> objects) {
        ObjectClass cls = new ObjectClass("object", 0xE69F00);
        List<Track> tracks = new ArrayList<>();
        for (int i = 0; i < objects.size(); i++) {
            ObjectTruth o = objects.get(i);
            Map<Integer, FrameAnnotation> frames = new HashMap<>();
            frames.put(o.start(), FrameAnnotation.keyframe(o.start(), o.at(o.start()).box()));
            tracks.add(new Track(i + 1, cls.name(), "", frames));
        }
        return new Project(new VideoRef(video.path().toString(), video.info().width(), video.info().height(),
                video.frameCount(), ""), List.of(cls), tracks);
    }

    private static List<ObjectFigures> modetrail(String kind, long seed, DecodedVideo video,
                                                 List<ObjectTruth> objects) throws VideoException {
        TrackRunner runner = new TrackRunner();
        long t0 = System.nanoTime();
        Project tracked = runner.trackAll(video, project(video, objects), RunProgress.NONE, () -> false);
        double ms = (System.nanoTime() - t0) / 1e6 / ((double) video.frameCount() * objects.size());
        int[] keyframes = BenchEffort.modetrail(runner, video, tracked, objects);
        List<ObjectFigures> out = new ArrayList<>();
        for (int i = 0; i < objects.size(); i++) {
            Track t = tracked.track(i + 1).orElseThrow();
            Box[] boxes = new Box[video.frameCount()];
            for (FrameAnnotation a : t.frames().values()) {
                boxes[a.frame()] = a.isVisible() ? a.box() : null;
            }
            out.add(ObjectFigures.score(kind, seed, PeerTrackers.MODETRAIL, objects.get(i), boxes, keyframes[i], ms,
                    video.decodeMillis()));
        }
        return out;
    }

    private static List<ObjectFigures> peer(String kind, long seed, DecodedVideo video, List<ObjectTruth> objects,
                                            String key, Supplier<BoxTracker> make) throws VideoException {
        int w = video.info().width();
        int h = video.info().height();
        List<Box[]> runs = new ArrayList<>();
        long[] nanos = new long[video.frameCount() * objects.size()];
        int timed = 0;
        for (ObjectTruth o : objects) {
            Box[] boxes = new Box[video.frameCount()];
            try (BoxTracker t = make.get()) {
                t.load(video.frame(o.start()).rgb(), w, h);
                t.start(o.at(o.start()).box());
                boxes[o.start()] = o.at(o.start()).box();
                for (int f = o.start() + 1; f < video.frameCount(); f++) {
                    t.load(video.frame(f).rgb(), w, h);
                    boolean working = t.working();
                    long t0 = System.nanoTime();
                    Box b = t.track();
                    long t1 = System.nanoTime();
                    if (working) {
                        nanos[timed++] = t1 - t0;
                    }
                    boxes[f] = b;
                }
            }
            runs.add(boxes);
        }
        double ms = median(Arrays.copyOf(nanos, timed)) / 1e6;
        List<ObjectFigures> out = new ArrayList<>();
        for (int i = 0; i < objects.size(); i++) {
            int keyframes = BenchEffort.restarted(make, video, objects.get(i), runs.get(i));
            out.add(ObjectFigures.score(kind, seed, key, objects.get(i), runs.get(i), keyframes, ms,
                    video.decodeMillis()));
        }
        return out;
    }

    static double median(long[] values) {
        if (values.length == 0) {
            return Double.NaN;
        }
        long[] s = values.clone();
        Arrays.sort(s);
        int m = s.length / 2;
        return s.length % 2 == 1 ? s[m] : (s[m - 1] + s[m]) / 2.0;
    }
}
