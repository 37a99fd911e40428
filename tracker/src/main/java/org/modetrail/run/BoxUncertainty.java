package org.modetrail.run;

import org.modetrail.model.Box;

/**
 * The parts of a box's uncertainty that {@link SpanFill} works out from the passes of a span. Each part is one
 * standard uncertainty, per image axis, of where the box's edges are (its centre's uncertainty and half its size's,
 * in quadrature: the ground contact point at the bottom centre moves with the centre and with half the height's
 * error). The parts are taken as independent and combined in quadrature (the law of propagation of uncertainty for
 * a sum of independent errors, JCGM 100:2008 (GUM) section 5.1, equation 10; equation number from memory).
 *
 * <ul>
 * <li><b>Forward-backward disagreement</b> ({@link #disagreement}): where a pass from the keyframe before and one from
 * the keyframe after both found the object, a correct track is the same either way, and a large difference between
 * the two is the mark of a failure (the forward-backward error of Kalal, Mikolajczyk and Matas, "Forward-backward
 * error: automatic detection of tracking failures", ICPR 2010; they track a point forward and back over the same
 * frames, here the two passes come from two keyframes). Two equally good independent estimates would differ by
 * about twice their per-axis sigma; the merge keeps one box, and when they disagree one of them has usually drifted
 * without our knowing which, so the kept box's error is taken as the whole disagreement: the distance between the
 * centres, and half the larger difference of width or height for the edges (rule of thumb, no source).</li>
 * <li><b>Similarity</b> ({@link #similarity}): the Bhattacharyya coefficient rho of the candidate against the target
 * model (Comaniciu, Ramesh and Meer 2003, equation 17). If the object's colours and the background's share no bin
 * and a share e of the candidate's kernel-weighted pixels is background, then rho = sqrt(1 - e), so e = 1 - rho^2.
 * With the Epanechnikov profile over the box's inscribed ellipse (semi-axes a = w / 2, b = h / 2), a small shift
 * (dx, dy) of the window off the object uncovers a share e = (dx / a)^2 + (dy / b)^2 of the kernel's weight (the
 * crescent at the ellipse's rim, where the profile 1 - r^2 is about 2 (1 - r): integrating it gives f^2 for a shift
 * of f semi-axes; our derivation). With an error of sigma in each axis, E[e] = sigma^2 (1 / a^2 + 1 / b^2), which
 * inverted gives sigma = sqrt(e / (1 / a^2 + 1 / b^2)): doubt grows with the box's size. Noise, compression and
 * slow changes of appearance keep even a perfect placement below rho = 1, and its rho scatters from frame to frame,
 * so rho is taken relative to the typical similarity of a correct placement, rho_0, the median over the pass's first
 * boxes next to its keyframe (where the place is known; {@link SpanFill#NEAR_KEYFRAME}): e = 1 - (rho / rho_0)^2,
 * 0 at or above rho_0. (The span's best similarity as rho_0, tried first, is a maximum of a noisy figure: biased high,
 * it read ordinary frame-to-frame scatter as doubt.) Where
 * the background shares the object's colours the same shift lowers rho less, so this then understates; where the
 * object's appearance changes without a shift, it overstates.</li>
 * <li><b>Size jumps</b> ({@link #sizeJump}): a real object's image size changes smoothly with its distance, so a
 * width or height that departs from the mean of its two neighbours' (the second difference, which is 0 for steady
 * growth) is an error of the size, of at least that departure on one of the frames; the edges move by half of it.
 * At a run's end, where one neighbour is missing, the step to the other is taken.</li>
 * <li><b>Interpolation</b> ({@link #bridge}): a box interpolated between two known ones is uncertain by the
 * Brownian bridge between them (Horne, Garton, Krone and Lewis, "Analyzing animal movements using Brownian
 * bridges", Ecology 88, 2007, equation 2): at a fraction alpha = k / n of an n-frame gap, variance n alpha (1 - alpha)
 * sigma_m^2 + (1 - alpha)^2 sigma_a^2 + alpha^2 sigma_b^2, where sigma_a and sigma_b are the known boxes'
 * uncertainties. It grows with the distance from the nearest known box and is largest mid-gap. The motion variance
 * sigma_m^2 (per frame, per edge) is estimated as Horne et al. do, from leaving out each middle box of three
 * consecutive known ones ({@link #motionVariance}; by moments rather than their maximum likelihood), or where the
 * span has no three consecutive boxes, from the one increment across the gap.</li>
 * <li><b>Keyframes</b>: the user's placement, {@link org.modetrail.model.FrameAnnotation#KEYFRAME_UNCERTAINTY_PX},
 * carried by every box tracked from it (the target model is built on the user's box).</li>
 * </ul>
 */
