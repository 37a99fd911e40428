package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.modetrail.evaluation.Annotations;
import org.modetrail.evaluation.LabelledBox;
import org.modetrail.evaluation.SingleObjectEvaluation;
import org.modetrail.evaluation.SingleObjectScore;
import org.modetrail.model.Box;

/**
 * One tracker's run on one object of one clip, from a keyframe (the true box) on the object's {@linkplain
 * ObjectTruth#start() first half-visible frame} to the clip's end, and the figures the report aggregates.
 *
 * @param kind             the clip's kind (slug), or {@code vtest} for the real footage
 * @param seed             the clip's seed (0 for real footage)
 * @param tracker          the tracker's key ({@link PeerTrackers})
 * @param object           the object's id
 * @param start            the keyframe's frame
 * @param scored           frames after the start at least half visible (OTB, Wu, Lim and Yang 2013: scored)
 * @param auc              success AUC over those frames, no box scoring IoU 0 ({@link SingleObjectEvaluation})
 * @param precision20      share of them with the centre within 20 px
 * @param curve            the success plot, 21 points
 * @param framesToFailure  frames from the start to the first failure: a scored frame with no box, IoU 0, or a box
 *                         of more than {@value #BALLOON} times the truth's area; when none, to the last scored frame
 * @param failed           whether there was such a failure (the track ended or ballooned before the object left
 *                         for good)
 * @param tracked          frames after the start
 * @param wrongReacquired  re-acquisitions onto something else: frames on which the tracker reports a box after it
 *                         reported none on the frame before, while its object is in view, with IoU under
 *                         {@value #WRONG_REACQUIRE_IOU} with its object's truth
 * @param boxesWhileAbsent frames on which the tracker reports a box while its object is out of the frame
 * @param keyframes        keyframes the simulated annotator added after the first ({@link BenchEffort})
 * @param effortFrames     frames the annotator judged over: from the start to the clip's end
 * @param msPerFrame       peers: median ms per {@code track()} call over this clip's objects; Modetrail: the track
 *                         runner's wall time over the clip's frames times its objects
 * @param decodeMs         median ms to decode one frame of this clip in the same run
 */
public record ObjectFigures(String kind, long seed, String tracker, int object, int start, int scored, double auc,
                            double precision20, double[] curve, int framesToFailure, boolean failed, int tracked,
                            int wrongReacquired, int boxesWhileAbsent, int keyframes, int effortFrames,
                            double msPerFrame, double decodeMs) {
    /** A box this many times the truth's area has ballooned (the rule). */
    public static final double BALLOON = 4;
    /** A re-acquired box overlapping its object less than this is on something else. */
    public static final double WRONG_REACQUIRE_IOU = 0.3;

    static final String HEADER = "kind,seed,tracker,object,start,scored,auc,precision20,frames_to_failure,failed,"
            + "tracked,wrong_reacquired,boxes_while_absent,keyframes,effort_frames,ms_per_frame,decode_ms,curve";

    /**
     * Scores a run.
     *
     * @param boxes the tracker's box on every frame of the clip, null where it reported none
     */
    public static ObjectFigures score(String kind, long seed, String tracker, ObjectTruth truth, Box[] boxes,
                                      int keyframes, double msPerFrame, double decodeMs) {
        int start = truth.start();
        int n = truth.frameCount();
        List<LabelledBox> t = new ArrayList<>();
        List<LabelledBox> b = new ArrayList<>();
        int failure = -1;
        int wrong = 0;
        int absent = 0;
        for (int f = start + 1; f < n; f++) {
            TruthBox tb = truth.at(f);
            Box box = boxes[f];
            if (truth.scored(f)) {
                t.add(new LabelledBox(1, f, tb.box(), tb.visible()));
                boolean lost = box == null || box.iou(tb.box()) == 0 || box.area() > BALLOON * tb.box().area();
                if (lost && failure < 0) {
                    failure = f;
                }
            }
            if (box != null) {
                b.add(new LabelledBox(1, f, box));
                if (!truth.inView(f)) {
                    absent++;
                } else if (f > start + 1 && boxes[f - 1] == null && box.iou(tb.box()) < WRONG_REACQUIRE_IOU) {
                    wrong++;
                }
            }
        }
        int last = truth.lastScored();
        int toFailure = failure >= 0 ? failure - start : Math.max(0, last - start);
        double auc = Double.NaN;
        double p20 = Double.NaN;
        double[] curve = new double[SingleObjectEvaluation.SUCCESS_POINTS];
        int scored = t.size();
        if (scored > 0) {
            SingleObjectScore s = SingleObjectEvaluation.scores(Annotations.of(t), Annotations.of(b)).get(0);
            auc = s.successAuc();
            p20 = s.precisionAt20();
            curve = s.successCurve();
        }
        return new ObjectFigures(kind, seed, tracker, truth.id(), start, scored, auc, p20, curve, toFailure,
                failure >= 0, n - start - 1, wrong, absent, keyframes, n - start, msPerFrame, decodeMs);
    }

    String csv() {
        StringBuilder c = new StringBuilder();
        for (double v : curve) {
            c.append(c.length() == 0 ? "" : " ").append(String.format(Locale.ROOT, "%.6f", v));
        }
        return String.format(Locale.ROOT, "%s,%d,%s,%d,%d,%d,%.6f,%.6f,%d,%d,%d,%d,%d,%d,%d,%.6f,%.6f,%s", kind, seed,
                tracker, object, start, scored, auc, precision20, framesToFailure, failed ? 1 : 0, tracked,
                wrongReacquired, boxesWhileAbsent, keyframes, effortFrames, msPerFrame, decodeMs, c);
    }

    static ObjectFigures parse(String line) {
        String[] f = line.split(",", -1);
        if (f.length != 18) {
            throw new IllegalArgumentException("a run line has 18 fields, got " + f.length + ": " + line);
        }
        double[] curve = Arrays.stream(f[17].split(" ")).mapToDouble(Double::parseDouble).toArray();
        return new ObjectFigures(f[0], Long.parseLong(f[1]), f[2], Integer.parseInt(f[3]), Integer.parseInt(f[4]),
                Integer.parseInt(f[5]), Double.parseDouble(f[6]), Double.parseDouble(f[7]), curve,
                Integer.parseInt(f[8]), f[9].equals("1"), Integer.parseInt(f[10]), Integer.parseInt(f[11]),
                Integer.parseInt(f[12]), Integer.parseInt(f[13]), Integer.parseInt(f[14]),
                Double.parseDouble(f[15]), Double.parseDouble(f[16]));
    }
}
