package org.modetrail.testsupport;

import org.modetrail.video.Frame;

/** Pixel comparisons between a decoded frame and a reference image, both as packed 0xFFRRGGBB. */
public final class Pixels {
    private Pixels() {
    }

    /** How far two images are apart, per 8-bit channel. */
    public record Diff(int maxChannel, double meanAbs, int differingPixels, int pixels) {
        @Override
        public String toString() {
            return String.format(java.util.Locale.ROOT, "max %d, mean %.4f, %d of %d pixels differ", maxChannel,
                    meanAbs, differingPixels, pixels);
        }
    }

    public static int[] fromRgb24(byte[] raw, int offset, int width, int height) {
        int[] px = new int[width * height];
        for (int i = 0, o = offset; i < px.length; i++, o += 3) {
            px[i] = 0xFF000000 | (raw[o] & 0xFF) << 16 | (raw[o + 1] & 0xFF) << 8 | (raw[o + 2] & 0xFF);
        }
        return px;
    }

    public static Diff diff(Frame frame, int[] reference) {
        return diff(frame.rgb(), reference, frame.width() * frame.height());
    }

    public static Diff diff(int[] a, int[] b, int pixels) {
        if (a.length < pixels || b.length < pixels) {
            throw new AssertionError("image sizes differ: " + a.length + " vs " + b.length + " for " + pixels);
        }
        int max = 0;
        long sum = 0;
        int differing = 0;
        for (int i = 0; i < pixels; i++) {
            int x = a[i];
            int y = b[i];
            if (x == y) {
                continue;
            }
            differing++;
            for (int shift = 0; shift <= 24; shift += 8) {
                int d = Math.abs((x >>> shift & 0xFF) - (y >>> shift & 0xFF));
                sum += d;
                max = Math.max(max, d);
            }
        }
        return new Diff(max, sum / (3.0 * pixels), differing, pixels);
    }

    public static Diff diff(int[] a, int[] b) {
        return diff(a, b, Math.min(a.length, b.length));
    }
}
