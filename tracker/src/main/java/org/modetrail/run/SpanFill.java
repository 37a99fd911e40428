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
 */
public final class SpanFill {
    /** Two passes' boxes with at least this IoU are on the same object and may be blended. */
    public static final double AGREEMENT = 0.5;

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
        for (int f = from; f <= to; f++) {
            Box a = forward.box(f);
            Box b = backward.box(f);
            if (merge == PassMerge.BLEND && a != null && b != null && a.iou(b) >= AGREEMENT) {
                // Nearness to each pass's keyframe: t runs from 0 at the start keyframe to 1 at the end one.
                double t = (double) (f - (start != null ? start.frame() : from - 1))
                        / ((end != null ? end.frame() : to + 1) - (start != null ? start.frame() : from - 1));
                double wa = forward.score(f) * (1 - t);
                double wb = backward.score(f) * t;
                double w = wa + wb > 0 ? wb / (wa + wb) : 0.5;
                box[f - from] = LinearInterpolation.between(a, b, w);
                score[f - from] = (1 - w) * forward.score(f) + w * backward.score(f);
            } else if (a != null && (b == null || forward.score(f) >= backward.score(f))) {
                box[f - from] = a;
                score[f - from] = forward.score(f);
            } else if (b != null) {
                box[f - from] = b;
                score[f - from] = backward.score(f);
            }
        }
        List<FrameAnnotation> out = new ArrayList<>(n);
        Box before = start != null && start.isVisible() ? start.box() : null;
        int beforeFrame = start != null ? start.frame() : from - 1;
        for (int i = 0; i < n; i++) {
            int f = from + i;
            if (box[i] != null) {
                out.add(FrameAnnotation.tracked(f, box[i], Math.max(0, Math.min(1, score[i]))));
                before = box[i];
                beforeFrame = f;
                continue;
            }
            int j = i;
            while (j < n && box[j] == null) {
                j++;
            }
            Box after = j < n ? box[j] : end != null && end.isVisible() ? end.box() : null;
            int afterFrame = j < n ? from + j : end != null ? end.frame() : to + 1;
            if (before != null && after != null) {
                for (int k = i; k < j; k++) {
                    double t = (double) (from + k - beforeFrame) / (afterFrame - beforeFrame);
                    out.add(FrameAnnotation.interpolated(from + k, LinearInterpolation.between(before, after, t)));
                }
            }
            i = j - 1;
        }
        return out;
    }
}
