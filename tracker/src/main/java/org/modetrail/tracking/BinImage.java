package org.modetrail.tracking;

import org.modetrail.video.Frame;

/**
 * The histogram bin of every pixel in one rectangular region of a frame: the single pass over a frame's pixels
 * that tracking makes. Everything else (histograms, weights, likelihoods) reads bins from here. The buffer grows
 * when a larger region is asked for and is otherwise reused, so steady tracking allocates nothing.
 */
final class BinImage {
    private final ColourBinning binning;
    private int[] bins = new int[0];
    private int x0;
    private int y0;
    private int width;
    private int height;

    BinImage(ColourBinning binning) {
        this.binning = binning;
    }

    /** Bins the part of {@code [rx0, rx1) x [ry0, ry1)} that lies inside the frame. */
    void load(Frame frame, int rx0, int ry0, int rx1, int ry1) {
        x0 = Math.max(0, rx0);
        y0 = Math.max(0, ry0);
        int x1 = Math.min(frame.width(), rx1);
        int y1 = Math.min(frame.height(), ry1);
        width = Math.max(0, x1 - x0);
        height = Math.max(0, y1 - y0);
        int n = width * height;
        if (bins.length < n) {
            bins = new int[Math.max(n, bins.length * 3 / 2)];
        }
        if (n > 0) {
            binning.binRegion(frame.rgb(), frame.width(), x0, y0, width, height, bins);
        }
    }

    /** Whether the region covers {@code [rx0, rx1) x [ry0, ry1)} as far as the frame reaches. */
    boolean covers(Frame frame, int rx0, int ry0, int rx1, int ry1) {
        return x0 <= Math.max(0, rx0) && y0 <= Math.max(0, ry0)
                && x0 + width >= Math.min(frame.width(), rx1) && y0 + height >= Math.min(frame.height(), ry1);
    }

    int x0() {
        return x0;
    }

    int y0() {
        return y0;
    }

    int width() {
        return width;
    }

    int height() {
        return height;
    }

    /** Bin at absolute frame coordinates; the caller keeps inside the region. */
    int binAt(int x, int y) {
        return bins[(y - y0) * width + (x - x0)];
    }

    int[] raw() {
        return bins;
    }

    int binCount() {
        return binning.binCount();
    }
}
