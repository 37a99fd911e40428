package org.modetrail.evaluation;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The identity measures of Ristani, Solera, Zou, Cucchiara and Tomasi, "Performance measures and a data set for
 * multi-target, multi-camera tracking" (ECCV 2016 workshops), section 4: whole truth trajectories are paired
 * one-to-one with whole tracks so that the boxes they share (same frame, IoU at least the threshold) are as many
 * as possible (the bipartite matching that minimises IDFN + IDFP, solved here by {@link Assignment} within each
 * group of trajectories and tracks that share boxes, which gives the same total as one assignment over all); IDTP are the
 * boxes so shared, and IDF1 = 2 IDTP / (truth boxes + track boxes), equation (8) of that section.
 */
public final class IdentityMeasures {
    private IdentityMeasures() {
    }

    public static IdentityScore score(Annotations truth, Annotations tracks, double iouThreshold) {
        FrameMatching m = new FrameMatching(truth, tracks);
        int ng = m.truthIds.length;
        // Boxes shared by each truth trajectory and track, kept only for pairs that share any: on a long video
        // most truth objects meet a few tracks, and a dense matrix of thousands by thousands would not fit.
        Map<Long, int[]> shared = new HashMap<>();
        for (int f : m.frames) {
            List<LabelledBox> g = truth.onFrame(f);
            List<LabelledBox> t = tracks.onFrame(f);
            for (LabelledBox a : g) {
                for (LabelledBox b : t) {
                    if (FrameMatching.matches(a.box().iou(b.box()), iouThreshold)) {
                        shared.computeIfAbsent(FrameMatching.pair(m.truthIndex.get(a.id()),
                                m.trackIndex.get(b.id())), k -> new int[1])[0]++;
                    }
                }
            }
        }
        // Pairs that share nothing add nothing whichever way they are assigned, so the best pairing is the best
        // pairing within each connected group of trajectories and tracks: one small assignment per group.
        int[] parent = new int[ng + m.trackIds.length];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        for (long key : shared.keySet()) {
            parent[Assignment.root(parent, FrameMatching.truthOf(key))] = Assignment.root(parent,
                    ng + FrameMatching.trackOf(key));
        }
        Map<Integer, List<Long>> groups = new HashMap<>();
        for (long key : shared.keySet()) {
            groups.computeIfAbsent(Assignment.root(parent, FrameMatching.truthOf(key)), k -> new ArrayList<>()).add(key);
        }
        long idtp = 0;
        for (List<Long> edges : groups.values()) {
            Map<Integer, Integer> rows = new HashMap<>();
            Map<Integer, Integer> cols = new HashMap<>();
            for (long key : edges) {
                rows.putIfAbsent(FrameMatching.truthOf(key), rows.size());
                cols.putIfAbsent(FrameMatching.trackOf(key), cols.size());
            }
            double[][] w = new double[rows.size()][cols.size()];
            for (long key : edges) {
                w[rows.get(FrameMatching.truthOf(key))][cols.get(FrameMatching.trackOf(key))] = shared.get(key)[0];
            }
            int[] pick = Assignment.maximumScore(w);
            for (int i = 0; i < pick.length; i++) {
                if (pick[i] >= 0) {
                    idtp += (long) w[i][pick[i]];
                }
            }
        }
        int gt = truth.count();
        int tr = tracks.count();
        int tp = (int) idtp;
        return new IdentityScore(gt + tr == 0 ? Double.NaN : 2.0 * tp / (gt + tr),
                tr == 0 ? Double.NaN : (double) tp / tr, gt == 0 ? Double.NaN : (double) tp / gt,
                tp, gt - tp, tr - tp);
    }
}
