package org.modetrail.tracking;

import org.modetrail.model.Box;

/**
 * Width and height from moments, after the idea of Ning, Zhang, Zhang and Wu, "Scale and orientation adaptive mean
 * shift tracking" (SOAMST), IET Computer Vision 6(1), 2012: the zeroth moment of a weight image tells the target's
 * area and its second-order central moments tell its shape. Departures from the paper: the weights are the
 * colour-likelihood back-projection ({@link ColourLikelihood}) rather than the mean-shift weights, so pixels of
 * background colour weigh nothing; the window is enlarged to 1.6 times the box so that growth can be seen; and
 * instead of the paper's area constant, the moments are referred to those measured on the start box, so the
 * shape of the object (ellipse, rectangle) cancels: width = w0 sqrt(mu20 / mu20_0), height = h0 sqrt(mu02 / mu02_0).
 * The change is smoothed and bounded per frame, because clutter next to the object inflates the moments.
 */
final class MomentScaleEstimator {
    private static final double WINDOW = 1.6;

    private final double smoothing;
    private final double maxChangePerFrame;
    private double refMu20;
    private double refMu02;
    private double refWidth;
    private double refHeight;
    private double refMass;
    /** Results of the last {@link #measure}. */
    private double mu20;
    private double mu02;
    private double mass;

    MomentScaleEstimator(double smoothing, double maxChangePerFrame) {
        this.smoothing = smoothing;
        this.maxChangePerFrame = maxChangePerFrame;
    }

    /** Measures the reference moments on the start box. */
    void reset(BinImage image, ColourLikelihood likelihood, Box box) {
        measure(image, likelihood, box);
        refMu20 = mu20;
        refMu02 = mu02;
        refMass = mass;
        refWidth = box.width();
        refHeight = box.height();
    }

    /** The box at the same centre with the size the moments say, or the box unchanged if they say nothing. */
    Box adapt(BinImage image, ColourLikelihood likelihood, Box box) {
        // Too little of the object's colour for its present size (not its start size: an object going away shrinks,
        // and its mass with it): it is mostly hidden, and the moments would shrink the box onto what is left.
        double expectedMass = refMass * box.area() / (refWidth * refHeight);
        if (refMu20 <= 0 || refMu02 <= 0 || !measure(image, likelihood, box) || mass < 0.2 * expectedMass) {
            return box;
        }
        double w = refWidth * Math.sqrt(mu20 / refMu20);
        double h = refHeight * Math.sqrt(mu02 / refMu02);
        w = box.width() + smoothing * (w - box.width());
        h = box.height() + smoothing * (h - box.height());
        double lo = 1 - maxChangePerFrame;
        double hi = 1 + maxChangePerFrame;
        w = Math.max(box.width() * lo, Math.min(box.width() * hi, w));
        h = Math.max(box.height() * lo, Math.min(box.height() * hi, h));
        return box.resized(Math.max(4, w), Math.max(4, h));
    }

    private boolean measure(BinImage image, ColourLikelihood likelihood, Box box) {
        double hw = box.width() * WINDOW / 2;
        double hh = box.height() * WINDOW / 2;
        int xa = image.firstColumn(box.centreX() - hw);
        int xb = image.endColumn(box.centreX() + hw);
        int ya = image.firstRow(box.centreY() - hh);
        int yb = image.endRow(box.centreY() + hh);
        int[] bins = image.raw();
        float[] c = likelihood.perBin;
        int stride = image.width();
        double m00 = 0;
        double m10 = 0;
        double m01 = 0;
        double m20 = 0;
        double m02 = 0;
        for (int y = ya; y < yb; y++) {
            int row = (y - image.y0()) * stride - image.x0();
            double py = y + 0.5;
            double rs = 0;
            double rx = 0;
            double rxx = 0;
            for (int x = xa; x < xb; x++) {
                float w = c[bins[row + x]];
                if (w > 0) {
                    double px = x + 0.5;
                    rs += w;
                    rx += w * px;
                    rxx += w * px * px;
                }
            }
            m00 += rs;
            m10 += rx;
            m20 += rxx;
            m01 += rs * py;
            m02 += rs * py * py;
        }
        if (m00 <= 0) {
            return false;
        }
        double mx = m10 / m00;
        double my = m01 / m00;
        mu20 = m20 / m00 - mx * mx;
        mu02 = m02 / m00 - my * my;
        mass = m00;
        return mu20 > 0 && mu02 > 0;
    }
}
