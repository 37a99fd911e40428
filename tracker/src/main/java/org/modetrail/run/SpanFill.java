package org.modetrail.run;

import java.util.ArrayList;
import java.util.List;

import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;

/**
 * The keyframe semantics of a span: between two keyframes the object is tracked forward from the first and
 * backward from the second; each frame takes the box of the pass that is more similar to its target model where
 * both found it, the one pass's box where only one did, and where neither did, a box linearly interpolated
 * between the nearest boxes either side (marked as interpolated). Keyframes themselves are never touched, and a
 * keyframe that marks the object hidden or absent is not a box to interpolate from: frames next to it that no
 * pass found stay empty. With {@link PassMerge#BLEND}, frames where the two passes agree take a weighted average.
 *
 * <p><b>Uncertainty.</b> Every box it makes carries {@link FrameAnnotation#uncertaintyPx()}, one standard
 * uncertainty per axis of the box's edges, in pixels. A tracked box combines in quadrature (the parts and their
 * sources are in {@link BoxUncertainty}): the keyframe's placement that its pass started from; the tracker's own
 * uncertainty where the pass states one ({@link PassResult#put(int, Box, double, double)}); the forward-backward
 * disagreement where both passes found the object; the doubt of a similarity below the one its pass had next to its keyframe,
 * scaled by the box's size; and a jump of the size against its neighbours. An interpolated box has the Brownian
 * bridge between the known boxes either side, growing with the distance from the nearer one.
 */
public final class SpanFill {
    /** Two passes' boxes with at least this IoU are on the same object and may be blended. */
    public static final double AGREEMENT = 0.5;
    /**
     * How many of a pass's boxes next to its keyframe give the similarity a correct placement has: 5, 0.2 s at 25
     * fps (rule of thumb, no source: few enough that the object has not moved far from the user's box, enough that
     * the median is not one frame's noise).
     */
    static final int NEAR_KEYFRAME = 5;

    private SpanFill() {
    }

    /**
     * @param start    the keyframe that opens the span, or null before the first keyframe
     * @param end      the keyframe that closes it, or null after the last
     * @param forward  the pass from {@code start} (may be empty)
     * @param backward the pass from {@code end} (may be empty)
     * @param from     first frame to fill (after {@code start})
     * @param to       last frame to fill (before {@code end})
     * @param merge    how a frame that both passes found takes its box
     */
    public static List<FrameAnnotation> fill(FrameAnnotation start, FrameAnnotation end, PassResult forward,
                                             PassResult backward, int from, int to, PassMerge merge) {
        int n = Math.max(0, to - from + 1);
        Box[] box = new Box[n];
        double[] score = new double[n];
        // The parts of each tracked box's uncertainty that do not depend on its neighbours.
        double[] own = new double[n];
        // The similarity a correct placement has, per pass, and per frame the one of the pass its box came from.
        double forwardTypical = typicalSimilarity(forward, from, to, true);
        double backwardTypical = typicalSimilarity(backward, from, to, false);
        double[] typical = new double[n];
        double startSigma = keySigma(start);
        double endSigma = keySigma(end);
        for (int f = from; f <= to; f++) {
            Box a = forward.box(f);
            Box b = backward.box(f);
            int i = f - from;
            double disagreement = a != null && b != null ? BoxUncertainty.disagreement(a, b) : 0;
            if (merge == PassMerge.BLEND && a != null && b != null && a.iou(b) >= AGREEMENT) {
                // Nearness to each pass's keyframe: t runs from 0 at the start keyframe to 1 at the end one.
                double t = (double) (f - (start != null ? start.frame() : from - 1))
                        / ((end != null ? end.frame() : to + 1) - (start != null ? start.frame() : from - 1));
                double wa = forward.score(f) * (1 - t);
                double wb = backward.score(f) * t;
                double w = wa + wb > 0 ? wb / (wa + wb) : 0.5;
                box[i] = LinearInterpolation.between(a, b, w);
                score[i] = (1 - w) * forward.score(f) + w * backward.score(f);
                typical[i] = (1 - w) * forwardTypical + w * backwardTypical;
                double keys = Math.hypot((1 - w) * startSigma, w * endSigma);
                double tracker = Math.hypot((1 - w) * zeroIfNaN(forward.uncertaintyPx(f)),
                        w * zeroIfNaN(backward.uncertaintyPx(f)));
                own[i] = BoxUncertainty.quadrature(keys, tracker, disagreement);
            } else if (a != null && (b == null || forward.score(f) >= backward.score(f))) {
                box[i] = a;
                score[i] = forward.score(f);
                typical[i] = forwardTypical;
                own[i] = BoxUncertainty.quadrature(startSigma, forward.uncertaintyPx(f), disagreement);
            } else if (b != null) {
                box[i] = b;
                score[i] = backward.score(f);
                typical[i] = backwardTypical;
                own[i] = BoxUncertainty.quadrature(endSigma, backward.uncertaintyPx(f), disagreement);
            }
        }
        Box startBox = start != null && start.isVisible() && start.frame() == from - 1 ? start.box() : null;
        Box endBox = end != null && end.isVisible() && end.frame() == to + 1 ? end.box() : null;
        double[] sigma = new double[n];
        for (int i = 0; i < n; i++) {
            if (box[i] != null) {
                Box before = i > 0 ? box[i - 1] : startBox;
                Box after = i + 1 < n ? box[i + 1] : endBox;
                sigma[i] = BoxUncertainty.quadrature(own[i], BoxUncertainty.similarity(box[i], score[i], typical[i]),
                        BoxUncertainty.sizeJump(before, box[i], after));
            }
        }
        double motion = motionVariance(start, end, box, from, to);

        List<FrameAnnotation> out = new ArrayList<>(n);
        Box before = start != null && start.isVisible() ? start.box() : null;
        double beforeSigma = startSigma;
        int beforeFrame = start != null ? start.frame() : from - 1;
        for (int i = 0; i < n; i++) {
            int f = from + i;
            if (box[i] != null) {
                out.add(FrameAnnotation.tracked(f, box[i], Math.max(0, Math.min(1, score[i])), rounded(sigma[i])));
                before = box[i];
                beforeSigma = sigma[i];
                beforeFrame = f;
                continue;
            }
            int j = i;
            while (j < n && box[j] == null) {
                j++;
            }
            Box after = j < n ? box[j] : end != null && end.isVisible() ? end.box() : null;
            double afterSigma = j < n ? sigma[j] : endSigma;
            int afterFrame = j < n ? from + j : end != null ? end.frame() : to + 1;
            if (before != null && after != null && !searchedBetween(forward, backward, from + i, from + j - 1)) {
                int gap = afterFrame - beforeFrame;
                double rate = Double.isNaN(motion) ? BoxUncertainty.motionVariance(before, after, gap) : motion;
                for (int k = i; k < j; k++) {
                    double t = (double) (from + k - beforeFrame) / gap;
                    double u = BoxUncertainty.bridge(from + k - beforeFrame, gap, beforeSigma, afterSigma, rate);
                    out.add(FrameAnnotation.interpolated(from + k, LinearInterpolation.between(before, after, t),
                            rounded(u)));
                }
            }
            i = j - 1;
        }
        return out;
    }

