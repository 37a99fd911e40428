package org.modetrail.groundtruth;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Foreground regions of one frame against a background picture: colour difference, shadow suppression, morphology,
 * connected components, and the joining of fragments of one body.
 *
 * <ul>
 *   <li>Foreground: the sum of the absolute channel differences to the background above
 *       {@link Config#difference} (common practice, no source for the figure: chosen by looking at the masks).</li>
 *   <li>Shadow: a pixel darker than the background by a ratio in [{@link Config#shadowLow}, {@link
 *       Config#shadowHigh}] with nearly the same chromaticity is shadow, not object (the brightness-ratio and
 *       chromaticity test of Cucchiara et al. 2003, "Detecting moving objects, ghosts and shadows in video
 *       streams", IEEE PAMI 25(10), equation 9, here in normalised rgb instead of HSV hue and saturation).</li>
 *   <li>Morphology: an opening with a 3x3 square removes speckle, a closing with a tall rectangle
 *       ({@link Config#closeWidth} x {@link Config#closeHeight}) rejoins legs, bodies and heads split where the
 *       clothes match the road.</li>
 *   <li>8-connected components; fragments whose column ranges overlap and whose vertical gap is small are joined
 *       (a head over a body).</li>
 * </ul>
 */
final class ForegroundBlobs {

    /**
     * @param difference  foreground when |dR|+|dG|+|dB| exceeds this
     * @param shadowLow   lowest brightness ratio (frame over background) still taken for shadow
     * @param shadowHigh  highest brightness ratio taken for shadow
     * @param shadowChroma largest normalised-rgb difference (|dr|+|dg|) of a shadow pixel
     * @param closeWidth  width of the closing rectangle (odd)
     * @param closeHeight height of the closing rectangle (odd)
     * @param minArea     smallest region kept, in pixels
     * @param minHeight   shortest region kept, in pixels
     * @param joinGap     largest vertical gap in pixels between fragments joined into one body
     */
    record Config(int difference, double shadowLow, double shadowHigh, double shadowChroma, int closeWidth,
                  int closeHeight, int minArea, int minHeight, int joinGap) {
        Config {
            if (difference <= 0 || !(shadowLow > 0 && shadowLow < shadowHigh && shadowHigh < 1) || shadowChroma <= 0
                    || closeWidth < 1 || closeWidth % 2 == 0 || closeHeight < 1 || closeHeight % 2 == 0
                    || minArea < 1 || minHeight < 1 || joinGap < 0) {
                throw new IllegalArgumentException("bad foreground configuration " + this);
            }
        }

        /** The values used for vtest.avi's truth. */
        static Config defaults() {
            return new Config(45, 0.45, 0.92, 0.04, 5, 11, 70, 14, 8);
        }
    }

    private final Config config;
    private final int width;
    private final int height;
    private final byte[] mask;
    private final byte[] work;
    private final int[] labels;
    private final int[] parent;
    private final byte[] tmp;

    ForegroundBlobs(Config config, int width, int height) {
        this.config = config;
        this.width = width;
        this.height = height;
        this.mask = new byte[width * height];
        this.work = new byte[width * height];
        this.labels = new int[width * height];
        this.parent = new int[width * height / 2 + 2];
        this.tmp = new byte[width * height];
    }

    /** The mask of the last call to {@link #find}, 1 for foreground; shared, read-only. */
    byte[] mask() {
        return mask;
    }

    List<Blob> find(int frameIndex, int[] rgb, int[] background) {
        threshold(rgb, background);
        // opening 3x3
        erode(mask, work, 3, 3);
        dilate(work, mask, 3, 3);
        // closing
        dilate(mask, work, config.closeWidth(), config.closeHeight());
        erode(work, mask, config.closeWidth(), config.closeHeight());
        List<Blob> blobs = components(frameIndex);
        return joinFragments(blobs);
    }

    private void threshold(int[] rgb, int[] bg) {
        int t = config.difference();
        for (int i = 0; i < rgb.length; i++) {
            int p = rgb[i];
            int q = bg[i];
            int r = (p >> 16) & 0xFF, g = (p >> 8) & 0xFF, b = p & 0xFF;
            int br = (q >> 16) & 0xFF, bgc = (q >> 8) & 0xFF, bb = q & 0xFF;
            int d = Math.abs(r - br) + Math.abs(g - bgc) + Math.abs(b - bb);
            byte on = 0;
            if (d > t) {
                on = 1;
                int s = r + g + b;
                int sb = br + bgc + bb;
                if (s > 0 && sb > 0) {
                    double ratio = (double) s / sb;
                    if (ratio >= config.shadowLow() && ratio <= config.shadowHigh()) {
                        double dc = Math.abs((double) r / s - (double) br / sb) + Math.abs((double) g / s - (double) bgc / sb);
                        if (dc <= config.shadowChroma()) {
                            on = 0;
                        }
                    }
                }
            }
            mask[i] = on;
        }
    }

    /** Binary erosion with a w x h rectangle (separable: rows, then columns); outside the frame counts as off. */
    private void erode(byte[] in, byte[] out, int w, int h) {
        runs(in, tmp, w, true, true);
        runs(tmp, out, h, false, true);
    }

    private void dilate(byte[] in, byte[] out, int w, int h) {
        runs(in, tmp, w, true, false);
        runs(tmp, out, h, false, false);
    }

    /**
     * One pass of a 1-D min (erode) or max (dilate) filter of length {@code len} along rows or columns, by a running
     * count of on-pixels in the window.
     */
    private void runs(byte[] in, byte[] out, int len, boolean alongRows, boolean erode) {
        int r = len / 2;
        int lines = alongRows ? height : width;
        int n = alongRows ? width : height;
        int stride = alongRows ? 1 : width;
        for (int l = 0; l < lines; l++) {
            int base = alongRows ? l * width : l;
            int on = 0;
            for (int k = 0; k < Math.min(r, n); k++) {
                on += in[base + k * stride];
            }
            for (int k = 0; k < n; k++) {
                int add = k + r;
                if (add < n) {
                    on += in[base + add * stride];
                }
                int drop = k - r - 1;
                if (drop >= 0) {
                    on -= in[base + drop * stride];
                }
                int lo = Math.max(0, k - r);
                int hi = Math.min(n - 1, k + r);
                int size = hi - lo + 1;
                boolean v = erode ? (on == len && size == len) : on > 0;
                out[base + k * stride] = (byte) (v ? 1 : 0);
            }
        }
    }

    private int find(int a) {
        while (parent[a] != a) {
            parent[a] = parent[parent[a]];
            a = parent[a];
        }
        return a;
    }

    private List<Blob> components(int frameIndex) {
        int next = 1;
        Arrays.fill(labels, 0);
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int i = y * width + x;
                if (mask[i] == 0) {
                    continue;
                }
                int best = 0;
                int[] ns = {x > 0 ? labels[i - 1] : 0, y > 0 && x > 0 ? labels[i - width - 1] : 0,
                        y > 0 ? labels[i - width] : 0, y > 0 && x < width - 1 ? labels[i - width + 1] : 0};
                for (int l : ns) {
                    if (l == 0) {
                        continue;
                    }
                    if (best == 0) {
                        best = find(l);
                    } else {
                        int a = find(l);
                        if (a != best) {
                            int lo = Math.min(a, best), hi = Math.max(a, best);
                            parent[hi] = lo;
                            best = lo;
                        }
                    }
                }
                if (best == 0) {
                    if (next >= parent.length) {
                        throw new IllegalStateException("frame " + frameIndex + ": too many regions");
                    }
                    parent[next] = next;
                    best = next++;
                }
                labels[i] = best;
            }
        }
        int[] x0 = new int[next], y0 = new int[next], x1 = new int[next], y1 = new int[next], area = new int[next];
        Arrays.fill(x0, Integer.MAX_VALUE);
        Arrays.fill(y0, Integer.MAX_VALUE);
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int i = y * width + x;
                if (labels[i] == 0) {
                    continue;
                }
                int l = find(labels[i]);
                labels[i] = l;
                area[l]++;
                x0[l] = Math.min(x0[l], x);
                y0[l] = Math.min(y0[l], y);
                x1[l] = Math.max(x1[l], x + 1);
                y1[l] = Math.max(y1[l], y + 1);
            }
        }
        List<Blob> out = new ArrayList<>();
        for (int l = 1; l < next; l++) {
            if (area[l] == 0) {
                continue;
            }
            int w = x1[l] - x0[l];
            int[] cnt = new int[w];
            int[] top = new int[w];
            int[] bot = new int[w];
            Arrays.fill(top, Integer.MAX_VALUE);
            Arrays.fill(bot, -1);
            for (int y = y0[l]; y < y1[l]; y++) {
                for (int x = x0[l]; x < x1[l]; x++) {
                    if (labels[y * width + x] == l) {
                        int c = x - x0[l];
                        cnt[c]++;
                        top[c] = Math.min(top[c], y);
                        bot[c] = Math.max(bot[c], y + 1);
                    }
                }
            }
            out.add(new Blob(frameIndex, x0[l], y0[l], x1[l], y1[l], area[l], cnt, top, bot));
        }
        return out;
    }

    /** Joins fragments stacked one over the other, then drops what is too small to be a person. */
    private List<Blob> joinFragments(List<Blob> blobs) {
        List<Blob> list = new ArrayList<>(blobs);
        boolean joined = true;
        while (joined) {
            joined = false;
            outer:
            for (int i = 0; i < list.size(); i++) {
                for (int j = i + 1; j < list.size(); j++) {
                    Blob a = list.get(i), b = list.get(j);
                    int overlap = Math.min(a.x1(), b.x1()) - Math.max(a.x0(), b.x0());
                    int narrower = Math.min(a.width(), b.width());
                    int gap = Math.max(a.y0(), b.y0()) - Math.min(a.y1(), b.y1());
                    if (overlap >= 0.5 * narrower && gap <= config.joinGap()) {
                        list.set(i, a.union(b));
                        list.remove(j);
                        joined = true;
                        break outer;
                    }
                }
            }
        }
        list.removeIf(b -> b.area() < config.minArea() || b.height() < config.minHeight());
        list.sort((a, b) -> a.x0() != b.x0() ? Integer.compare(a.x0(), b.x0()) : Integer.compare(a.y0(), b.y0()));
        return list;
    }
}
