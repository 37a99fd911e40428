package org.modetrail.tracking;

import org.modetrail.video.Frame;

/**
 * The histogram bin of every pixel in one rectangular region of a frame: the single pass over a frame's pixels
 * that tracking makes. Everything else (histograms, weights, likelihoods) reads bins from here. The buffer grows
 * when a larger region is asked for and is otherwise reused, so steady tracking allocates nothing.
 */
final class BinImage {
    private final ColourBinning binning;
    /** For RGB binning: each channel's value straight to its part of the bin index, lighting included. */
    private final int[] redBins = new int[256];
    private final int[] greenBins = new int[256];
    private final int[] blueBins = new int[256];
    private int tablesFor = Integer.MIN_VALUE;
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
        load(frame, rx0, ry0, rx1, ry1, null);
    }

    /** The same, with the pixels' colours compensated for the light first (null for none). */
    void load(Frame frame, int rx0, int ry0, int rx1, int ry1, IlluminationCompensation light) {
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
        if (n == 0) {
            return;
        }
        if (binning instanceof RgbBinning rgbBinning) {
            binRgb(frame, rgbBinning, light);
        } else if (light == null || light.isIdentity()) {
            binning.binRegion(frame.rgb(), frame.width(), x0, y0, width, height, bins);
        } else {
            int[] rgb = frame.rgb();
            int[] r = light.red;
            int[] g = light.green;
            int[] b = light.blue;
            int k = 0;
            for (int y = y0; y < y0 + height; y++) {
                int row = y * frame.width();
                for (int x = x0; x < x0 + width; x++) {
                    int p = rgb[row + x];
                    bins[k++] = binning.binOf(r[p >>> 16 & 0xFF] | g[p >>> 8 & 0xFF] | b[p & 0xFF]);
                }
            }
        }
    }

    /** RGB binning by three table reads per pixel, the light's gains folded into the tables. */
    private void binRgb(Frame frame, RgbBinning rgbBinning, IlluminationCompensation light) {
        int version = light == null ? -1 : light.version();
        if (version != tablesFor) {
            int bits = rgbBinning.bitsPerChannel();
            int drop = 8 - bits;
            for (int v = 0; v < 256; v++) {
                int r = light == null ? v : light.channel(0, v);
                int g = light == null ? v : light.channel(1, v);
                int b = light == null ? v : light.channel(2, v);
                redBins[v] = (r >>> drop) << (2 * bits);
                greenBins[v] = (g >>> drop) << bits;
                blueBins[v] = b >>> drop;
            }
            tablesFor = version;
        }
        int[] rgb = frame.rgb();
        int k = 0;
        for (int y = y0; y < y0 + height; y++) {
            int row = y * frame.width();
            for (int x = x0; x < x0 + width; x++) {
                int p = rgb[row + x];
                bins[k++] = redBins[p >>> 16 & 0xFF] | greenBins[p >>> 8 & 0xFF] | blueBins[p & 0xFF];
            }
        }
    }

    /** Forgets the region: the next frame's pixels are not binned yet. */
    void invalidate() {
        width = 0;
        height = 0;
        x0 = Integer.MAX_VALUE / 2;
        y0 = Integer.MAX_VALUE / 2;
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

    /** The first column of a window whose left edge is at {@code left}, clipped to the region (frame coordinates). */
    int firstColumn(double left) {
        return Math.max(x0, (int) Math.floor(left));
    }

    /** One past the last column of a window whose right edge is at {@code right}, clipped to the region. */
    int endColumn(double right) {
        return Math.min(x0 + width, (int) Math.ceil(right));
    }

    /** The first row of a window whose top edge is at {@code top}, clipped to the region. */
    int firstRow(double top) {
        return Math.max(y0, (int) Math.floor(top));
    }

    /** One past the last row of a window whose bottom edge is at {@code bottom}, clipped to the region. */
    int endRow(double bottom) {
        return Math.min(y0 + height, (int) Math.ceil(bottom));
    }

    /** Bin at absolute frame coordinates; the caller keeps inside the region. */
    int binAt(int x, int y) {
        return bins[(y - y0) * width + (x - x0)];
    }

    int[] raw() {
        return bins;
    }

    ColourBinning binning() {
        return binning;
    }

    int binCount() {
        return binning.binCount();
    }
}
