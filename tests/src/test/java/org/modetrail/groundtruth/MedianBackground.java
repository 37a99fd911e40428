package org.modetrail.groundtruth;

import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * The empty scene of a fixed camera as the per-pixel, per-channel temporal median of frames sampled over the whole
 * clip. A person who stands on one spot for less than half of the sampled frames leaves no trace in it (the median
 * is the classic robust background estimate, e.g. Cucchiara et al. 2003, "Detecting moving objects, ghosts and
 * shadows in video streams", IEEE PAMI 25(10), section 3: median of sampled frames).
 */
final class MedianBackground {
    private MedianBackground() {
    }

    /**
     * The median of every {@code step}-th frame of {@code from..to-1}, packed 0xFFRRGGBB.
     */
    static int[] of(VideoSource src, int from, int to, int step) throws VideoException {
        int w = src.info().width();
        int h = src.info().height();
        int n = w * h;
        int samples = (to - from + step - 1) / step;
        byte[][] r = new byte[samples][];
        byte[][] g = new byte[samples][];
        byte[][] b = new byte[samples][];
        int[] count = {0};
        src.read(from, to, frame -> {
            if ((frame.index() - from) % step == 0 && count[0] < samples) {
                int k = count[0]++;
                r[k] = new byte[n];
                g[k] = new byte[n];
                b[k] = new byte[n];
                int[] px = frame.rgb();
                for (int i = 0; i < n; i++) {
                    int p = px[i];
                    r[k][i] = (byte) (p >> 16);
                    g[k][i] = (byte) (p >> 8);
                    b[k][i] = (byte) p;
                }
            }
            return true;
        });
        int m = count[0];
        int[] out = new int[n];
        int[] hist = new int[256];
        for (int i = 0; i < n; i++) {
            out[i] = 0xFF000000 | median(r, m, i, hist) << 16 | median(g, m, i, hist) << 8 | median(b, m, i, hist);
        }
        return out;
    }

    /** The lower median of channel values {@code c[0..m-1][i]} by counting. */
    private static int median(byte[][] c, int m, int i, int[] hist) {
        java.util.Arrays.fill(hist, 0);
        for (int k = 0; k < m; k++) {
            hist[c[k][i] & 0xFF]++;
        }
        int half = (m + 1) / 2;
        int acc = 0;
        for (int v = 0; v < 256; v++) {
            acc += hist[v];
            if (acc >= half) {
                return v;
            }
        }
        return 255;
    }
}
