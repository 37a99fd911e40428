package org.modetrail.trackbench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.run.RunProgress;
import org.modetrail.run.TrackRunner;

/**
 * A tuning probe: one family clip through H.264 as the benchmark encodes it, all objects tracked together by the
 * product's runner from one keyframe each, and per object a one-character-per-frame timeline: T IoU 0.5 or more,
 * t under 0.5, a digit: the box is on that other object (IoU 0.3 or more with its truth), x on nothing, '-' no box,
 * '!' a box while the object is out of view or under half visible, ' ' before the keyframe. Args: KIND SEED.
 */
public final class RunnerTrace {
    public static void main(String[] args) throws Exception {
        ClipSet set = ClipSets.named("family");
        String kind = args[0];
        long seed = Long.parseLong(args[1]);
        MultiClip clip = set.clip(kind, seed);
        Path scratch = Files.createTempDirectory("runner-trace");
        DecodedVideo video = DecodedVideo.encodeAndDecode(clip, Integer.MAX_VALUE, set.crf(kind, seed), scratch);
        List<ObjectTruth> objects = ClipBench.startable(BenchClips.objects(clip, video.frameCount()));
        Project tracked = new TrackRunner().trackAll(video, ClipBench.project(video, objects), RunProgress.NONE,
                () -> false);
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
                    c = b == null ? '-' : '!';
                } else if (b == null) {
                    c = '-';
                } else if (b.iou(o.at(f).box()) >= 0.5) {
                    c = 'T';
                } else {
                    c = 'x';
                    double best = 0.3;
                    for (int j = 0; j < objects.size(); j++) {
                        if (j != k && objects.get(j).inView(f) && b.iou(objects.get(j).at(f).box()) >= best) {
                            best = b.iou(objects.get(j).at(f).box());
                            c = (char) ('0' + j % 10);
                        }
                    }
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
