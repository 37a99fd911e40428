package org.modetrail.trackbench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.video.Frame;
import org.modetrail.run.RunProgress;
import org.modetrail.run.TrackRunner;
import org.modetrail.testsupport.RefData;

/**
 * A tuning probe: one family clip through H.264 as the benchmark encodes it, all objects tracked together by the
 * product's runner from one keyframe each, and per object a one-character-per-frame timeline: T IoU 0.5 or more,
 * t under 0.5, x on nothing, A, B, ...: on that other object (IoU 0.3 or more with its truth), '-' no box,
 * '!' a box while the object is out of view or under half visible (a, b, ...: on that other object), ' ' before the keyframe. Args: KIND SEED, or
 * vtest (with the real footage's truth); then optionally OBJECT FROM TO STEP OUT.png for a contact sheet.
 */
public final class RunnerTrace {
    /** The letter of the other object {@code b} lies on (IoU 0.3 or more), from {@code first}; else {@code none}. */
    private static char onOther(Box b, List<ObjectTruth> objects, int k, int f, char none, char first) {
        char c = none;
        double best = 0.3;
        for (int j = 0; j < objects.size(); j++) {
            if (j != k && objects.get(j).inView(f) && b.iou(objects.get(j).at(f).box()) >= best) {
                best = b.iou(objects.get(j).at(f).box());
                c = (char) (first + j);
            }
        }
        return c;
    }

    public static void main(String[] args) throws Exception {
        String kind = args[0];
        Path scratch = Files.createTempDirectory("runner-trace");
        DecodedVideo video;
        List<ObjectTruth> objects;
        if (kind.equals(BenchReport.VTEST)) {
            video = DecodedVideo.decode(RefData.vtestIfPresent().orElseThrow(), Integer.MAX_VALUE, scratch);
            Path truth = Path.of(RunnerTrace.class.getResource(BenchClips.VTEST_TRUTH_RESOURCE).toURI());
            objects = ClipBench.startable(BenchClips.objects(truth, video.frameCount()));
        } else {
            ClipSet set = ClipSets.named("family");
            long seed = Long.parseLong(args[1]);
            MultiClip clip = set.clip(kind, seed);
            video = DecodedVideo.encodeAndDecode(clip, Integer.MAX_VALUE, set.crf(kind, seed), scratch);
            objects = ClipBench.startable(BenchClips.objects(clip, video.frameCount()));
        }
        Project tracked = new TrackRunner().trackAll(video, ClipBench.project(video, objects), RunProgress.NONE,
                () -> false);
        int first = kind.equals(BenchReport.VTEST) ? 1 : 2;
        if (args.length >= first + 5) {
            // OBJECT FROM TO STEP OUT.png: a contact sheet of that object's boxes.
            int k = Integer.parseInt(args[first]);
            int from = Integer.parseInt(args[first + 1]);
            int to = Integer.parseInt(args[first + 2]);
            int step = Integer.parseInt(args[first + 3]);
            ContactSheet sheet = new ContactSheet((to - from) / step + 1);
            Track t = tracked.track(k + 1).orElseThrow();
            for (int f = from; f <= to; f += step) {
                FrameAnnotation a = t.frames().get(f);
                ObjectTruth o = objects.get(k);
                Frame frame = video.frame(f);
                sheet.add(frame.rgb(), frame.width(), frame.height(), o.inView(f) ? o.at(f).box() : null,
                        a == null ? null : a.box(), f + (o.inView(f) ? String.format(Locale.ROOT, " v%.2f",
                                o.at(f).visible()) : " out") + (a == null ? "" : " " + a.source()));
            }
            sheet.write(Path.of(args[first + 4]));
        }
        for (int k = 0; k < objects.size(); k++) {
            ObjectTruth o = objects.get(k);
            Track t = tracked.track(k + 1).orElseThrow();
            StringBuilder line = new StringBuilder();
            for (int f = 0; f < video.frameCount(); f++) {
                FrameAnnotation a = t.frames().get(f);
                Box b = a == null ? null : a.box();
                char c;
                if (f < o.start()) {
                    c = ' ';
                } else if (!o.scored(f)) {
                    c = b == null ? '-' : onOther(b, objects, k, f, '!', 'a');
                } else if (b == null) {
                    c = '-';
                } else if (b.iou(o.at(f).box()) >= 0.5) {
                    c = 'T';
                } else {
                    c = onOther(b, objects, k, f, 'x', 'A');
                    if (c == 'x' && b.iou(o.at(f).box()) > 0) {
                        c = 't';
                    }
                }
                line.append(c);
            }
            System.out.printf(Locale.ROOT, "o%d (start %d):%n", k, o.start());
            for (int i = 0; i < line.length(); i += 100) {
                System.out.printf(Locale.ROOT, "  %4d %s%n", i, line.substring(i, Math.min(line.length(), i + 100)));
            }
        }
    }
}