    /**
     * Whether a pass had lost the object somewhere in {@code a..b} and was searching for it: the object was gone
     * for longer than a pass coasts, or left the frame, so a straight line between the boxes either side would
     * be a guess, and the frames stay empty.
     */
    private static boolean searchedBetween(PassResult forward, PassResult backward, int a, int b) {
        for (int f = a; f <= b; f++) {
            if (forward.searching(f) || backward.searching(f)) {
                return true;
            }
        }
        return false;
    }

    /**
     * The median similarity of the first {@link #NEAR_KEYFRAME} boxes a pass found next to its keyframe, where the
     * place is known to be right; 0 for a pass that found none.
     */
    private static double typicalSimilarity(PassResult pass, int from, int to, boolean forward) {
        double[] s = new double[NEAR_KEYFRAME];
        int k = 0;
        for (int i = 0; i <= to - from && k < s.length; i++) {
            int f = forward ? from + i : to - i;
            if (pass.box(f) != null) {
                s[k++] = pass.score(f);
            }
        }
        if (k == 0) {
            return 0;
        }
        java.util.Arrays.sort(s, 0, k);
        return k % 2 == 1 ? s[k / 2] : (s[k / 2 - 1] + s[k / 2]) / 2;
    }

    /** A keyframe's placement uncertainty: its own where known, else the user's default; 0 for no keyframe. */
    private static double keySigma(FrameAnnotation key) {
        if (key == null || !key.isVisible()) {
            return 0;
        }
        return key.hasUncertainty() ? key.uncertaintyPx() : FrameAnnotation.KEYFRAME_UNCERTAINTY_PX;
    }

    /** To a thousandth of a pixel, far below what it can tell, so project files stay compact. */
    private static double rounded(double px) {
        return Math.round(px * 1000) / 1000.0;
    }

    private static double zeroIfNaN(double v) {
        return Double.isNaN(v) ? 0 : v;
    }

    /** The span's motion variance from its known boxes, the keyframes at its ends among them. */
    private static double motionVariance(FrameAnnotation start, FrameAnnotation end, Box[] box, int from, int to) {
        Box[] known = new Box[box.length + 2];
        known[0] = start != null && start.isVisible() && start.frame() == from - 1 ? start.box() : null;
        System.arraycopy(box, 0, known, 1, box.length);
        known[known.length - 1] = end != null && end.isVisible() && end.frame() == to + 1 ? end.box() : null;
        return BoxUncertainty.motionVariance(known);
    }
}
