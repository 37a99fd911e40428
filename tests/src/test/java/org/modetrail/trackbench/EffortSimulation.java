package org.modetrail.trackbench;

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
import org.modetrail.run.LinearInterpolation;
import org.modetrail.run.PassMerge;
import org.modetrail.run.RunProgress;
import org.modetrail.run.TrackRunner;
import org.modetrail.video.VideoException;

/**
 * The effort measure: a simulated annotator starts with one keyframe (the true box on the first frame), lets the
 * tool fill the track, finds the first frame whose box has IoU under 0.5 with the truth (a missing box counts as 0;
 * frames under half visible are not judged), adds the true box there as a keyframe, and repeats until every frame
 * passes. The figure is keyframes added per 1000 frames.
 */
public final class EffortSimulation {
    /** How a tool fills a track from keyframes: a box per frame, null where it has none. */
    public interface Filler {
        String name();

        Box[] fill(RenderedVideo video, TreeMap<Integer, Box> keyframes) throws VideoException;
    }

    private EffortSimulation() {
    }

    /** The annotator's pass mark: a frame whose box has at least this IoU with the truth needs no keyframe. */
    public static final double PASS_IOU = 0.5;

    /** Keyframes the annotator added per 1000 frames. */
    public static double keyframesPer1000(BenchClip clip, RenderedVideo video, Filler filler) throws VideoException {
        return keyframesPer1000(clip, video, filler, PASS_IOU);
    }

    /** The same for a stricter (or laxer) annotator, who passes a frame only at IoU {@code passIou} or more. */
    public static double keyframesPer1000(BenchClip clip, RenderedVideo video, Filler filler, double passIou)
            throws VideoException {
        TreeMap<Integer, Box> keys = new TreeMap<>();
        keys.put(0, clip.truth(0).box());
        int added = 0;
        for (int guard = 0; guard < clip.frameCount(); guard++) {
            Box[] boxes = filler.fill(video, keys);
            int bad = -1;
            for (int f = 0; f < clip.frameCount(); f++) {
                TruthBox t = clip.truth(f);
                if (t.visible() < 0.5 || keys.containsKey(f)) {
                    continue;
                }
                if (boxes[f] == null || boxes[f].iou(t.box()) < passIou) {
                    bad = f;
                    break;
                }
            }
            if (bad < 0) {
                break;
            }
            keys.put(bad, clip.truth(bad).box());
            added++;
        }
        return added * 1000.0 / clip.frameCount();
    }

    /** Modetrail: the track runner over the keyframes, as the track command runs it. */
    public static Filler modetrail() {
        return modetrail(TrackRunner.DEFAULT_MERGE);
    }

    /** Modetrail with the passes of each segment merged as {@code merge} says. */
    public static Filler modetrail(PassMerge merge) {
        TrackRunner runner = new TrackRunner(merge);
        ObjectClass cls = new ObjectClass("target", 0xE69F00);
        return new Filler() {
            @Override
            public String name() {
                return "Modetrail " + merge;
            }

            @Override
            public Box[] fill(RenderedVideo video, TreeMap<Integer, Box> keyframes) throws VideoException {
                Map<Integer, FrameAnnotation> frames = new TreeMap<>();
                keyframes.forEach((f, b) -> frames.put(f, FrameAnnotation.keyframe(f, b)));
                Project p = new Project(new VideoRef("clip", video.info().width(), video.info().height(),
                        video.frameCount(), ""), List.of(cls), List.of(new Track(1, "target", "", frames)));
                Track t = runner.trackAll(video, p, RunProgress.NONE, () -> false).track(1).orElseThrow();
                Box[] out = new Box[video.frameCount()];
                for (FrameAnnotation a : t.frames().values()) {
                    out[a.frame()] = a.box();
                }
                return out;
            }
        };
    }

    /**
     * Plain linear interpolation between keyframes, no tracker; after the last keyframe its box is held, as
     * keyframe-only annotation does until the next keyframe is set.
     */
    public static Filler interpolation() {
        return new Filler() {
            @Override
            public String name() {
                return "interpolation";
            }

            @Override
            public Box[] fill(RenderedVideo video, TreeMap<Integer, Box> keyframes) {
                Box[] out = new Box[video.frameCount()];
                Map.Entry<Integer, Box> prev = null;
                for (Map.Entry<Integer, Box> e : keyframes.entrySet()) {
                    out[e.getKey()] = e.getValue();
                    if (prev != null) {
                        for (int f = prev.getKey() + 1; f < e.getKey(); f++) {
                            double t = (double) (f - prev.getKey()) / (e.getKey() - prev.getKey());
                            out[f] = LinearInterpolation.between(prev.getValue(), e.getValue(), t);
                        }
                    }
                    prev = e;
                }
                for (int f = keyframes.lastKey() + 1; f < out.length; f++) {
                    out[f] = keyframes.lastEntry().getValue();
                }
                return out;
            }
        };
    }

    /** A reference tracker restarted at each keyframe and run forward to the next one. */
    public static Filler restarted(String name, Supplier<BoxTracker> make) {
        return new Filler() {
            @Override
            public String name() {
                return name;
            }

            @Override
            public Box[] fill(RenderedVideo video, TreeMap<Integer, Box> keyframes) {
                Box[] out = new Box[video.frameCount()];
                for (Map.Entry<Integer, Box> e : keyframes.entrySet()) {
                    Integer next = keyframes.higherKey(e.getKey());
                    int end = next == null ? video.frameCount() : next;
                    try (BoxTracker t = make.get()) {
                        int[] rgb = video.frame(e.getKey()).rgb();
                        t.load(rgb, video.info().width(), video.info().height());
                        t.start(e.getValue());
                        out[e.getKey()] = e.getValue();
                        for (int f = e.getKey() + 1; f < end; f++) {
                            t.load(video.frame(f).rgb(), video.info().width(), video.info().height());
                            Box b = t.track();
                            if (!t.working()) {
                                break;
                            }
                            out[f] = b;
                        }
                    }
                }
                return out;
            }
        };
    }
}
