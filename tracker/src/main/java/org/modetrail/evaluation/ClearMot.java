package org.modetrail.evaluation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * CLEAR MOT, after Bernardin and Stiefelhagen, "Evaluating multiple object tracking performance: the CLEAR MOT
 * metrics" (EURASIP Journal on Image and Video Processing, 2008), section 2.1 (the mapping procedure) and
 * equations (1) and (2) (MOTP, MOTA), with IoU as the similarity: a truth box and a track box may correspond when
 * their IoU is at least the threshold. On each frame a correspondence made on the frame before is kept while it is
 * still allowed; the other boxes are paired by the Hungarian method ({@link Assignment}) for the greatest total IoU.
 * (Keeping correspondences is done, as in the MOTChallenge evaluation code, from memory, by giving pairs that
 * continue the previous frame's correspondence a score above any IoU before the assignment.) A mismatch (identity
 * switch) is counted when a truth object is matched to a track other than the one it was last matched to, however
 * long ago. MOTP here is the mean IoU of matched pairs (higher is better), not the mean distance of the paper.
 * Mostly tracked / mostly lost use the 80% / 20% of Li, Huang and Nevatia (CVPR 2009).
 */
public final class ClearMot {
    /** Added to the score of a pair that continues the previous frame's correspondence. */
    private static final double CONTINUE_BONUS = 1000;

    private ClearMot() {
    }

    public static ClearMotScore score(Annotations truth, Annotations tracks, double iouThreshold) {
        FrameMatching m = new FrameMatching(truth, tracks);
        Map<Integer, Integer> lastMatch = new HashMap<>();
        Map<Integer, Integer> previousFrame = new HashMap<>();
        int[] presentFrames = new int[m.truthIds.length];
        int[] matchedFrames = new int[m.truthIds.length];
        int matches = 0;
        int misses = 0;
        int falsePositives = 0;
        int switches = 0;
        double iouSum = 0;
        for (int f : m.frames) {
            List<LabelledBox> g = truth.onFrame(f);
            List<LabelledBox> t = tracks.onFrame(f);
            for (LabelledBox b : g) {
                presentFrames[m.truthIndex.get(b.id())]++;
            }
            Map<Integer, Integer> thisFrame = new HashMap<>();
            int matchedHere = 0;
            if (!g.isEmpty() && !t.isEmpty()) {
                double[][] iou = FrameMatching.ious(g, t);
                double[][] score = new double[g.size()][t.size()];
                for (int i = 0; i < g.size(); i++) {
                    Integer before = previousFrame.get(g.get(i).id());
                    for (int j = 0; j < t.size(); j++) {
                        if (FrameMatching.matches(iou[i][j], iouThreshold)) {
                            boolean continued = before != null && before == t.get(j).id();
                            score[i][j] = iou[i][j] + (continued ? CONTINUE_BONUS : 0) + 1e-12;
                        }
                    }
                }
                int[] pick = Assignment.maximumPositiveScore(score);
                for (int i = 0; i < pick.length; i++) {
                    int j = pick[i];
                    if (j < 0 || score[i][j] <= 0) {
                        continue;
                    }
                    int gid = g.get(i).id();
                    int tid = t.get(j).id();
                    Integer last = lastMatch.get(gid);
                    if (last != null && last != tid) {
                        switches++;
                    }
                    lastMatch.put(gid, tid);
                    thisFrame.put(gid, tid);
                    matchedFrames[m.truthIndex.get(gid)]++;
                    iouSum += iou[i][j];
                    matchedHere++;
                }
            }
            matches += matchedHere;
            misses += g.size() - matchedHere;
            falsePositives += t.size() - matchedHere;
            previousFrame = thisFrame;
        }
        int mt = 0;
        int ml = 0;
        for (int i = 0; i < presentFrames.length; i++) {
            double ratio = presentFrames[i] == 0 ? 0 : (double) matchedFrames[i] / presentFrames[i];
            if (ratio >= 0.8) {
                mt++;
            } else if (ratio < 0.2) {
                ml++;
            }
        }
        int truthBoxes = truth.count();
        double mota = truthBoxes == 0 ? Double.NaN
                : 1 - (double) (misses + falsePositives + switches) / truthBoxes;
        double motp = matches == 0 ? Double.NaN : iouSum / matches;
        return new ClearMotScore(mota, motp, truthBoxes, tracks.count(), matches, misses, falsePositives, switches,
                m.truthIds.length, mt, m.truthIds.length - mt - ml, ml);
    }
}
