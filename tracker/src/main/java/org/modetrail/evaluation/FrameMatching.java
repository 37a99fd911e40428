package org.modetrail.evaluation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * What the multi-object measures share: the frames of either side, the ids of each side as dense indices, and
 * the IoU between every truth box and every track box of a frame.
 */
final class FrameMatching {
    final Annotations truth;
    final Annotations tracks;
    final int[] truthIds;
    final int[] trackIds;
    final Map<Integer, Integer> truthIndex = new HashMap<>();
    final Map<Integer, Integer> trackIndex = new HashMap<>();
    final int[] frames;

    FrameMatching(Annotations truth, Annotations tracks) {
        this.truth = truth;
        this.tracks = tracks;
        truthIds = truth.ids().stream().mapToInt(Integer::intValue).toArray();
        trackIds = tracks.ids().stream().mapToInt(Integer::intValue).toArray();
        for (int i = 0; i < truthIds.length; i++) {
            truthIndex.put(truthIds[i], i);
        }
        for (int i = 0; i < trackIds.length; i++) {
            trackIndex.put(trackIds[i], i);
        }
        TreeSet<Integer> all = new TreeSet<>(truth.frames());
        all.addAll(tracks.frames());
        frames = all.stream().mapToInt(Integer::intValue).toArray();
    }

    /** A (truth index, track index) pair as one key. */
    static long pair(int truthIndex, int trackIndex) {
        return ((long) truthIndex << 32) | (trackIndex & 0xFFFFFFFFL);
    }

    static int truthOf(long pair) {
        return (int) (pair >>> 32);
    }

    static int trackOf(long pair) {
        return (int) pair;
    }

    /** IoU of each truth box (rows) with each track box (columns) of one frame. */
    static double[][] ious(List<LabelledBox> g, List<LabelledBox> t) {
        double[][] s = new double[g.size()][t.size()];
        for (int i = 0; i < g.size(); i++) {
            for (int j = 0; j < t.size(); j++) {
                s[i][j] = g.get(i).box().iou(t.get(j).box());
            }
        }
        return s;
    }

    /** Boxes whose IoU is at least the threshold match; a hair of rounding is allowed (1e-9). */
    static boolean matches(double iou, double threshold) {
        return iou >= threshold - 1e-9;
    }
}
