package org.modetrail.trackbench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * A probe for tuning: one family clip through H.264 at a chosen crf (or the clip set's own), Modetrail alone through the track
 * runner; per-object AUC. Separates what compression costs from what the runner costs. Args: KIND SEED [CRF].
 */
public final class CrfProbe {
    public static void main(String[] args) throws Exception {
        ClipSet set = ClipSets.named("family");
        String kind = args[0];
        long seed = Long.parseLong(args[1]);
        int crf = args.length > 2 ? Integer.parseInt(args[2]) : set.crf(kind, seed);
        MultiClip clip = set.clip(kind, seed);
        Path scratch = Files.createTempDirectory("crf-probe");
        DecodedVideo video = DecodedVideo.encodeAndDecode(clip, Integer.MAX_VALUE, crf, scratch);
        List<ObjectFigures> rows = ClipBench.run(kind, seed, video, BenchClips.objects(clip, video.frameCount()),
                List.of(PeerTrackers.MODETRAIL));
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "%s %d crf %d:", kind, seed, crf));
        for (ObjectFigures r : rows) {
            if (r.tracker().equals(PeerTrackers.MODETRAIL)) {
                sb.append(String.format(Locale.ROOT, " %.3f", r.auc()));
            }
        }
        System.out.println(sb);
        if (args.length > 3) {
            int k = Integer.parseInt(args[3]);
            List<ObjectTruth> objects = ClipBench.startable(BenchClips.objects(clip, video.frameCount()));
            org.modetrail.model.Project tracked = new org.modetrail.run.TrackRunner().trackAll(video,
                    ClipBench.project(video, objects), org.modetrail.run.RunProgress.NONE, () -> false);
            ObjectTruth o = objects.get(k);
            org.modetrail.tracking.MeanShiftTracker ms = new org.modetrail.tracking.MeanShiftTracker();
            ms.start(video.frame(o.start()), o.at(o.start()).box());
            for (int f = o.start() + 1; f < Math.min(video.frameCount(), o.start() + 30); f++) {
                org.modetrail.tracking.TrackStep st = ms.track(video.frame(f));
                System.out.printf(Locale.ROOT, "direct f%d %s %s %.3f%n", f, st.status(), st.box(), st.similarity());
            }
            org.modetrail.model.Track t = tracked.track(k + 1).orElseThrow();
            for (int f = Math.max(0, o.start() - 3); f < Math.min(video.frameCount(), o.start() + 40); f++) {
                org.modetrail.model.FrameAnnotation a = t.frames().get(f);
                System.out.printf(Locale.ROOT, "f%d truth %s vis %.2f | %s%n", f, o.at(f).box(), o.at(f).visible(),
                        a == null ? "-" : a.source() + " " + a.box() + " vis " + a.isVisible());
            }
        }
    }
}
