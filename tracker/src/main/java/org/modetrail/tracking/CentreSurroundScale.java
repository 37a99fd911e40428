package org.modetrail.tracking;

import org.modetrail.model.Box;

/**
 * Size by scale selection over the colour likelihood, after Collins, "Mean-shift blob tracking through scale space",
 * CVPR 2003: the object's size is the scale at which a centre-surround (difference-of-Gaussians) kernel applied to
 * the weight image responds most, searched from the current scale so that the nearest mode wins (a group of
 * look-alikes around the object is a mode at a larger scale that a local search does not jump to). Departures from
 * the paper:
 * <ul>
 * <li>the kernel is a box difference (the mean likelihood inside the box minus the mean in the ring between the box
 * and the box enlarged by {@link #SURROUND} in each direction), the box approximation of a DoG as in SURF (Bay et
 * al. 2008), summed with an integral image (Crow 1984), bilinear on the summed-area table so fractional edges count
 * their partial pixels and small boxes change by sub-pixel steps;</li>
 * <li>width and height are searched separately (the paper's scale is isotropic), so a body that turns changes its
 * aspect; the change is taken a fraction at a time ({@code smoothing}) and bounded per frame;</li>
 * <li>a weak prior on the aspect of the user's box: each candidate loses {@code aspectPrior} times the squared log
 * ratio of its aspect to the start aspect, so a box does not stretch sideways over a neighbour for want of
 * evidence. The prior's weight is small enough that a body that really turns (aspect x4) is followed.</li>
 * </ul>
 * Pixels outside the frame do not count (means are over the in-frame part of each area).
 */
final class CentreSurroundScale {
    /** Outer size of the surround over the box, per side: the DoG's sigma ratio of 1.6 (Marr and Hildreth 1980). */
    static final double SURROUND = 1.6;
    /** Relative steps of width and height tried per frame, each way. */
    private static final double[] STEPS = {-0.1, -0.05, 0, 0.05, 0.1};

    private final double smoothing;
    private final double aspectPrior;
    private double[] integral = new double[0];
    private int ix0;
    private int iy0;
    private int iw;
    private int ih;
    /** The response of the last size chosen (mean inside minus mean around). */
    double response;
    /** Mean likelihood inside the last chosen box. */
    double inside;

    CentreSurroundScale(double smoothing, double aspectPrior) {
        this.smoothing = smoothing;
        this.aspectPrior = aspectPrior;
    }

    /**
     * The size the likelihood says at the box's centre, a fraction of the way from the box's size; the box itself
     * when the region holds no likelihood. {@code startAspect} is the width over height of the user's box.
     */
    Box adapt(BinImage image, ColourLikelihood likelihood, Box userBox, double startAspect) {
        Box box = userBox.resized(userBox.width() * coreWidth, userBox.height() * coreHeight);
        double reach = (1 + STEPS[STEPS.length - 1]) * SURROUND / 2;
        if (!integrate(image, likelihood, box.centreX() - reach * box.width() - 1,
                box.centreY() - reach * box.height() - 1, box.centreX() + reach * box.width() + 1,
                box.centreY() + reach * box.height() + 1)) {
            return box;
        }
        double logAspect0 = Math.log(startAspect);
        double best = Double.NEGATIVE_INFINITY;
        double bestW = box.width();
        double bestH = box.height();
        double bestResponse = 0;
        double bestInside = 0;
        double bestMass = 0;
        for (double sx : STEPS) {
            for (double sy : STEPS) {
                double w = box.width() * (1 + sx);
                double h = box.height() * (1 + sy);
                double r = respond(box.centreX(), box.centreY(), w, h);
                double d = Math.log(w / h) - logAspect0;
                double m = massRef > 0 && lastMass > 0 ? Math.log(lastMass / massRef) : 0;
                double score = r - aspectPrior * d * d - MASS_PRIOR * m * m;
                if (score > best) {
                    best = score;
                    bestW = w;
                    bestH = h;
                    bestResponse = r;
                    bestInside = lastInside;
                    bestMass = lastMass;
                }
            }
        }
        response = bestResponse;
        inside = bestInside;
        if (bestMass > 0) {
            massRef = massRef <= 0 ? bestMass : massRef + MASS_RATE * (bestMass - massRef);
        }
        double w = box.width() + smoothing * (bestW - box.width());
        double h = box.height() + smoothing * (bestH - box.height());
        return userBox.resized(Math.max(2, w / coreWidth), Math.max(2, h / coreHeight));
    }

