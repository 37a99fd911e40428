package org.modetrail.evaluation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * HOTA, from Luiten, Osep, Dendorfer, Torr, Geiger, Leal-Taixe and Leibe, "HOTA: a higher order metric for
 * evaluating multi-object tracking" (IJCV 2021), section 5: for each localisation threshold alpha, boxes are
 * matched frame by frame one-to-one with IoU at least alpha; DetA = |TP| / (|TP| + |FN| + |FP|) (equation 5),
 * AssA the mean over true positives c of A(c) = |TPA(c)| / (|TPA(c)| + |FNA(c)| + |FPA(c)|) (equations 6 and 7),
 * HOTA_alpha = sqrt(DetA x AssA) (equation 8), and HOTA the mean over alpha = 0.05, ..., 0.95 (equation 9);
 * LocA is the mean IoU of the true positives (equation 11).
 *
 * <p>The matching on each frame maximises HOTA as section 5.2 asks, in the way of the authors' own code (from
 * memory of that code, not of the paper's text): a first pass sums, for each truth id and track id, a soft count of
 * their frame-by-frame similarity; on each frame the Hungarian method ({@link Assignment}) then pairs boxes by
 * that global alignment times the IoU, and the pairs with IoU at least alpha are the true positives at alpha.
 */
public final class Hota {
    /** Thresholds 0.05 to 0.95 by 0.05. */
    public static final int ALPHAS = 19;

    private Hota() {
    }

    /** The alpha of index i. */
    public static double alpha(int i) {
        return (i + 1) / 20.0;
    }

    public static HotaScore score(Annotations truth, Annotations tracks) {
        FrameMatching m = new FrameMatching(truth, tracks);
        int ng = m.truthIds.length;
        int nt = m.trackIds.length;
        double[] truthFrames = new double[ng];
        double[] trackFrames = new double[nt];
        // Per (truth, track) pair that ever overlap: sparse, as most pairs of a long video never meet.
        Map<Long, double[]> potential = new HashMap<>();
        for (int f : m.frames) {
            List<LabelledBox> g = truth.onFrame(f);
            List<LabelledBox> t = tracks.onFrame(f);
            for (LabelledBox b : g) {
                truthFrames[m.truthIndex.get(b.id())]++;
            }
            for (LabelledBox b : t) {
                trackFrames[m.trackIndex.get(b.id())]++;
            }
            if (g.isEmpty() || t.isEmpty()) {
                continue;
            }
            double[][] s = FrameMatching.ious(g, t);
            double[] rowSum = new double[g.size()];
            double[] colSum = new double[t.size()];
            for (int i = 0; i < g.size(); i++) {
                for (int j = 0; j < t.size(); j++) {
                    rowSum[i] += s[i][j];
                    colSum[j] += s[i][j];
                }
            }
            for (int i = 0; i < g.size(); i++) {
                for (int j = 0; j < t.size(); j++) {
                    double denominator = rowSum[i] + colSum[j] - s[i][j];
                    if (s[i][j] > 0 && denominator > 1e-12) {
                        potential.computeIfAbsent(FrameMatching.pair(m.truthIndex.get(g.get(i).id()),
                                m.trackIndex.get(t.get(j).id())), k -> new double[1])[0] += s[i][j] / denominator;
                    }
                }
            }
        }
        double[] tp = new double[ALPHAS];
        double[] fn = new double[ALPHAS];
        double[] fp = new double[ALPHAS];
        double[] loc = new double[ALPHAS];
        Map<Long, double[]> matched = new HashMap<>();
        for (int f : m.frames) {
            List<LabelledBox> g = truth.onFrame(f);
            List<LabelledBox> t = tracks.onFrame(f);
            int[] here = new int[ALPHAS];
            if (!g.isEmpty() && !t.isEmpty()) {
                double[][] s = FrameMatching.ious(g, t);
                double[][] score = new double[g.size()][t.size()];
                for (int i = 0; i < g.size(); i++) {
                    int gi = m.truthIndex.get(g.get(i).id());
                    for (int j = 0; j < t.size(); j++) {
                        if (s[i][j] > 0) {
                            int tj = m.trackIndex.get(t.get(j).id());
                            double pm = potential.get(FrameMatching.pair(gi, tj))[0];
                            double alignment = pm / (truthFrames[gi] + trackFrames[tj] - pm);
                            score[i][j] = alignment * s[i][j];
                        }
                    }
                }
                int[] pick = Assignment.maximumPositiveScore(score);
                for (int i = 0; i < pick.length; i++) {
                    int j = pick[i];
                    if (j < 0 || score[i][j] <= 0) {
                        continue;
                    }
                    long key = FrameMatching.pair(m.truthIndex.get(g.get(i).id()), m.trackIndex.get(t.get(j).id()));
                    double[] counts = null;
                    for (int a = 0; a < ALPHAS; a++) {
                        if (FrameMatching.matches(s[i][j], alpha(a))) {
                            if (counts == null) {
                                counts = matched.computeIfAbsent(key, k -> new double[ALPHAS]);
                            }
                            here[a]++;
                            counts[a]++;
                            loc[a] += s[i][j];
                        }
                    }
                }
            }
            for (int a = 0; a < ALPHAS; a++) {
                tp[a] += here[a];
                fn[a] += g.size() - here[a];
                fp[a] += t.size() - here[a];
            }
        }
        double[] hota = new double[ALPHAS];
        double[] detA = new double[ALPHAS];
        double[] assA = new double[ALPHAS];
        double[] locA = new double[ALPHAS];
        boolean nothing = truth.isEmpty() && tracks.isEmpty();
        double[] sum = new double[ALPHAS];
        for (Map.Entry<Long, double[]> e : matched.entrySet()) {
            double gFrames = truthFrames[FrameMatching.truthOf(e.getKey())];
            double tFrames = trackFrames[FrameMatching.trackOf(e.getKey())];
            for (int a = 0; a < ALPHAS; a++) {
                double c = e.getValue()[a];
                if (c > 0) {
                    // A(c) is the same for every true positive of the pair: c of them share it.
                    sum[a] += c * c / (gFrames + tFrames - c);
                }
            }
        }
        for (int a = 0; a < ALPHAS; a++) {
            double all = tp[a] + fn[a] + fp[a];
            detA[a] = all == 0 ? Double.NaN : tp[a] / all;
            assA[a] = tp[a] == 0 ? (nothing ? Double.NaN : 0) : sum[a] / tp[a];
            hota[a] = Math.sqrt(detA[a] * assA[a]);
            locA[a] = tp[a] == 0 ? Double.NaN : loc[a] / tp[a];
        }
        return new HotaScore(mean(hota), mean(detA), mean(assA), mean(locA), hota, detA, assA);
    }

    private static double mean(double[] v) {
        double s = 0;
        int n = 0;
        for (double x : v) {
            if (!Double.isNaN(x)) {
                s += x;
                n++;
            }
        }
        return n == 0 ? Double.NaN : s / n;
    }
}
