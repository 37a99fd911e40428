package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.IntFunction;
import java.util.function.Supplier;

import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.run.LinearInterpolation;
import org.modetrail.run.RunProgress;
import org.modetrail.run.Span;
import org.modetrail.run.TrackRunner;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * The simulated annotator of {@link EffortSimulation} on clips with several objects: each object starts with one
 * keyframe (its true box on its first half-visible frame); the annotator looks at the tool's boxes, finds for each
 * object the first frame whose box has IoU under {@value EffortSimulation#PASS_IOU} with the truth (no box counts
 * as 0; frames under half visible or out of view are not judged), adds the true box there as a keyframe, lets the
 * tool fill again, and repeats until every judged frame passes. The figure is keyframes added after the first.
 *
 * <ul>
 *   <li>Modetrail: all objects in one project, re-tracked with {@code TrackRunner} over the span each new keyframe
 *   changes (from the keyframe before it to the keyframe after it, or the clip's end), as the editor re-tracks an
 *   edit; keyframes for every object that needs one are added in the same round.</li>
 *   <li>A peer: restarted at each keyframe and run forward to the next, per object. Since the annotator always adds
 *   the first failing frame, keyframes come in frame order and the frames before a new keyframe never change, so
 *   this is one forward pass that restarts the peer at each failing frame (the frames before the first failure are
 *   the benchmark's own run, reused).</li>
 *   <li>Linear interpolation between keyframes, the last keyframe's box held after it.</li>
 * </ul>
 */
final class BenchEffort {
    private BenchEffort() {
    }

    /** The first judged frame at or after {@code from} that is not a keyframe and fails, or -1. */
    static int firstFailure(ObjectTruth o, int from, IntFunction<Box> boxAt, IntFunction<Boolean> keyframe) {
        for (int f = Math.max(0, from); f < o.frameCount(); f++) {
            if (!o.scored(f) || keyframe.apply(f)) {
                continue;
            }
            Box b = boxAt.apply(f);
            if (b == null || b.iou(o.at(f).box()) < EffortSimulation.PASS_IOU) {
                return f;
            }
        }
        return -1;
    }

    /**
     * Keyframes added per object for Modetrail, from the project the benchmark's run produced (track id = object
     * index + 1, one keyframe each).
     */
    static int[] modetrail(TrackRunner runner, VideoSource video, Project tracked, List<ObjectTruth> objects)
            throws VideoException {
        int[] added = new int[objects.size()];
        Project p = tracked;
        int n = video.frameCount();
        for (int round = 0; round < n; round++) {
            List<Span> spans = new ArrayList<>();
            for (int i = 0; i < objects.size(); i++) {
                ObjectTruth o = objects.get(i);
                Track t = p.track(i + 1).orElseThrow();
                int bad = firstFailure(o, o.start(), f -> t.at(f).map(FrameAnnotation::box).orElse(null),
                        f -> t.at(f).map(FrameAnnotation::isKeyframe).orElse(false));
                if (bad < 0) {
                    continue;
                }
                int from = t.keyframeBefore(bad).map(FrameAnnotation::frame).orElse(0);
                int to = t.keyframeAfter(bad).map(FrameAnnotation::frame).orElse(n - 1);
                p = p.withTrack(t.with(FrameAnnotation.keyframe(bad, o.at(bad).box())));
                spans.add(new Span(i + 1, from, to));
                added[i]++;
            }
            if (spans.isEmpty()) {
                break;
            }
            p = runner.track(video, p, spans, RunProgress.NONE, () -> false);
        }
        return added;
    }

    /** Keyframes added for a peer restarted at each keyframe; {@code run} is its run from the start keyframe. */
    static int restarted(Supplier<BoxTracker> make, VideoSource video, ObjectTruth o, Box[] run)
            throws VideoException {
        int start = o.start();
        int bad = firstFailure(o, start + 1, f -> run[f], f -> false);
        int added = 0;
        int w = video.info().width();
        int h = video.info().height();
        while (bad >= 0) {
            added++;
            int key = bad;
            bad = -1;
            try (BoxTracker t = make.get()) {
                t.load(video.frame(key).rgb(), w, h);
                t.start(o.at(key).box());
                for (int f = key + 1; f < o.frameCount(); f++) {
                    t.load(video.frame(f).rgb(), w, h);
                    Box b = t.track();
                    if (!t.working()) {
                        b = null;
                    }
                    if (o.scored(f) && (b == null || b.iou(o.at(f).box()) < EffortSimulation.PASS_IOU)) {
                        bad = f;
                        break;
                    }
                }
            }
        }
        return added;
    }

    /** Keyframes added for plain linear interpolation. */
    static int interpolation(ObjectTruth o) {
        TreeMap<Integer, Box> keys = new TreeMap<>();
        keys.put(o.start(), o.at(o.start()).box());
        int added = 0;
        for (int round = 0; round < o.frameCount(); round++) {
            Box[] boxes = interpolated(keys, o.frameCount());
            int bad = firstFailure(o, o.start(), f -> boxes[f], keys::containsKey);
            if (bad < 0) {
                break;
            }
            keys.put(bad, o.at(bad).box());
            added++;
        }
        return added;
    }

    /** Boxes linearly interpolated between keyframes, the last keyframe's held after it, none before the first. */
    static Box[] interpolated(TreeMap<Integer, Box> keys, int frames) {
        Box[] out = new Box[frames];
        Map.Entry<Integer, Box> prev = null;
        for (Map.Entry<Integer, Box> e : keys.entrySet()) {
            out[e.getKey()] = e.getValue();
            if (prev != null) {
                for (int f = prev.getKey() + 1; f < e.getKey(); f++) {
                    double t = (double) (f - prev.getKey()) / (e.getKey() - prev.getKey());
                    out[f] = LinearInterpolation.between(prev.getValue(), e.getValue(), t);
                }
            }
            prev = e;
        }
        for (int f = keys.lastKey() + 1; f < frames; f++) {
            out[f] = keys.lastEntry().getValue();
        }
        return out;
    }
}