final class BoxUncertainty {
    private BoxUncertainty() {
    }

    /** Forward-backward disagreement of the two passes' boxes: centre distance and half the larger size difference. */
    static double disagreement(Box a, Box b) {
        double size = Math.max(Math.abs(a.width() - b.width()), Math.abs(a.height() - b.height()));
        double centre = a.centreDistance(b);
        return Math.sqrt(centre * centre + size * size / 4);
    }

    /**
     * The place's uncertainty implied by a similarity {@code rho} against {@code typical}, the similarity of a
     * correct placement, for a box of {@code box}'s size; 0 when rho is at least the typical one or the box has no
     * size.
     */
    static double similarity(Box box, double rho, double typical) {
        if (!(typical > 0) || !(rho < typical) || box.width() <= 0 || box.height() <= 0) {
            return 0;
        }
        double r = Math.max(0, rho) / typical;
        double share = 1 - r * r; // e, the kernel-weighted share of the window off the object
        double a = box.width() / 2;
        double b = box.height() / 2;
        return Math.sqrt(share / (1 / (a * a) + 1 / (b * b)));
    }

    /**
     * The edges' uncertainty from a size jump at a box between {@code before} and {@code after} (either may be
     * null, both not): half the larger departure of width or height from the neighbours' mean, or from the one
     * neighbour there is.
     */
    static double sizeJump(Box before, Box box, Box after) {
        if (before == null && after == null) {
            return 0;
        }
        double w;
        double h;
        if (before != null && after != null) {
            w = box.width() - (before.width() + after.width()) / 2;
            h = box.height() - (before.height() + after.height()) / 2;
        } else {
            Box other = before != null ? before : after;
            w = box.width() - other.width();
            h = box.height() - other.height();
        }
        return Math.max(Math.abs(w), Math.abs(h)) / 2;
    }

    /**
     * The Brownian bridge's standard uncertainty {@code k} frames into an {@code n}-frame gap between boxes of
     * uncertainty {@code sigmaA} (at the gap's start) and {@code sigmaB} (at its end), with motion variance
     * {@code motionVariance} px^2 per frame.
     */
    static double bridge(int k, int n, double sigmaA, double sigmaB, double motionVariance) {
        double alpha = (double) k / n;
        double var = n * alpha * (1 - alpha) * motionVariance + (1 - alpha) * (1 - alpha) * sigmaA * sigmaA
                + alpha * alpha * sigmaB * sigmaB;
        return Math.sqrt(var);
    }

    /**
     * Motion variance per frame and edge from the known boxes {@code boxes[i]} (null where unknown) on consecutive
     * frames: for each middle box of three consecutive ones, each edge's departure from its neighbours' mean has
     * variance sigma_m^2 / 2 under Brownian motion (the bridge at alpha = 1/2 over 2 frames), so sigma_m^2 is twice
     * the mean squared departure. NaN when there are no three consecutive boxes. Tracking noise adds to it, which
     * errs on the side of a wider interval.
     */
    static double motionVariance(Box[] boxes) {
        double sum = 0;
        int count = 0;
        for (int i = 1; i + 1 < boxes.length; i++) {
            Box p = boxes[i - 1];
            Box b = boxes[i];
            Box q = boxes[i + 1];
            if (p == null || b == null || q == null) {
                continue;
            }
            sum += square(b.x() - (p.x() + q.x()) / 2) + square(b.y() - (p.y() + q.y()) / 2)
                    + square(b.right() - (p.right() + q.right()) / 2)
                    + square(b.bottom() - (p.bottom() + q.bottom()) / 2);
            count += 4;
        }
        return count == 0 ? Double.NaN : 2 * sum / count;
    }

    /** Motion variance from one increment over {@code n} frames: E[d^2] = n sigma_m^2 per edge. */
    static double motionVariance(Box a, Box b, int n) {
        double sum = square(b.x() - a.x()) + square(b.y() - a.y()) + square(b.right() - a.right())
                + square(b.bottom() - a.bottom());
        return sum / 4 / n;
    }

    static double quadrature(double... parts) {
        double sum = 0;
        for (double p : parts) {
            if (!Double.isNaN(p)) {
                sum += p * p;
            }
        }
        return Math.sqrt(sum);
    }

    private static double square(double v) {
        return v * v;
    }
}
