package org.modetrail.evaluation;

import java.util.List;

/**
 * The identity measures of Ristani, Solera, Zou, Cucchiara and Tomasi, "Performance measures and a data set for
 * multi-target, multi-camera tracking" (ECCV 2016 workshops), section 4: whole truth trajectories are paired
 * one-to-one with whole tracks so that the boxes they share (same frame, IoU at least the threshold) are as many
 * as possible (the bipartite matching that minimises IDFN + IDFP, solved here by {@link Assignment}); IDTP are the
 * boxes so shared, and IDF1 = 2 IDTP / (truth boxes + track boxes), equation (8) of that section.
 */
public final class IdentityMeasures {
    private IdentityMeasures() {
    }

    public static IdentityScore score(Annotations truth, Annotations tracks, double iouThreshold) {
        FrameMatching m = new FrameMatching(truth, tracks);
        double[][] shared = new double[m.truthIds.length][m.trackIds.length];
        for (int f : m.frames) {
            List<LabelledBox> g = truth.onFrame(f);
            List<LabelledBox> t = tracks.onFrame(f);
            for (LabelledBox a : g) {
                for (LabelledBox b : t) {
                    if (FrameMatching.matches(a.box().iou(b.box()), iouThreshold)) {
                        shared[m.truthIndex.get(a.id())][m.trackIndex.get(b.id())]++;
                    }
                }
            }
        }
        int idtp = 0;
        if (m.truthIds.length > 0 && m.trackIds.length > 0) {
            int[] pick = Assignment.maximumScore(shared);
            for (int i = 0; i < pick.length; i++) {
                if (pick[i] >= 0) {
                    idtp += (int) shared[i][pick[i]];
                }
            }
        }
        int gt = truth.count();
        int tr = tracks.count();
        return new IdentityScore(gt + tr == 0 ? Double.NaN : 2.0 * idtp / (gt + tr),
                tr == 0 ? Double.NaN : (double) idtp / tr, gt == 0 ? Double.NaN : (double) idtp / gt,
                idtp, gt - idtp, tr - idtp);
    }
}
