package org.modetrail.tracking;

import org.modetrail.model.Box;

/** Plain, unweighted colour histograms of a box, for comparing against OpenCV's. */
final class Histograms {
    private Histograms() {
    }

    /** Counts per bin of the pixels whose index lies in [x0, x0 + w) x [y0, y0 + h). */
    static float[] counts(int[] rgb, int stride, int x0, int y0, int w, int h, ColourBinning binning) {
        float[] hist = new float[binning.binCount()];
        for (int y = y0; y < y0 + h; y++) {
            for (int x = x0; x < x0 + w; x++) {
                hist[binning.binOf(rgb[y * stride + x])]++;
            }
        }
        return hist;
    }

    static float[] counts(int[] rgb, int stride, Box b, ColourBinning binning) {
        return counts(rgb, stride, (int) b.x(), (int) b.y(), (int) b.width(), (int) b.height(), binning);
    }

    /** Scaled to sum 1. */
    static float[] normalised(float[] hist) {
        double sum = 0;
        for (float v : hist) {
            sum += v;
        }
        float[] out = new float[hist.length];
        for (int i = 0; i < hist.length; i++) {
            out[i] = (float) (hist[i] / sum);
        }
        return out;
    }
}