    /**
     * Measures, on the user's box, where the response peaks relative to it: a body that does not fill its box (an
     * ellipse, a person) peaks on a smaller box than the one the user drew. Sizes are then searched for that peak
     * and reported scaled back to the user's way of drawing, so the object's shape cancels (as the moment
     * estimator refers its moments to the start box). The ratio is searched over 0.5 to 1.3 of each side.
     */
    void calibrate(BinImage image, ColourLikelihood likelihood, Box box) {
        massRef = 0;
        coreWidth = 1;
        coreHeight = 1;
        double reach = 1.3 * SURROUND / 2;
        if (!integrate(image, likelihood, box.centreX() - reach * box.width() - 1,
                box.centreY() - reach * box.height() - 1, box.centreX() + reach * box.width() + 1,
                box.centreY() + reach * box.height() + 1)) {
            return;
        }
        double best = Double.NEGATIVE_INFINITY;
        for (int i = 0; i <= 16; i++) {
            for (int j = 0; j <= 16; j++) {
                double sx = 0.5 + 0.05 * i;
                double sy = 0.5 + 0.05 * j;
                double r = respond(box.centreX(), box.centreY(), box.width() * sx, box.height() * sy);
                if (r > best) {
                    best = r;
                    coreWidth = sx;
                    coreHeight = sy;
                    massRef = lastMass;
                }
            }
        }
    }

    /** The peak's box over the user's box, per side; 1 until {@link #calibrate} measured it. */
    double coreWidth = 1;
    double coreHeight = 1;

    /** The centre-surround response of a box of {@code w x h} at (cx, cy) on the current integral image. */
    double respondAt(BinImage image, ColourLikelihood likelihood, double cx, double cy, double w, double h) {
        double rw = w * SURROUND / 2 + 1;
        double rh = h * SURROUND / 2 + 1;
        if (!integrate(image, likelihood, cx - rw, cy - rh, cx + rw, cy + rh)) {
            return 0;
        }
        double r = respond(cx, cy, w, h);
        inside = lastInside;
        return r;
    }

    private double lastInside;
    private double lastMass;
    private double massRef;
    /** Weight of the squared log ratio of a candidate's likelihood mass to the reference mass. */
    static final double MASS_PRIOR = 0.5;
    /** Rate at which the reference mass follows the chosen boxes' mass (perspective growth is followed). */
    static final double MASS_RATE = 0.05;

    private double respond(double cx, double cy, double w, double h) {
        double inSum = sum(cx - w / 2, cy - h / 2, cx + w / 2, cy + h / 2);
        double inArea = area(cx - w / 2, cy - h / 2, cx + w / 2, cy + h / 2);
        double ow = w * SURROUND / 2;
        double oh = h * SURROUND / 2;
        double outSum = sum(cx - ow, cy - oh, cx + ow, cy + oh) - inSum;
        double outArea = area(cx - ow, cy - oh, cx + ow, cy + oh) - inArea;
        lastInside = inArea > 0 ? inSum / inArea : 0;
        lastMass = inSum;
        double around = outArea > 0.5 ? outSum / outArea : 0;
        return lastInside - around;
    }

    /** Sums the likelihood over the region's part of [x0, x1) x [y0, y1) into the integral image. */
    private boolean integrate(BinImage image, ColourLikelihood likelihood, double x0, double y0, double x1,
                              double y1) {
        ix0 = image.firstColumn(x0);
        iy0 = image.firstRow(y0);
        int ex = image.endColumn(x1);
        int ey = image.endRow(y1);
        iw = ex - ix0;
        ih = ey - iy0;
        if (iw <= 0 || ih <= 0) {
            return false;
        }
        int stride = iw + 1;
        int size = stride * (ih + 1);
        if (integral.length < size) {
            integral = new double[size];
        }
        for (int x = 0; x <= iw; x++) {
            integral[x] = 0;
        }
        int[] bins = image.raw();
        float[] c = likelihood.perBin;
        int bw = image.width();
        double total = 0;
        for (int y = 0; y < ih; y++) {
            int src = (iy0 + y - image.y0()) * bw + (ix0 - image.x0());
            int dst = (y + 1) * stride;
            int up = y * stride;
            integral[dst] = 0;
            double row = 0;
            for (int x = 0; x < iw; x++) {
                row += c[bins[src + x]];
                integral[dst + x + 1] = integral[up + x + 1] + row;
            }
            total += row;
        }
        return total > 0;
    }

    /** Sum over [x0, x1) x [y0, y1) in frame coordinates, clipped to the integrated part, partial pixels included. */
    private double sum(double x0, double y0, double x1, double y1) {
        return at(x1, y1) - at(x0, y1) - at(x1, y0) + at(x0, y0);
    }

    /** Area of the part of [x0, x1) x [y0, y1) inside the integrated part. */
    private double area(double x0, double y0, double x1, double y1) {
        double w = Math.min(x1, ix0 + iw) - Math.max(x0, ix0);
        double h = Math.min(y1, iy0 + ih) - Math.max(y0, iy0);
        return w > 0 && h > 0 ? w * h : 0;
    }

    /** The summed-area table at a fractional point, bilinear between its corners (exact for partial pixels). */
    private double at(double x, double y) {
        double fx = Math.max(0, Math.min(iw, x - ix0));
        double fy = Math.max(0, Math.min(ih, y - iy0));
        int x0 = Math.min(iw - 1, (int) fx);
        int y0 = Math.min(ih - 1, (int) fy);
        double ax = fx - x0;
        double ay = fy - y0;
        int stride = iw + 1;
        int k = y0 * stride + x0;
        double top = integral[k] + ax * (integral[k + 1] - integral[k]);
        double bottom = integral[k + stride] + ax * (integral[k + stride + 1] - integral[k + stride]);
        return top + ay * (bottom - top);
    }
}
