package org.modetrail.evaluation;

import java.util.ArrayList;
import java.util.List;
import java.util.NavigableMap;

/**
 * The one-pass evaluation of Wu, Lim and Yang, "Online object tracking: a benchmark" (CVPR 2013), section 4.1:
 * per truth object, the success plot (fraction of frames whose IoU with the truth is above each threshold
 * t = 0, 0.05, ..., 1; its area under the curve is the mean over those 21 points), the precision plot (fraction
 * of frames whose centres are at most d px apart, d = 0 to 50) and its value at the representative 20 px.
 *
 * <p>Comparisons as in the benchmark's own code (from memory: overlap strictly above the threshold, centre error
 * at most the threshold), so a track equal to the truth scores 20/21 = 0.952 (no IoU is above 1). Our choices,
 * not the paper's: frames where the truth is less than half visible are not scored (there is no right box to
 * compare with); a truth frame with no box of the track scores IoU 0 and an infinite centre error; the track is
 * the one with the truth object's id; the first frame is scored like the others (a file of tracks does not say
 * which boxes were given to the tracker).
 */
public final class SingleObjectEvaluation {
    /** Points of the success plot: thresholds i / 20. */
    public static final int SUCCESS_POINTS = 21;
    /** The representative precision threshold, px (section 4.1). */
    public static final double PRECISION_PX = 20;
    /** Points of the precision plot: 0 to 50 px. */
    public static final int PRECISION_POINTS = 51;
    /** Truth less visible than this is not scored. */
    public static final double MIN_VISIBLE = 0.5;

    private SingleObjectEvaluation() {
    }

    /** A score for every truth object, by ascending id. */
    public static List<SingleObjectScore> scores(Annotations truth, Annotations tracks) {
        List<SingleObjectScore> out = new ArrayList<>();
        for (int id : truth.ids()) {
            out.add(score(id, truth.ofId(id), tracks.ofId(id)));
        }
        return out;
    }

    /** Mean over the 21 thresholds t = i / 20 of the fraction of {@code ious[0..count)} strictly above t. */
    public static double successAuc(double[] ious, int count) {
        if (count == 0) {
            return Double.NaN;
        }
        double sum = 0;
        for (int i = 0; i < SUCCESS_POINTS; i++) {
            int above = 0;
            for (int k = 0; k < count; k++) {
                if (ious[k] > i / 20.0) {
                    above++;
                }
            }
            sum += (double) above / count;
        }
        return sum / SUCCESS_POINTS;
    }

    static SingleObjectScore score(int id, NavigableMap<Integer, LabelledBox> truth,
                                   NavigableMap<Integer, LabelledBox> track) {
        List<double[]> scored = new ArrayList<>(); // {iou, centre error}
        int untilFailure = -1;
        for (LabelledBox t : truth.values()) {
            if (t.visible() < MIN_VISIBLE) {
                continue;
            }
            LabelledBox b = track.get(t.frame());
            double iou = b == null ? 0 : b.box().iou(t.box());
            double error = b == null ? Double.POSITIVE_INFINITY : b.box().centreDistance(t.box());
            if (iou == 0 && untilFailure < 0) {
                untilFailure = scored.size();
            }
            scored.add(new double[] {iou, error});
        }
        int n = scored.size();
        double[] success = new double[SUCCESS_POINTS];
        double[] precision = new double[PRECISION_POINTS];
        if (n > 0) {
            for (double[] s : scored) {
                for (int i = 0; i < SUCCESS_POINTS; i++) {
                    // i / 20.0, not i * 0.05: thresholds 0.5 and 1 are then exact.
                    if (s[0] > i / 20.0) {
                        success[i]++;
                    }
                }
                for (int d = 0; d < PRECISION_POINTS; d++) {
                    if (s[1] <= d) {
                        precision[d]++;
                    }
                }
            }
            for (int i = 0; i < SUCCESS_POINTS; i++) {
                success[i] /= n;
            }
            for (int d = 0; d < PRECISION_POINTS; d++) {
                precision[d] /= n;
            }
        }
        double auc = 0;
        for (double s : success) {
            auc += s;
        }
        auc /= SUCCESS_POINTS;
        return new SingleObjectScore(id, n, n == 0 ? Double.NaN : auc,
                n == 0 ? Double.NaN : precision[(int) PRECISION_PX], n == 0 ? Double.NaN : success[10],
                untilFailure < 0 ? n : untilFailure, success, precision);
    }
}
